import { randomUUID } from 'node:crypto';
import { demo, pullAll, push, upsert, type Change } from './support/field-records';
import { startS3Fake, type S3Fake } from './support/s3-fake';
import { DEMO, signIn, startTestApp, type TestApp } from './support/test-app';

/** mulberry32: a small seeded PRNG, so a failing sequence can be replayed exactly. */
function seededRandom(seed: number): () => number {
  let state = seed >>> 0;
  return () => {
    state = (state + 0x6d2b79f5) >>> 0;
    let x = state;
    x = Math.imul(x ^ (x >>> 15), x | 1);
    x ^= x + Math.imul(x ^ (x >>> 7), x | 61);
    return ((x ^ (x >>> 14)) >>> 0) / 4294967296;
  };
}

const SEED = 20261201;
const ROUNDS = 40;

/** What the tablet believes about one record. */
interface KnownRecord {
  entity: 'case' | 'sample' | 'note';
  caseId: string;
  /** The server version from the last answer read; null while an answer is outstanding. */
  version: number | null;
  /** How many changes of this record were sent (each must be applied exactly once). */
  changes: number;
}

describe('Sync when answers are lost after the server committed (e2e, seeded fault injection)', () => {
  let s3: S3Fake;
  let t: TestApp;
  let inspector: string;

  beforeAll(async () => {
    s3 = await startS3Fake();
    t = await startTestApp({ env: s3.env });
    inspector = (await signIn(t, DEMO.inspector)).accessToken;
  });
  afterAll(async () => {
    await t?.close();
    await s3?.close();
  });

  it(`keeps every record exactly once across ${ROUNDS} batches with lost answers (seed ${SEED})`, async () => {
    const random = seededRandom(SEED);
    const pick = <T>(items: T[]): T => items[Math.floor(random() * items.length)];
    const known = new Map<string, KnownRecord>();
    const sentChangeIds = new Set<string>();
    let unanswered: Change[] = [];
    let interruptions = 0;

    /** A new change the tablet can make now: only records whose last answer was read can be edited. */
    const nextChange = (): Change => {
      const cases = [...known].filter(([, record]) => record.entity === 'case');
      const editable = [...known].filter(([, record]) => record.version !== null);
      const roll = random();
      if (cases.length === 0 || roll < 0.2) {
        const id = randomUUID();
        known.set(id, { entity: 'case', caseId: id, version: null, changes: 1 });
        return upsert('case', id, demo.case({ siteName: `Fault site ${known.size}` }));
      }
      if (roll < 0.7 || editable.length === 0) {
        const [caseId] = pick(cases);
        const entity = random() < 0.5 ? 'sample' : 'note';
        const id = randomUUID();
        known.set(id, { entity, caseId, version: null, changes: 1 });
        return upsert(entity, id, entity === 'sample' ? demo.sample(caseId, { label: `S-${known.size}` }) : demo.note(caseId));
      }
      const [id, record] = pick(editable);
      const base = record.version;
      record.version = null;
      record.changes += 1;
      const data =
        record.entity === 'case' ? demo.case({ accessNotes: `edit ${record.changes}` })
        : record.entity === 'sample' ? demo.sample(record.caseId, { description: `edit ${record.changes}` })
        : { ...demo.note(record.caseId), text: `edit ${record.changes}` };
      return upsert(record.entity, id, data, base);
    };

    const read = (batch: Change[], results: Awaited<ReturnType<typeof push>>) => {
      expect(results.map((result) => result.changeId)).toEqual(batch.map((change) => change.changeId));
      for (const [i, result] of results.entries()) {
        // Every change was applied exactly once: at first delivery, or reported as a duplicate of it.
        expect(result.status === 'applied' || (result.status === 'duplicate' && result.firstStatus === 'applied')).toBe(true);
        known.get(batch[i].id)!.version = result.version!;
      }
    };

    for (let round = 0; round < ROUNDS; round++) {
      // Unanswered changes are sent again first, then whatever was made meanwhile.
      const batch = [...unanswered, ...Array.from({ length: 1 + Math.floor(random() * 4) }, nextChange)];
      unanswered = [];
      for (const change of batch) sentChangeIds.add(change.changeId);
      const batchId = randomUUID();
      await push(t, inspector, batch, batchId); // delivered and committed...
      if (random() < 0.6) {
        interruptions += 1; // ...but the answer is lost on the way back
        if (random() < 0.5) read(batch, await push(t, inspector, batch, batchId)); // re-sent at once
        else unanswered = batch; // or carried into the next batch
      } else {
        // The answer arrived; a resend of the same batch changes nothing either way.
        read(batch, await push(t, inspector, batch, batchId));
      }
    }
    if (unanswered.length) read(unanswered, await push(t, inspector, unanswered));
    expect(interruptions).toBeGreaterThanOrEqual(20);

    const tables = { case: 'cases', sample: 'samples', note: 'site_notes' } as const;
    for (const [entity, table] of Object.entries(tables)) {
      const expected = [...known].filter(([, record]) => record.entity === entity);
      const rows: { id: string; version: number }[] = await t.dataSource.query(`SELECT id, version FROM \`${table}\``);
      expect(rows).toHaveLength(expected.length);
      const versions = new Map(rows.map((row) => [row.id, row.version]));
      for (const [id, record] of expected) {
        expect(versions.get(id)).toBe(record.changes);
        expect(record.version).toBe(record.changes);
      }
    }
    const [{ n }] = await t.dataSource.query('SELECT COUNT(*) AS n FROM sync_changes');
    expect(Number(n)).toBe(sentChangeIds.size);

    const { changes } = await pullAll(t, inspector);
    expect(changes).toHaveLength(known.size);
    expect(new Set(changes.map((record) => record.id))).toEqual(new Set(known.keys()));
  });

  it('applies a batch once when three deliveries of it arrive at the same moment', async () => {
    const caseId = randomUUID();
    const batch = [upsert('case', caseId, demo.case()), ...Array.from({ length: 6 }, () => upsert('note', randomUUID(), demo.note(caseId)))];
    const batchId = randomUUID();
    const answers = await Promise.all([push(t, inspector, batch, batchId), push(t, inspector, batch, batchId), push(t, inspector, batch, batchId)]);
    for (const [i, change] of batch.entries()) {
      const statuses = answers.map((results) => results[i].status).sort();
      // Exactly one delivery applied each change; the others saw its stored outcome.
      expect(statuses).toEqual(['applied', 'duplicate', 'duplicate']);
      expect(answers.map((results) => results[i].version)).toEqual([1, 1, 1]);
      expect(change.changeId).toBe(answers[0][i].changeId);
    }
    const [{ n }] = await t.dataSource.query('SELECT COUNT(*) AS n FROM site_notes WHERE caseId = ?', [caseId]);
    expect(Number(n)).toBe(6);
  });
});
