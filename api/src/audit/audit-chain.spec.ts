import { createHash } from 'node:crypto';
import type { AuditChainHead } from './audit-chain-head.entity';
import { checkEntries, walkChain } from './audit-chain';
import type { AuditEntry } from './audit-entry.entity';
import { canonicalJson, entryHash, GENESIS_HASH } from './audit-hash';

/** A valid chain of `n` entries and its head. */
function chain(n: number): { entries: AuditEntry[]; head: AuditChainHead } {
  const entries: AuditEntry[] = [];
  let prevHash = GENESIS_HASH;
  for (let seq = 1; seq <= n; seq += 1) {
    const entry = {
      seq, at: new Date(Date.UTC(2026, 10, 30, 9, 0, seq)), actorId: null, actorRole: null, entity: 'case', entityId: `c${seq}`,
      caseId: null, action: 'create', before: null, after: canonicalJson({ n: seq }), prevHash, hash: '',
    } as AuditEntry;
    entry.hash = entryHash(entry);
    prevHash = entry.hash;
    entries.push(entry);
  }
  return { entries, head: { id: 1, lastSeq: n, lastHash: prevHash } };
}

/** Reads like the database does: entries after a seq, in seq order, `limit` at most; counts the reads. */
function reader(entries: AuditEntry[]) {
  const reads: number[] = [];
  const read = async (afterSeq: number, limit: number) => {
    reads.push(afterSeq);
    return [...entries].sort((a, b) => a.seq - b.seq).filter((entry) => entry.seq > afterSeq).slice(0, limit);
  };
  return { read, reads };
}

describe('canonicalJson', () => {
  it('sorts keys at every depth, keeps array order and writes dates as ISO strings', () => {
    expect(canonicalJson({ b: 1, a: { d: [3, { z: 1, y: 2 }], c: null }, e: new Date('2026-11-30T08:00:00Z'), u: undefined })).toBe(
      '{"a":{"c":null,"d":[3,{"y":2,"z":1}]},"b":1,"e":"2026-11-30T08:00:00.000Z"}',
    );
  });

  it('gives one text for the same content in any key order', () => {
    expect(canonicalJson({ x: 'é', y: [1.5, true] })).toBe(canonicalJson(JSON.parse('{"y":[1.5,true],"x":"é"}')));
  });

  it('takes every value as JSON does: members without a JSON value left out, null in arrays, toJSON and class instances through JSON', () => {
    class Reading {
      constructor(readonly cm1: number, readonly hidden?: string) {}
    }
    const bare = Object.assign(Object.create(null) as object, { b: 2, a: 1 });
    const value = {
      z: [undefined, () => 1, Symbol('s'), new Date('2026-11-30T08:00:00Z'), NaN, -0, [, 2]],
      f: () => 1,
      'ü key': { toJSON: () => ({ y: 1, x: [new Date(0)] }) },
      reading: new Reading(1601.2),
      map: new Map([['k', 1]]),
      bare,
      text: 'line\n"quoted" \u2028',
      nested: { deeper: { deepest: [{ b: null, a: undefined }] } },
    };
    expect(canonicalJson(value)).toBe(
      '{"bare":{"a":1,"b":2},"map":{},"nested":{"deeper":{"deepest":[{"b":null}]}},"reading":{"cm1":1601.2},' +
        '"text":"line\\n\\"quoted\\" \u2028","z":[null,null,null,"2026-11-30T08:00:00.000Z",null,0,[null,2]],' +
        '"ü key":{"x":["1970-01-01T00:00:00.000Z"],"y":1}}',
    );
    expect(canonicalJson(undefined)).toBe('null');
  });
});

describe('entryHash', () => {
  it('is the SHA-256 of the canonical JSON of the fields and changes with any one of them', () => {
    const [entry] = chain(1).entries;
    const text = canonicalJson({ ...entry, hash: undefined, at: entry.at.toISOString() });
    expect(entry.hash).toBe(createHash('sha256').update(text).digest('hex'));
    expect(entryHash({ ...entry, actorRole: 'inspector' })).not.toBe(entry.hash);
    expect(entryHash({ ...entry, prevHash: '1'.repeat(64) })).not.toBe(entry.hash);
  });
});

describe('walkChain', () => {
  it('checks every entry across pages and accepts an empty chain', async () => {
    const { entries, head } = chain(10);
    const { read, reads } = reader(entries);
    expect(await walkChain(head, 3, read)).toEqual({ ok: true, checked: 10 });
    expect(reads).toEqual([0, 3, 6, 9]);
    expect(await walkChain({ id: 1, lastSeq: 0, lastHash: GENESIS_HASH }, 3, reader([]).read)).toEqual({ ok: true, checked: 0 });
  });

  it('names a changed entry, a gap, a broken link and a cut-off end', async () => {
    const { entries, head } = chain(8);
    const changed = entries.map((entry) => (entry.seq === 5 ? { ...entry, after: '{"n":50}' } : entry));
    expect(await walkChain(head, 3, reader(changed).read)).toEqual({
      ok: false, checked: 4, firstBroken: { seq: 5, reason: expect.stringMatching(/^content hash mismatch/) },
    });
    const gap = entries.filter((entry) => entry.seq !== 4);
    expect((await walkChain(head, 3, reader(gap).read)).firstBroken).toEqual({ seq: 4, reason: expect.stringMatching(/^gap in seq: entry 4/) });
    const rehashed = entries.map((entry) => (entry.seq === 6 ? { ...entry, after: '{"n":60}', hash: entryHash({ ...entry, after: '{"n":60}' }) } : entry));
    expect((await walkChain(head, 3, reader(rehashed).read)).firstBroken).toEqual({ seq: 7, reason: expect.stringMatching(/^prevHash mismatch/) });
    expect((await walkChain(head, 3, reader(entries.slice(0, 6)).read)).firstBroken).toEqual({ seq: 7, reason: expect.stringMatching(/^gap in seq: entries 7 to 8/) });
    expect((await walkChain({ ...head, lastHash: GENESIS_HASH }, 3, reader(entries).read)).firstBroken).toEqual({ seq: 8, reason: expect.stringMatching(/chain head/) });
  });
});

describe('checkEntries', () => {
  const { entries } = chain(8);
  const mine = [entries[0], entries[3], entries[4], entries[7]];
  const hashBefore = (all: AuditEntry[]) => (seq: number) => all.find((entry) => entry.seq === seq - 1)?.hash;

  it('vouches for some entries and their links, whatever the others hold', () => {
    const others = entries.map((entry) => (mine.includes(entry) ? entry : { ...entry, after: canonicalJson({ n: 'changed' }) }));
    expect(checkEntries(mine, hashBefore(others))).toEqual({ ok: true, checked: 4 });
  });

  it('names a changed entry, an entry whose predecessor was rehashed, and a missing predecessor', () => {
    const changed = mine.map((entry) => (entry.seq === 5 ? { ...entry, after: canonicalJson({ n: 'changed' }) } : entry));
    expect(checkEntries(changed, hashBefore(entries)).firstBroken).toEqual({ seq: 5, reason: expect.stringMatching(/^content hash mismatch/) });
    const rehashed = entries.map((entry) => (entry.seq === 3 ? { ...entry, hash: 'f'.repeat(64) } : entry));
    expect(checkEntries(mine, hashBefore(rehashed))).toEqual({ ok: false, checked: 1, firstBroken: { seq: 4, reason: expect.stringMatching(/^prevHash mismatch/) } });
    expect(checkEntries(mine, hashBefore(entries.filter((entry) => entry.seq !== 7))).firstBroken).toEqual({ seq: 7, reason: expect.stringMatching(/^gap in seq/) });
  });
});
