import type { Role } from '@siteband/shared';
import type { SessionStatus } from '../session/offlineGrace';
import type { StoredSession } from '../session/types';

/** The tabs of the signed-in shell. */
export type TabId = 'cases' | 'capture' | 'review' | 'library' | 'escalations' | 'users' | 'audit' | 'account';

export interface TabDefinition {
  id: TabId;
  /** Path under /tabs. */
  path: string;
  /** i18n key of the tab's label. */
  labelKey: `tabs.${TabId}`;
}

function tab(id: TabId): TabDefinition {
  return { id, path: `/tabs/${id}`, labelKey: `tabs.${id}` };
}

/** Every tab, in the order the tab bar shows them. */
export const TABS: Readonly<Record<TabId, TabDefinition>> = {
  cases: tab('cases'),
  capture: tab('capture'),
  review: tab('review'),
  library: tab('library'),
  escalations: tab('escalations'),
  users: tab('users'),
  audit: tab('audit'),
  account: tab('account'),
};

/**
 * The one place that says which role works in which tabs; the account tab is everyone's.
 * The server enforces the same split on its routes: this only decides what is offered.
 */
const ROLE_TABS: Readonly<Record<Role, readonly TabId[]>> = {
  inspector: ['cases', 'capture', 'account'],
  supervisor: ['review', 'library', 'account'],
  safety_officer: ['escalations', 'account'],
  admin: ['users', 'audit', 'account'],
};

/** The tabs the role sees, in tab-bar order. */
export function tabsForRole(role: Role): TabDefinition[] {
  const ids = ROLE_TABS[role];
  if (!ids) throw new RangeError(`Unknown role "${String(role)}"`);
  return ids.map((id) => TABS[id]);
}

/** Where a person of this role lands after signing in: their first tab. */
export function homePathForRole(role: Role): string {
  return tabsForRole(role)[0].path;
}

/**
 * Where "/" (the installed app's start) leads: the person's first tab while the session is usable
 * (online, or offline within its period), sign-in otherwise.
 */
export function entryPath(session: StoredSession | undefined, status: SessionStatus): string {
  const usable = session !== undefined && (status === 'online' || status === 'offline');
  return usable ? homePathForRole(session.user.role) : '/signin';
}
