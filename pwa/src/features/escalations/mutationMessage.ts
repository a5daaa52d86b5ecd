import type { TFunction } from 'i18next';
import { isApiStatus } from '../api/apiError';

/** True when the server refused an action because someone acted on the escalation first (409). */
export function isStale(error: unknown): boolean {
  return isApiStatus(error, 409);
}

/**
 * What a form says when its action was refused. A stale version is said once at the top of the page
 * instead, since the form itself may vanish when the latest state arrives.
 */
export function refusalMessage(t: TFunction, error: unknown): string | undefined {
  if (isStale(error)) return undefined;
  return t('escalations.actionError', { message: error instanceof Error ? error.message : String(error) });
}
