import { parseIdleLockMinutes } from './idleLockMinutes';
import { parseOfflineSessionHours } from './offlineSessionHours';

/** Build-time settings of the app, validated once (vite.config.ts checks them again so a bad value fails the build). */
export const appConfig = {
  offlineSessionHours: parseOfflineSessionHours(import.meta.env.VITE_OFFLINE_SESSION_HOURS),
  idleLockMinutes: parseIdleLockMinutes(import.meta.env.VITE_IDLE_LOCK_MINUTES),
} as const;
