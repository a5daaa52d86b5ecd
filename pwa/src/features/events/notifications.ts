import type { Role } from '@siteband/shared';
import { escalationPaths } from '../escalations/escalationPaths';
import type { LiveEvent } from './liveEvent';

/** What a live event tells a person of this role through the browser's notifications, if anything. */
export interface LiveNotification {
  /** i18n keys of the title and body. */
  titleKey: string;
  bodyKey: string;
  /** Where a click on the notification leads. */
  path: string;
}

/**
 * Only the events someone must act on notify: a new escalation for the safety officer, a newly
 * submitted case for the supervisor. Everything else only refreshes the open screens.
 */
export function notificationFor(role: Role, event: LiveEvent): LiveNotification | undefined {
  if (role === 'safety_officer' && event.type === 'escalation.raised') {
    return { titleKey: 'events.notify.escalationTitle', bodyKey: 'events.notify.escalationBody', path: escalationPaths.escalation(event.id) };
  }
  if (role === 'supervisor' && event.type === 'case.submitted') {
    return { titleKey: 'events.notify.submittedTitle', bodyKey: 'events.notify.submittedBody', path: `/tabs/review/cases/${encodeURIComponent(event.caseId ?? event.id)}` };
  }
  return undefined;
}

/** The roles whose screens follow the live events (admins have no case access). */
export function followsLiveEvents(role: Role): boolean {
  return role !== 'admin';
}

const ASKED_KEY = 'siteband.notificationsAsked';

/** True when the browser can show notifications and the person has not been asked on this tablet yet. */
export function mayAskForNotifications(): boolean {
  if (typeof Notification === 'undefined' || Notification.permission !== 'default') return false;
  return localStorage.getItem(ASKED_KEY) === null;
}

/** Asks the browser once (call it from a click); the answer is the browser's, remembered by the browser. */
export async function askForNotifications(): Promise<NotificationPermission> {
  localStorage.setItem(ASKED_KEY, new Date().toISOString());
  return Notification.requestPermission();
}

/** The person said "not now": the offer is not made again on this tablet. */
export function declineNotifications(): void {
  localStorage.setItem(ASKED_KEY, new Date().toISOString());
}

/** True when notifications may be shown now. */
export function notificationsAllowed(): boolean {
  return typeof Notification !== 'undefined' && Notification.permission === 'granted';
}
