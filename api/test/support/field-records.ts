import { createHash, randomUUID } from 'node:crypto';
import type { TestApp } from './test-app';

/** One change as the tablet would push it. */
export interface Change {
  changeId: string;
  entity: string;
  op: 'upsert' | 'delete';
  id: string;
  baseVersion: number | null;
  data?: Record<string, unknown>;
}

/** An upsert with a fresh changeId. */
export function upsert(entity: string, id: string, data: Record<string, unknown>, baseVersion: number | null = null): Change {
  return { changeId: randomUUID(), entity, op: 'upsert', id, baseVersion, data };
}

/** A delete with a fresh changeId. */
export function remove(entity: string, id: string, baseVersion: number): Change {
  return { changeId: randomUUID(), entity, op: 'delete', id, baseVersion };
}

/** Lower-case hex SHA-256. */
export function sha256(bytes: Buffer): string {
  return createHash('sha256').update(bytes).digest('hex');
}

/** Invented demo data of a site visit, so each test can make its own case. */
export const demo = {
  case: (overrides: Record<string, unknown> = {}) => ({
    siteName: 'Quay 7 drum store, Port Averin',
    address: '7 Breakwater Road, Port Averin',
    latitude: 51.2034,
    longitude: -3.4102,
    locationAccuracyM: 8,
    locationEnteredByHand: false,
    startedAt: '2026-11-30T08:15:00.000Z',
    weatherNotes: 'Dry, light onshore wind',
    accessNotes: 'Gate B, escorted by harbour staff',
    status: 'open',
    ...overrides,
  }),
  sample: (caseId: string, overrides: Record<string, unknown> = {}) => ({
    caseId,
    label: 'S-01',
    container: 'Amber glass vial, PTFE-lined cap',
    description: 'White crystalline powder from a split sack',
    locationOnSite: 'Bay 3, second pallet',
    observations: { colour: 'white', state: 'powder', notes: 'No visible moisture' },
    collectedBy: 'R. Ashdown',
    collectedAt: '2026-11-30T08:40:00.000Z',
    sealNumber: 'PA-000431',
    ...overrides,
  }),
  handover: (sampleId: string) => ({
    sampleId,
    from: 'R. Ashdown',
    to: 'Courier M. Pell',
    at: '2026-11-30T11:05:00.000Z',
    sealNumber: 'PA-000431',
    note: 'Seal intact at hand-over',
  }),
  instrumentCheck: (caseId: string) => ({
    caseId,
    standardId: 'polystyrene',
    performedAt: '2026-11-30T08:20:00.000Z',
    passed: true,
    offsets: [{ expectedCm1: 1601.2, observedCm1: 1601.9, offsetCm1: 0.7 }],
  }),
  scan: (sampleId: string, overrides: Record<string, unknown> = {}) => ({
    sampleId,
    technique: 'raman',
    phase: 'condensed',
    excitationNm: 785,
    recordedAt: '2026-11-30T08:55:00.000Z',
    parsedSummary: { points: 1500, fromCm1: 200, toCm1: 3200 },
    result: { codeVersion: '0.1.0', libraryVersion: 'demo-1', parameters: { smoothing: 7 }, candidates: [{ id: 'demo-a', bandAgreement: 0.82 }] },
    inspectorAcknowledgedAt: '2026-11-30T08:56:00.000Z',
    ...overrides,
  }),
  note: (caseId: string, sampleId: string | null = null) => ({
    caseId,
    sampleId,
    text: 'Sacks stacked against a warm wall; moved samples to shade',
    recordedAt: '2026-11-30T09:10:00.000Z',
  }),
  photo: (ownerType: string, ownerId: string, bytes: Buffer, overrides: Record<string, unknown> = {}) => ({
    ownerType,
    ownerId,
    kind: 'photo',
    fileName: 'bay3.jpg',
    contentType: 'image/jpeg',
    size: bytes.length,
    sha256: sha256(bytes),
    ...overrides,
  }),
};

/** Pushes changes as one batch and returns the results (fails the test on anything but 200). */
export async function push(t: TestApp, token: string, changes: Change[], batchId: string = randomUUID()) {
  const response = await t
    .http()
    .post('/api/sync/push')
    .set('Authorization', `Bearer ${token}`)
    .send({ clientId: 'e2e-tablet', batchId, changes });
  if (response.status !== 200) throw new Error(`push gave ${response.status}: ${JSON.stringify(response.body)}`);
  return response.body.results as { changeId: string; status: string; version?: number; reason?: string; firstStatus?: string; server?: { version: number; data: Record<string, unknown> } }[];
}

/** Pulls every change after the cursor, following `hasMore`. */
export async function pullAll(t: TestApp, token: string, cursor = '0') {
  const changes: { entity: string; id: string; version: number; syncSeq: number; deleted: boolean; data: Record<string, unknown> }[] = [];
  for (;;) {
    const response = await t.http().get('/api/sync/pull').query({ cursor, limit: 50 }).set('Authorization', `Bearer ${token}`);
    if (response.status !== 200) throw new Error(`pull gave ${response.status}: ${JSON.stringify(response.body)}`);
    changes.push(...response.body.changes);
    cursor = response.body.cursor;
    if (!response.body.hasMore) return { changes, cursor };
  }
}

/** Uploads a whole file in one request. */
export function uploadWhole(t: TestApp, token: string, id: string, bytes: Buffer, contentType: string) {
  return t.http().put(`/api/attachments/${id}/content`).set('Authorization', `Bearer ${token}`).set('Content-Type', contentType).send(bytes);
}
