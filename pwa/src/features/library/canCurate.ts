import type { Role } from '@siteband/shared';

/** Supervisors curate the compound library; the server enforces the same on its write routes. */
export function canCurateLibrary(role: Role | undefined): boolean {
  return role === 'supervisor';
}
