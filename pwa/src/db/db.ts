import Dexie, { type EntityTable } from 'dexie';
import { DB_NAME } from './dbName';
import { instrumentChecksSchema, type InstrumentCheckRow } from './instrumentChecksTable';
import { libraryCacheSchema, type LibraryCacheRow } from './libraryCacheTable';
import { sessionSchema, type SessionRow } from './sessionTable';
import { captureRowSchema } from './captureRecord';
import type { CaseRow } from './casesTable';
import type { HandoverRow } from './handoversTable';
import type { NoteRow } from './notesTable';
import { outboxSchema, type OutboxRow } from './outboxTable';
import type { PhotoRow } from './photosTable';
import type { SampleRow } from './samplesTable';
import type { ScanRow } from './scansTable';
import type { EscalationRow } from './escalationsTable';
import type { CaseCheckRow } from './caseChecksTable';
import { syncMetaSchema, type SyncMetaRow } from './syncMetaTable';
import { decisionsSchema, type DecisionRow } from './decisionsTable';
import { escalationNotesSchema, type EscalationNoteRow } from './escalationNotesTable';
import { attachmentBytesSchema, type AttachmentBytesRow } from './attachmentBytesTable';

/** Siteband's on-device database; each later version bump adds its own upgrade step here. */
export class SitebandDb extends Dexie {
  session!: EntityTable<SessionRow, 'key'>;
  libraryCache!: EntityTable<LibraryCacheRow, 'key'>;
  instrumentChecks!: EntityTable<InstrumentCheckRow, 'id'>;
  cases!: EntityTable<CaseRow, 'id'>;
  samples!: EntityTable<SampleRow, 'id'>;
  handovers!: EntityTable<HandoverRow, 'id'>;
  notes!: EntityTable<NoteRow, 'id'>;
  photos!: EntityTable<PhotoRow, 'id'>;
  outbox!: EntityTable<OutboxRow, 'seq'>;
  syncMeta!: EntityTable<SyncMetaRow, 'key'>;
  scans!: EntityTable<ScanRow, 'id'>;
  escalations!: EntityTable<EscalationRow, 'id'>;
  caseChecks!: EntityTable<CaseCheckRow, 'id'>;
  decisions!: EntityTable<DecisionRow, 'id'>;
  escalationNotes!: EntityTable<EscalationNoteRow, 'id'>;
  attachmentBytes!: EntityTable<AttachmentBytesRow, 'id'>;

  constructor(name = DB_NAME) {
    super(name);
    // Version 1: only the signed-in session. Cases, samples and scans arrive with their issues.
    this.version(1).stores({ session: sessionSchema });
    // Version 2: the instrument checks. A new table starts empty, so no existing row needs an
    // upgrade function; the session table is carried over unchanged.
    this.version(2).stores({ session: sessionSchema, instrumentChecks: instrumentChecksSchema });
    // Version 3: the compound library as last received from the server. The new table starts empty
    // and no existing row changes, so the upgrade step only records that nothing needs moving.
    this.version(3)
      .stores({ libraryCache: libraryCacheSchema })
      .upgrade(() => undefined);
    // Version 4: field capture (cases, samples, hand-overs, site notes, photos), the outbox of
    // changes for the server and the sync cursor. All new tables start empty; no row moves.
    this.version(4)
      .stores({
        cases: captureRowSchema,
        samples: captureRowSchema,
        handovers: captureRowSchema,
        notes: captureRowSchema,
        photos: captureRowSchema,
        outbox: outboxSchema,
        syncMeta: syncMetaSchema,
      })
      .upgrade(() => undefined);
    // Version 5: scans, escalations and the instrument checks recorded per case. Earlier pulls skipped their records while moving the
    // cursor past them, so the cursor starts over: already-known records merge as unchanged.
    this.version(5)
      .stores({ scans: captureRowSchema, escalations: captureRowSchema, caseChecks: captureRowSchema })
      .upgrade((tx) => tx.table('syncMeta').delete('pullCursor'));
    // Version 7: what reviewers and safety officers write on the server: review decisions and escalation
    // notes (pulled only). Earlier pulls skipped them, and escalations were stored without their server
    // fields, so the cursor starts over: known records merge as unchanged and gain those fields.
    this.version(7)
      .stores({ decisions: decisionsSchema, escalationNotes: escalationNotesSchema })
      .upgrade((tx) => tx.table('syncMeta').delete('pullCursor'));
    // Version 8: attachment files move out of their rows into `attachmentBytes`, so the row's many small
    // updates during a sync no longer copy the file. One file at a time, so the upgrade holds one in memory.
    this.version(8)
      .stores({ attachmentBytes: attachmentBytesSchema })
      .upgrade(async (tx) => {
        const photos = tx.table('photos');
        const withBytes = (await photos.filter((row) => row.bytes !== undefined).primaryKeys()) as string[];
        for (const id of withBytes) {
          const { bytes, ...row } = await photos.get(id);
          await tx.table('attachmentBytes').put({ id, bytes });
          await photos.put({ ...row, bytesHeld: true });
        }
      });
  }
}

/** Opens the named database (tests pass a fresh name each). */
export async function openDb(name?: string): Promise<SitebandDb> {
  const db = new SitebandDb(name);
  await db.open();
  return db;
}
