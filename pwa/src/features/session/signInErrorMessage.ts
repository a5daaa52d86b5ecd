import type { TFunction } from 'i18next';
import { ApiError } from '../api/apiError';

/** Turns a failed sign-in into the sentence the sign-in page shows. */
export function signInErrorMessage(error: unknown, t: TFunction): string {
  if (error instanceof ApiError) {
    if (error.kind === 'network') return t('signIn.errors.offline');
    if (error.status === 401) return t('signIn.errors.wrongCredentials');
    if (error.status === 429) return t('signIn.errors.tooMany');
    return t('signIn.errors.server', { message: error.message });
  }
  return t('signIn.errors.server', { message: error instanceof Error ? error.message : String(error) });
}
