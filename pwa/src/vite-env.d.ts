/// <reference types="vite/client" />

interface ImportMetaEnv {
  /** Hours a signed-in session keeps working without the server (default 72). */
  readonly VITE_OFFLINE_SESSION_HOURS?: string;
}
