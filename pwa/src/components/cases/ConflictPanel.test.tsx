import { cleanup, fireEvent, render, screen, waitFor, within } from '@testing-library/react';
import { afterEach, beforeAll, describe, expect, it } from 'vitest';
import { createApiClient, type ApiClient } from '../../features/api/client';
import { captureDb } from '../../features/cases/captureDb';
import { saveCase } from '../../features/cases/saveCase';
import { addNote, editNote } from '../../features/notes/addNote';
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
});
