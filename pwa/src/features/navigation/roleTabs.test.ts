import { ROLES, type Role } from '@siteband/shared';
import { describe, expect, it } from 'vitest';
import type { StoredSession } from '../session/types';
import { entryPath, homePathForRole, tabsForRole, TABS, type TabId } from './roleTabs';

const ids = (role: Role) => tabsForRole(role).map((t) => t.id);

describe('role → tabs', () => {
  it('gives each role its own work tabs plus the account tab', () => {
    expect(ids('inspector')).toEqual(['cases', 'capture', 'account']);
    expect(ids('supervisor')).toEqual(['review', 'library', 'account']);
    expect(ids('safety_officer')).toEqual(['escalations', 'account']);
    expect(ids('admin')).toEqual(['users', 'audit', 'account']);
  });

  it('shares no work tab between roles, and every tab belongs to some role', () => {
    const owners = new Map<TabId, Role[]>();
    for (const role of ROLES) for (const id of ids(role)) owners.set(id, [...(owners.get(id) ?? []), role]);
    for (const [id, roles] of owners) {
      if (id === 'account') expect(roles).toEqual([...ROLES]);
      else expect(roles).toHaveLength(1);
    }
    expect([...owners.keys()].sort()).toEqual(Object.keys(TABS).sort());
  });

  it('lands each role on its first tab under /tabs', () => {
    expect(homePathForRole('inspector')).toBe('/tabs/cases');
    expect(homePathForRole('supervisor')).toBe('/tabs/review');
    expect(homePathForRole('safety_officer')).toBe('/tabs/escalations');
    expect(homePathForRole('admin')).toBe('/tabs/users');
  });

  it('starts a usable session on its first tab and everyone else on sign-in', () => {
    const supervisor = { user: { role: 'supervisor' } } as StoredSession;
    expect(entryPath(supervisor, 'online')).toBe('/tabs/review');
    expect(entryPath(supervisor, 'offline')).toBe('/tabs/review');
    expect(entryPath(supervisor, 'expired')).toBe('/signin');
    expect(entryPath(undefined, 'signed-out')).toBe('/signin');
  });

  it('refuses a role it does not know', () => {
    expect(() => tabsForRole('visitor' as Role)).toThrow(/Unknown role "visitor"/);
  });
});
