import type { Role } from '@siteband/shared';

/**
 * The invented demo scenario, kept in one place so later work can add demo sites and cases beside
 * the users. Every organisation, place and person here is fictional.
 */
export const DEMO_ORGANISATION = {
  name: 'Port Averin Environmental Response Unit',
  shortName: 'PAERU',
  city: 'Port Averin',
  description:
    'The environmental-response unit of the fictional port city of Port Averin: inspectors sample unknown ' +
    'substances at the docks, the ferry terminal and the industrial estate; supervisors review the results; ' +
    'the safety officer handles escalations.',
} as const;

/** One demo account. The password is the same for all: SITEBAND_DEMO_PASSWORD. */
export interface DemoUser {
  email: string;
  displayName: string;
  role: Role;
}

export const DEMO_USERS: readonly DemoUser[] = [
  { email: 'inspector@demo.test', displayName: 'Rowan Ashdown', role: 'inspector' },
  { email: 'supervisor@demo.test', displayName: 'Imke Varga-Lindqvist', role: 'supervisor' },
  { email: 'safety@demo.test', displayName: 'Tobiah Okonkwo-Reyes', role: 'safety_officer' },
  { email: 'admin@demo.test', displayName: 'Marisol Penhallow', role: 'admin' },
];
