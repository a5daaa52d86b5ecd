/**
 * The app is drawn in two areas, each with its own router: the pages a signed-out visit opens
 * (sign-in, set-password), drawn without Ionic so the first paint carries none of its code, and the
 * signed-in area (Ionic's tabs), loaded as its own chunk. Which one is drawn follows the address.
 */
export type AppArea = 'public' | 'signedIn';

const PUBLIC_PATHS: readonly string[] = ['/signin', '/set-password'];
const AREA_EVENT = 'siteband:area';

/** The area that draws this path; React Router ignores a trailing slash, and so does this. */
export function areaOfPath(pathname: string): AppArea {
  const path = pathname.replace(/\/+$/, '') || '/';
  return PUBLIC_PATHS.includes(path) ? 'public' : 'signedIn';
}

/** The area of the current address. */
export function currentArea(): AppArea {
  return areaOfPath(window.location.pathname);
}

/** Calls the listener when the address may have moved to the other area; returns the unsubscribe function. */
export function subscribeArea(listener: () => void): () => void {
  window.addEventListener('popstate', listener);
  window.addEventListener(AREA_EVENT, listener);
  return () => {
    window.removeEventListener('popstate', listener);
    window.removeEventListener(AREA_EVENT, listener);
  };
}

/** Tells the app that a router of one area has navigated to a path of the other. */
export function announceAreaChange(): void {
  window.dispatchEvent(new Event(AREA_EVENT));
}

/** The signed-in area's chunk (Ionic, the tabs and their screens); the module loads once. */
export const loadSignedInArea = () => import('../../SignedInApp');
