import { cleanup, fireEvent, render, screen, waitFor, within } from '@testing-library/react';
import { afterEach, beforeAll, describe, expect, it } from 'vitest';
import { scanResultRecord } from '@siteband/shared';
import { createApiClient, type ApiClient } from '../../features/api/client';
import { captureDb } from '../../features/cases/captureDb';
import { saveCase } from '../../features/cases/saveCase';
import { DEFAULT_SCAN_SETTINGS } from '../../features/identify/scanSettings';
import { fixtureScan, identify } from '../../features/identify/testFixtures';
import { addNote, editNote } from '../../features/notes/addNote';
import { saveSample } from '../../features/samples/saveSample';
import { processingSettingsOf, saveScanEdit, storedRawFile } from '../../features/scans/editScan';
import { saveScan } from '../../features/scans/saveScan';
import { pushOutbox } from '../../features/sync/pushOutbox';
import { recordDelete } from '../../features/sync/recordChange';
import { createTestServer, type TestServer } from '../../features/sync/testServer';
import { initI18n } from '../../i18n';
import { addSignedInStrings } from '../../i18n/signedInStrings';
import { ConflictPanel } from './ConflictPanel';

beforeAll(async () => {
  await initI18n();
  addSignedInStrings();
});
afterEach(cleanup);

function clientFor(server: TestServer): ApiClient {
  const tokens = { current: () => ({ accessToken: 'a', refreshToken: 'r' }), save: async () => undefined, clear: async () => undefined };
  return createApiClient({ tokens, fetchFn: server.fetch });
}

/** A synced open case with one site note (invented demo data) that another device then changed on the server. */
async function noteChangedElsewhere(server: TestServer): Promise<{ caseId: string; noteId: string }> {
  const db = captureDb();
  const caseId = crypto.randomUUID();
  await saveCase(db, caseId, {
    siteName: 'Invented demo: loading bay 3', address: null, latitude: null, longitude: null, locationAccuracyM: null,
    locationEnteredByHand: false, startedAt: '2026-03-02T08:30:00.000Z', weatherNotes: null, accessNotes: null, status: 'open',
  });
  const noteId = await addNote(db, caseId, null, 'Drum 4 bulging', new Date('2026-03-02T09:00:00.000Z'));
  await pushOutbox(db, clientFor(server), 'tablet-test');
  server.writeAsOtherDevice('note', noteId, { ...(await db.notes.get(noteId))!.data, text: 'Drum 4 bulging, moved to the bund' });
  return { caseId, noteId };
}

/** A synced IR scan of a liquid (invented demo data) that another device then identified again as a gas, without acknowledging the new result. */
async function scanChangedElsewhere(server: TestServer) {
  const db = captureDb();
  const caseId = crypto.randomUUID();
  const sampleId = crypto.randomUUID();
  await saveCase(db, caseId, {
    siteName: 'Invented demo: solvent store', address: null, latitude: null, longitude: null, locationAccuracyM: null,
    locationEnteredByHand: false, startedAt: '2026-04-01T07:00:00.000Z', weatherNotes: null, accessNotes: null, status: 'open',
  });
  await saveSample(db, sampleId, { caseId, label: 'S-1', container: null, description: null, locationOnSite: null, observations: {}, collectedBy: 'R. Inspector', collectedAt: '2026-04-01T07:10:00.000Z', sealNumber: null });
  const file = fixtureScan('synthetic-ir-ethanol-liquid.csv');
  const { scanId } = await saveScan(db, {
    caseId, sampleId, settings: DEFAULT_SCAN_SETTINGS, file, outcome: identify(file, DEFAULT_SCAN_SETTINGS), check: null,
    recordedAt: '2026-04-01T07:20:00.000Z', acknowledgedAt: '2026-04-01T07:21:00.000Z',
  });
  await pushOutbox(db, clientFor(server), 'tablet-test');
  const synced = (await db.scans.get(scanId))!;

  const gas = identify(file, { ...DEFAULT_SCAN_SETTINGS, phase: 'gas' });
  const serverData = { ...synced.data, phase: 'gas', result: scanResultRecord(gas.result, gas.processed), inspectorAcknowledgedAt: null };
  server.writeAsOtherDevice('scan', scanId, { ...serverData, caseId, resultMismatch: false, serverRecomputedAt: '2026-04-01T09:40:00.000Z', serverRecomputeError: null, mismatch: { differences: [] } });
  return { db, caseId, scanId, synced, serverData };
}

/** The scan changed elsewhere, while this tablet identified it again with a higher peak threshold and acknowledged that: its push came back as a conflict. */
async function scanChangedOnBothSides(server: TestServer) {
  const { db, caseId, scanId, synced, serverData } = await scanChangedElsewhere(server);
  const processing = { ...processingSettingsOf(synced.data, 'ir'), peakThresholdSigma: 6 };
  const outcome = identify((await storedRawFile(db, (await db.photos.get(synced.data.rawAttachmentId))!))!, DEFAULT_SCAN_SETTINGS, processing);
  await saveScanEdit(db, { scan: synced, settings: DEFAULT_SCAN_SETTINGS, reidentified: { outcome, acknowledgedAt: '2026-04-01T09:30:00.000Z' }, check: 'keep' });
  await pushOutbox(db, clientFor(server), 'tablet-test');
  expect((await db.scans.get(scanId))?.sync).toBe('conflict');
  return { db, caseId, scanId, mine: (await db.scans.get(scanId))!.data, serverData };
}

/** The row of the conflict table for one field: its label, the tablet's value and the server's. */
function fieldRow(item: HTMLElement, label: string): string[] {
  const row = within(item).getByRole('rowheader', { name: new RegExp(`^${label}`) }).closest('tr')!;
  return [...row.querySelectorAll('th, td')].map((cell) => cell.textContent ?? '');
}

describe('ConflictPanel', () => {
  it('shows an edit beside the server’s version, field by field, with keep mine or take the server’s', async () => {
    const server = createTestServer();
    const { caseId, noteId } = await noteChangedElsewhere(server);
    const db = captureDb();
    await editNote(db, (await db.notes.get(noteId))!, 'Drum 4 bulging, lid seam weeping');
    await pushOutbox(db, clientFor(server), 'tablet-test');
    render(<ConflictPanel caseId={caseId} />);
    const item = await screen.findByTestId(`conflict-${noteId}`);
    expect(item.dataset.op).toBe('upsert');
    expect(within(item).queryByTestId('conflict-deleted-here')).toBeNull();
    expect(within(item).getByRole('columnheader', { name: "This tablet's copy" })).toBeTruthy();
    expect(item.textContent).toContain('Drum 4 bulging, lid seam weeping');
    expect(item.textContent).toContain('Drum 4 bulging, moved to the bund');
    expect(within(item).getByText('Keep mine')).toBeTruthy();
    expect(within(item).getByText("Take the server's")).toBeTruthy();
  });

  it('says when this tablet deleted the record, shows the server’s version alone, and keeping it brings the record back', async () => {
    const server = createTestServer();
    const { caseId, noteId } = await noteChangedElsewhere(server);
    const db = captureDb();
    await recordDelete(db, 'note', noteId);
    await pushOutbox(db, clientFor(server), 'tablet-test');
    expect((await db.notes.get(noteId))?.sync).toBe('conflict');
    render(<ConflictPanel caseId={caseId} />);
    const item = await screen.findByTestId(`conflict-${noteId}`);
    expect(item.dataset.op).toBe('delete');
    expect(within(item).getByTestId('conflict-deleted-here').textContent).toBe(
      "Deleted on this tablet, and changed on the server meanwhile: the server's version 2 is below.",
    );
    expect(within(item).queryByRole('columnheader', { name: "This tablet's copy" })).toBeNull();
    expect(within(item).getByRole('columnheader', { name: 'Server copy (version 2)' })).toBeTruthy();
    expect(item.textContent).toContain('Drum 4 bulging, moved to the bund');
    expect(within(item).queryByText('Keep mine')).toBeNull();
    expect(within(item).getByText('Delete it anyway')).toBeTruthy();
    fireEvent.click(within(item).getByText("Keep the server's copy"));
    await waitFor(async () => expect(await db.notes.get(noteId)).toMatchObject({ deletePending: undefined, sync: 'server', data: { text: 'Drum 4 bulging, moved to the bund' } }));
    await waitFor(() => expect(screen.queryByTestId('conflicts')).toBeNull());
  });

  it('shows a scan changed on both sides in words, and keeping the tablet’s copy sends its result with its own acknowledgement', async () => {
    const server = createTestServer();
    const { db, caseId, scanId, mine } = await scanChangedOnBothSides(server);
    render(<ConflictPanel caseId={caseId} />);
    const item = await screen.findByTestId(`conflict-${scanId}`);
    expect(within(item).getByRole('heading', { name: 'Scan' })).toBeTruthy();
    expect(item.dataset.op).toBe('upsert');
    expect(fieldRow(item, 'Technique')).toEqual(['Technique', 'IR', 'IR']);
    expect(fieldRow(item, 'Phase')).toEqual(['Phase (differs)', 'Solid or liquid', 'Gas cell']);
    expect(fieldRow(item, 'IR sampling')).toEqual(['IR sampling', 'Diamond ATR', 'Diamond ATR']);
    expect(fieldRow(item, 'Laser line')).toEqual(['Laser line', '—', '—']);
    expect(fieldRow(item, 'Processing')[0]).toBe('Processing (differs)');
    expect(fieldRow(item, 'Processing')[1]).toContain('peaks above 6 × noise');
    expect(fieldRow(item, 'Instrument check')).toEqual(['Instrument check', 'No instrument check', 'No instrument check']);
    const acknowledged = fieldRow(item, 'Acknowledged by the inspector');
    expect(acknowledged[0]).toBe('Acknowledged by the inspector (differs)');
    expect(acknowledged[1]).toMatch(/2026/);
    expect(acknowledged[2]).toBe('Not acknowledged');
    const likely = fieldRow(item, 'Top likely compounds');
    expect(likely[0]).toBe('Top likely compounds (differs)');
    expect(likely[1]).toMatch(/band agreement/);
    expect(within(item).getByTestId('conflict-result-differs').textContent).toMatch(/carries its own acknowledgement/);
    // No ids, hashes or raw JSON.
    expect(item.textContent).not.toContain(mine.rawSha256);
    expect(item.textContent).not.toContain('[object Object]');
    expect(item.textContent).not.toContain('{');

    fireEvent.click(within(item).getByText('Keep mine'));
    await waitFor(async () => expect((await db.scans.get(scanId))?.sync).toBe('local'));
    const outbox = await db.outbox.filter((e) => e.id === scanId).toArray();
    expect(outbox.map((e) => [e.entity, e.op, e.status])).toEqual([['scan', 'upsert', 'pending']]);
    // The tablet's result goes out with the tablet's acknowledgement, whole.
    expect(outbox[0].data).toEqual(mine);
    expect(outbox[0].data).toMatchObject({ inspectorAcknowledgedAt: '2026-04-01T09:30:00.000Z', phase: 'condensed' });
    await waitFor(() => expect(screen.queryByTestId('conflicts')).toBeNull());
    await pushOutbox(db, clientFor(server), 'tablet-test');
    expect(await db.scans.get(scanId)).toMatchObject({ sync: 'server', version: 3 });
    expect(server.records.get(scanId)!.record.data).toMatchObject({ phase: 'condensed', inspectorAcknowledgedAt: '2026-04-01T09:30:00.000Z' });
  }, 60_000);

  it('taking the server’s copy of a scan keeps its result unacknowledged, with the server’s check of it, and sends nothing', async () => {
    const server = createTestServer();
    const { db, caseId, scanId, serverData } = await scanChangedOnBothSides(server);
    render(<ConflictPanel caseId={caseId} />);
    const item = await screen.findByTestId(`conflict-${scanId}`);
    fireEvent.click(within(item).getByText("Take the server's"));
    await waitFor(async () => expect((await db.scans.get(scanId))?.sync).toBe('server'));
    const row = (await db.scans.get(scanId))!;
    expect(row.data).toEqual(serverData);
    expect(row.data.inspectorAcknowledgedAt).toBeNull();
    expect(row.serverCheck).toMatchObject({ resultMismatch: false, serverRecomputedAt: '2026-04-01T09:40:00.000Z' });
    expect(row.version).toBe(2);
    expect(await db.outbox.filter((e) => e.id === scanId).count()).toBe(0);
    await waitFor(() => expect(screen.queryByTestId('conflicts')).toBeNull());
  }, 60_000);

  it('says when this tablet deleted a scan the server changed, shows the server’s scan alone in words, and "delete it anyway" queues the delete', async () => {
    const server = createTestServer();
    const { db, caseId, scanId } = await scanChangedElsewhere(server);
    await recordDelete(db, 'scan', scanId);
    await pushOutbox(db, clientFor(server), 'tablet-test');
    expect((await db.scans.get(scanId))?.sync).toBe('conflict');
    render(<ConflictPanel caseId={caseId} />);
    const item = await screen.findByTestId(`conflict-${scanId}`);
    expect(item.dataset.op).toBe('delete');
    expect(within(item).getByTestId('conflict-deleted-here').textContent).toMatch(/^Deleted on this tablet, and changed on the server meanwhile/);
    expect(within(item).queryByRole('columnheader', { name: "This tablet's copy" })).toBeNull();
    expect(fieldRow(item, 'Phase')).toEqual(['Phase', 'Gas cell']);
    expect(fieldRow(item, 'Acknowledged by the inspector')).toEqual(['Acknowledged by the inspector', 'Not acknowledged']);
    expect(within(item).queryByTestId('conflict-result-differs')).toBeNull();
    expect(item.textContent).not.toContain('{');
    fireEvent.click(within(item).getByText('Delete it anyway'));
    await waitFor(async () => expect((await db.scans.get(scanId))?.sync).toBe('local'));
    const outbox = await db.outbox.filter((e) => e.id === scanId).toArray();
    expect(outbox.map((e) => [e.entity, e.op, e.status])).toEqual([['scan', 'delete', 'pending']]);
    expect(await db.scans.get(scanId)).toMatchObject({ deletePending: true, version: 2 });
    await waitFor(() => expect(screen.queryByTestId('conflicts')).toBeNull());
  }, 60_000);
});
