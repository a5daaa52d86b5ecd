/// <reference types="vite/client" />

interface ImportMetaEnv {
  /** Hours a signed-in session keeps working without the server (default 72). */
  readonly VITE_OFFLINE_SESSION_HOURS?: string;
  /** Minutes untouched before the app locks, unless the person chose otherwise on this tablet (default 10). */
  readonly VITE_IDLE_LOCK_MINUTES?: string;
}
