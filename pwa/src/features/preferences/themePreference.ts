import { useCallback, useEffect, useSyncExternalStore } from 'react';

/** The person's choice of colour scheme. */
export type ThemePreference = 'system' | 'light' | 'dark';

export const THEME_PREFERENCES: readonly ThemePreference[] = ['system', 'light', 'dark'];

// localStorage, not IndexedDB: it is read synchronously before the first paint, so there is no flash of the wrong theme.
const STORAGE_KEY = 'siteband.theme';
const DARK_CLASS = 'ion-palette-dark';
const listeners = new Set<() => void>();

/** The stored preference, 'system' when none or an unknown value is stored. */
export function readThemePreference(): ThemePreference {
  const stored = localStorage.getItem(STORAGE_KEY);
  return THEME_PREFERENCES.includes(stored as ThemePreference) ? (stored as ThemePreference) : 'system';
}

/** True when the preference, resolved against the system setting, asks for the dark palette. */
export function prefersDark(preference: ThemePreference, systemDark: boolean): boolean {
  return preference === 'dark' || (preference === 'system' && systemDark);
}

function systemQuery(): MediaQueryList {
  return window.matchMedia('(prefers-color-scheme: dark)');
}

/** Puts the dark palette class on <html> according to the stored preference and the system setting. */
export function applyThemePreference(preference = readThemePreference()): void {
  document.documentElement.classList.toggle(DARK_CLASS, prefersDark(preference, systemQuery().matches));
}

function subscribe(listener: () => void): () => void {
  listeners.add(listener);
  return () => listeners.delete(listener);
}

/** The theme preference with its setter; follows the system scheme while set to 'system'. */
export function useThemePreference(): [ThemePreference, (next: ThemePreference) => void] {
  const preference = useSyncExternalStore(subscribe, readThemePreference, () => 'system' as const);
  useEffect(() => {
    const query = systemQuery();
    const onSystemChange = () => applyThemePreference();
    query.addEventListener('change', onSystemChange);
    return () => query.removeEventListener('change', onSystemChange);
  }, []);
  const setPreference = useCallback((next: ThemePreference) => {
    localStorage.setItem(STORAGE_KEY, next);
    applyThemePreference(next);
    listeners.forEach((listener) => listener());
  }, []);
  return [preference, setPreference];
}
