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

/** A scan of a demo sample: a synthetic spectrum file from `fixtures/spectra/` (invented data, made for tests and the demo). */
export interface DemoScan {
  file: string;
  technique: 'ir' | 'raman';
  phase: 'condensed' | 'gas';
  excitationNm?: number;
  recordedAt: string;
}

/** A supervisor's decision in the demo story; `scan` is the index of the case's scan it is about. */
export type DemoDecision =
  | { kind: 'accept' | 'needs_lab'; scan: number; comment?: string }
  | { kind: 'return'; comment: string }
  | { kind: 'sign_off'; comment?: string };

/** One invented site visit, at the stage the demo shows it. */
export interface DemoCase {
  /** Stable name the seed derives every record id and change id from (so a second run adds nothing). */
  key: string;
  siteName: string;
  address: string;
  latitude: number;
  longitude: number;
  startedAt: string;
  weatherNotes: string;
  accessNotes: string;
  sample: {
    label: string;
    container: string;
    description: string;
    locationOnSite: string;
    observations: { colour?: string; state: string; notes?: string };
    collectedAt: string;
    sealNumber: string;
  };
  handover?: { to: string; at: string; note: string };
  scans: DemoScan[];
  note: string;
  /** Raised by the tablet with the scan's escalation (case stays with the supervisors afterwards). */
  escalation?: { scan: number; raisedAt: string; reason: string; hazardClasses: string[] };
  /** Left open on the tablet (not submitted) when false; submitted by default. */
  submit?: boolean;
  decisions: DemoDecision[];
}

const ETHANOL_IR: Omit<DemoScan, 'recordedAt'> = { file: 'synthetic-ir-ethanol-liquid.csv', technique: 'ir', phase: 'condensed' };
const POLYSTYRENE_IR: Omit<DemoScan, 'recordedAt'> = { file: 'synthetic-ir-polystyrene-film.csv', technique: 'ir', phase: 'condensed' };
const AMMONIUM_NITRATE_RAMAN: Omit<DemoScan, 'recordedAt'> = {
  file: 'synthetic-raman-ammonium-nitrate-785.csv',
  technique: 'raman',
  phase: 'condensed',
  excitationNm: 785,
};

/**
 * The demo's working day in Port Averin: cases at each stage of review, each with a synthetic scan whose raw
 * file is on the server. Invented sites and people; every text says "demo". Cases open on a tablet are the
 * tablet's own, so none is seeded.
 */
export const DEMO_CASES: readonly DemoCase[] = [
  {
    key: 'ferry-terminal-jerrycan',
    siteName: 'Ferry terminal car deck, Port Averin (demo)',
    address: 'Berth 2, Ferry Terminal Road, Port Averin',
    latitude: 51.2118,
    longitude: -3.4307,
    startedAt: '2026-11-30T07:40:00.000Z',
    weatherNotes: 'Overcast, 9 °C, light drizzle (demo)',
    accessNotes: 'Car deck closed by the terminal duty manager (demo)',
    sample: {
      label: 'FT-01',
      container: 'Amber glass bottle, PTFE-lined cap',
      description: 'Clear liquid leaking from an unlabelled jerrycan (demo)',
      locationOnSite: 'Lane 4, beside the stairwell',
      observations: { colour: 'colourless', state: 'liquid', notes: 'About 2 L pooled under the jerrycan (demo)' },
      collectedAt: '2026-11-30T07:58:00.000Z',
      sealNumber: 'PA-DEMO-0101',
    },
    scans: [{ ...ETHANOL_IR, recordedAt: '2026-11-30T08:05:00.000Z' }],
    note: 'Jerrycan moved to the spill tray; no ignition sources on the deck (demo).',
    decisions: [],
  },
  {
    key: 'estate-packaging-sheet',
    siteName: 'Unit 14, Kestrel Industrial Estate (demo)',
    address: '14 Kestrel Way, Port Averin',
    latitude: 51.1987,
    longitude: -3.3921,
    startedAt: '2026-11-29T13:10:00.000Z',
    weatherNotes: 'Dry, 11 °C (demo)',
    accessNotes: 'Key holder on site (demo)',
    sample: {
      label: 'KE-01',
      container: 'Sample bag, heat-sealed',
      description: 'Clear rigid film from a dumped packaging bale (demo)',
      locationOnSite: 'Yard, north fence',
      observations: { colour: 'clear', state: 'solid' },
      collectedAt: '2026-11-29T13:25:00.000Z',
      sealNumber: 'PA-DEMO-0102',
    },
    handover: { to: 'Evidence store, K. Marrow (demo)', at: '2026-11-29T16:00:00.000Z', note: 'Seal intact at hand-over (demo)' },
    scans: [{ ...POLYSTYRENE_IR, recordedAt: '2026-11-29T13:31:00.000Z' }],
    note: 'Bale appears to be packaging waste only (demo).',
    decisions: [{ kind: 'accept', scan: 0, comment: 'Film matches the reference standard material (demo)' }],
  },
  {
    key: 'docks-warehouse-drum',
    siteName: 'Warehouse C, Northern Docks (demo)',
    address: 'Dock Road 31, Port Averin',
    latitude: 51.2201,
    longitude: -3.4144,
    startedAt: '2026-11-28T09:00:00.000Z',
    weatherNotes: 'Windy, 7 °C (demo)',
    accessNotes: 'Escorted by the warehouse foreman (demo)',
    sample: {
      label: 'ND-01',
      container: 'Amber glass vial',
      description: 'Liquid from a corroded 200 L drum without a label (demo)',
      locationOnSite: 'Aisle 6, bottom rack',
      observations: { colour: 'colourless', state: 'liquid' },
      collectedAt: '2026-11-28T09:20:00.000Z',
      sealNumber: 'PA-DEMO-0103',
    },
    scans: [{ ...ETHANOL_IR, recordedAt: '2026-11-28T09:27:00.000Z' }],
    note: 'Drum bung loose; area ventilated (demo).',
    decisions: [
      { kind: 'accept', scan: 0 },
      { kind: 'return', comment: 'Please add a photo of the drum markings and the hand-over to the evidence store (demo).' },
    ],
  },
  {
    key: 'quay-four-bonded-store',
    siteName: 'Bonded store, Quay 4 (demo)',
    address: 'Quay 4, Harbour Estate, Port Averin',
    latitude: 51.2156,
    longitude: -3.4229,
    startedAt: '2026-11-26T10:15:00.000Z',
    weatherNotes: 'Sunny, 10 °C (demo)',
    accessNotes: 'Customs officer present (demo)',
    sample: {
      label: 'Q4-01',
      container: 'Sample bag',
      description: 'Film wrap and a small bottle of liquid from a seized pallet (demo)',
      locationOnSite: 'Cage 2',
      observations: { state: 'mixed', notes: 'Two items from one pallet (demo)' },
      collectedAt: '2026-11-26T10:40:00.000Z',
      sealNumber: 'PA-DEMO-0104',
    },
    handover: { to: 'Customs laboratory courier (demo)', at: '2026-11-26T15:30:00.000Z', note: 'Seal intact at hand-over (demo)' },
    scans: [
      { ...POLYSTYRENE_IR, recordedAt: '2026-11-26T10:48:00.000Z' },
      { ...ETHANOL_IR, recordedAt: '2026-11-26T10:55:00.000Z' },
    ],
    note: 'Pallet declared as household goods (demo).',
    decisions: [
      { kind: 'accept', scan: 0 },
      { kind: 'accept', scan: 1 },
      { kind: 'sign_off', comment: 'Presumptive identifications reviewed; matches the declaration (demo).' },
    ],
  },
  {
    key: 'rail-sidings-sacks',
    siteName: 'Rail sidings, Gasworks Lane (demo)',
    address: 'Gasworks Lane sidings, Port Averin',
    latitude: 51.2049,
    longitude: -3.4012,
    startedAt: '2026-11-30T14:20:00.000Z',
    weatherNotes: 'Dry, 8 °C, calm (demo)',
    accessNotes: 'Track possession until 18:00 (demo)',
    sample: {
      label: 'RS-01',
      container: 'Anti-static sample jar',
      description: 'White prills from split sacks in a wagon (demo)',
      locationOnSite: 'Wagon 3, floor',
      observations: { colour: 'white', state: 'solid', notes: 'Prills, slightly damp (demo)' },
      collectedAt: '2026-11-30T14:45:00.000Z',
      sealNumber: 'PA-DEMO-0105',
    },
    scans: [{ ...AMMONIUM_NITRATE_RAMAN, recordedAt: '2026-11-30T14:52:00.000Z' }],
    note: 'Sacks left in place; wagon cordoned off pending the safety officer (demo).',
    escalation: {
      scan: 0,
      raisedAt: '2026-11-30T14:53:00.000Z',
      reason: 'Explosive precursor: Ammonium nitrate (demo)',
      hazardClasses: ['oxidising-solid'],
    },
    decisions: [],
  },
];
