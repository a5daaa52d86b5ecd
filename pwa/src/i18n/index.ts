import i18next from 'i18next';
import { initReactI18next } from 'react-i18next';
import en from './en.json';
import lock from './en/lock.json';
import invite from './en/invite.json';
import passwordInput from './en/password-input.json';

/** Languages with a complete resource file; English is the source language. */
export const SUPPORTED_LANGUAGES = ['en'] as const;
export type Language = (typeof SUPPORTED_LANGUAGES)[number];

const STORAGE_KEY = 'siteband.language';

function storedLanguage(): Language {
  const stored = typeof localStorage === 'undefined' ? null : localStorage.getItem(STORAGE_KEY);
  return SUPPORTED_LANGUAGES.find((lang) => lang === stored) ?? 'en';
}

/**
 * Starts i18next with the bundled strings of the screens drawn before sign-in (sign-in, set
 * password, idle lock, and their password field); the signed-in screens add theirs with addSignedInStrings. No network
 * loading: the app must work offline.
 */
export async function initI18n(): Promise<typeof i18next> {
  await i18next.use(initReactI18next).init({
    resources: { en: { translation: { ...en, lock, invite, passwordInput } } },
    lng: storedLanguage(),
    fallbackLng: 'en',
    interpolation: { escapeValue: false },
    returnNull: false,
  });
  document.documentElement.lang = i18next.language;
  return i18next;
}

/** Switches the language and remembers the choice on this tablet. */
export async function changeLanguage(language: Language): Promise<void> {
  localStorage.setItem(STORAGE_KEY, language);
  await i18next.changeLanguage(language);
  document.documentElement.lang = language;
}
