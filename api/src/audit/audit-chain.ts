import type { AuditChainHead } from './audit-chain-head.entity';
import type { AuditEntry } from './audit-entry.entity';
import { entryHash, GENESIS_HASH } from './audit-hash';

/** Where the chain breaks and why. */
export interface BrokenLink {
  seq: number;
  reason: string;
}

/** How far a walk along the chain has come: the next seq and prevHash it expects. */
export interface ChainPosition {
  nextSeq: number;
  prevHash: string;
}

/**
 * Checks one entry against the entry before it (`prevHash`: that entry's stored hash, the genesis hash
 * for entry 1): its content still gives its hash, and it names the previous entry's hash. Returns the
 * broken link, or null.
 */
export function checkEntry(entry: AuditEntry, prevHash: string): BrokenLink | null {
  if (entryHash(entry) !== entry.hash) {
    return { seq: entry.seq, reason: 'content hash mismatch: the entry was changed after it was written' };
  }
  if (entry.prevHash !== prevHash) {
    return { seq: entry.seq, reason: `prevHash mismatch: it does not name the hash of entry ${entry.seq - 1}` };
  }
  return null;
}

/**
 * Checks the next entry of a walk in seq order: no seq skipped or repeated, then `checkEntry`.
 * Returns the first broken link, or null.
 */
export function checkLink(entry: AuditEntry, position: ChainPosition): BrokenLink | null {
  if (entry.seq !== position.nextSeq) {
    return entry.seq > position.nextSeq
      ? { seq: position.nextSeq, reason: `gap in seq: entry ${position.nextSeq} is missing (the next one is ${entry.seq})` }
      : { seq: entry.seq, reason: `seq out of order: ${entry.seq} found where ${position.nextSeq} was expected` };
  }
  return checkEntry(entry, position.prevHash);
}

/** The answer of a walk: every entry checked, or the first broken link. */
export interface ChainReport {
  ok: boolean;
  checked: number;
  firstBroken?: BrokenLink;
}

/**
 * Walks the whole chain in seq order, `pageSize` entries per read (`readPage` gives the entries after a
 * seq, in seq order), and names the first broken link: a changed entry, a missing or reordered one, or a
 * chain head that no longer matches the last entry (entries removed from the end).
 */
export async function walkChain(
  head: AuditChainHead,
  pageSize: number,
  readPage: (afterSeq: number, limit: number) => Promise<AuditEntry[]>,
): Promise<ChainReport> {
  const position: ChainPosition = { nextSeq: 1, prevHash: GENESIS_HASH };
  let checked = 0;
  for (;;) {
    const page = await readPage(position.nextSeq - 1, pageSize);
    for (const entry of page) {
      const broken = checkLink(entry, position);
      if (broken) return { ok: false, checked, firstBroken: broken };
      checked += 1;
      position.nextSeq = entry.seq + 1;
      position.prevHash = entry.hash;
    }
    if (page.length < pageSize) break;
  }
  const tail = checkTail(head, position);
  return tail ? { ok: false, checked, firstBroken: tail } : { ok: true, checked };
}

/** The chain head must name the last entry walked; otherwise entries were removed from the end. */
function checkTail(head: AuditChainHead, position: ChainPosition): BrokenLink | null {
  const lastSeq = position.nextSeq - 1;
  if (head.lastSeq > lastSeq) {
    return { seq: lastSeq + 1, reason: `gap in seq: entries ${lastSeq + 1} to ${head.lastSeq} are missing from the end` };
  }
  if (head.lastSeq < lastSeq || head.lastHash !== position.prevHash) {
    return { seq: lastSeq, reason: `the chain head names entry ${head.lastSeq} with another hash than the last entry ${lastSeq}` };
  }
  return null;
}

/**
 * Checks some entries (one case's, in seq order) each by `checkEntry` against its predecessor
 * (`hashBefore`: the stored hash of the entry at seq - 1, whoever's it is; undefined when that entry is
 * missing). Vouches for these entries and their links only, not for the rest of the chain.
 */
export function checkEntries(entries: readonly AuditEntry[], hashBefore: (seq: number) => string | undefined): ChainReport {
  let checked = 0;
  for (const entry of entries) {
    const prevHash = entry.seq === 1 ? GENESIS_HASH : hashBefore(entry.seq);
    const broken = prevHash === undefined ? { seq: entry.seq - 1, reason: `gap in seq: entry ${entry.seq - 1}, the one before entry ${entry.seq}, is missing` } : checkEntry(entry, prevHash);
    if (broken) return { ok: false, checked, firstBroken: broken };
    checked += 1;
  }
  return { ok: true, checked };
}
