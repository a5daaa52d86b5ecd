/** The four roles of Siteband's users; the one place that lists them. */
export const ROLES = ['inspector', 'supervisor', 'safety_officer', 'admin'] as const;

export type Role = (typeof ROLES)[number];

/** True when the value names one of Siteband's roles. */
export function isRole(value: unknown): value is Role {
  return typeof value === 'string' && (ROLES as readonly string[]).includes(value);
}
