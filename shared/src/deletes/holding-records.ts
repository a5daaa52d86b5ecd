/**
 * What keeps a case, a sample or a scan from being deleted: the live records below it. The server
 * counts them in MariaDB when a delete arrives, the tablet counts them in IndexedDB before it offers
 * one, both from these lists, so the two can never disagree on what blocks a delete.
 */

/** The records the inspector may delete that other records can hold. */
export type HeldEntity = 'case' | 'sample' | 'scan';

/** The kinds of record that hold one above them, as both sides count them. */
export type HoldingKind = 'sample' | 'siteNote' | 'photo' | 'rawScanFile' | 'instrumentCheck' | 'escalation' | 'handover' | 'scan' | 'decision';

/** A kind of holding record: how a refusal names it (plural), and whether it is permanent (never deleted). */
export interface HoldingKindInfo {
  readonly label: string;
  readonly permanent: boolean;
}

/** Permanent records are never deleted, so a record one of them holds is kept for good. */
export const HOLDING_KINDS: Readonly<Record<HoldingKind, HoldingKindInfo>> = {
  sample: { label: 'samples', permanent: false },
  siteNote: { label: 'site notes', permanent: false },
  photo: { label: 'photos', permanent: false },
  rawScanFile: { label: 'raw scan files', permanent: true },
  instrumentCheck: { label: 'instrument checks', permanent: true },
  escalation: { label: 'escalations', permanent: true },
  handover: { label: 'hand-overs', permanent: true },
  scan: { label: 'scans', permanent: false },
  decision: { label: 'review decisions', permanent: true },
};

/**
 * The records that hold each deletable record, in the order a refusal names them. A case's photos and
 * raw scan files are every attachment of the case (of its samples and scans too); a sample's photos are
 * its own, a scan's its own (its raw file never holds it: it stays when the scan goes).
 */
export const HOLDING_RECORDS = {
  case: ['sample', 'siteNote', 'photo', 'rawScanFile', 'instrumentCheck', 'escalation'],
  sample: ['handover', 'scan', 'siteNote', 'photo'],
  scan: ['escalation', 'decision', 'photo'],
} as const satisfies Readonly<Record<HeldEntity, readonly HoldingKind[]>>;

/** The kinds that hold records of one entity. */
export type HoldingKindOf<E extends HeldEntity> = (typeof HOLDING_RECORDS)[E][number];

/** How many live records of one kind hold the record. */
export interface HeldCount {
  readonly kind: HoldingKind;
  readonly count: number;
}

/** Why a record cannot be deleted now: what holds it, and whether any of that is permanent (then never). */
export interface DeleteBlock {
  /** The kinds with at least one live record, in the list's order. */
  readonly held: readonly HeldCount[];
  /** The held kinds that are permanent: while any is listed the record can never be deleted. */
  readonly permanent: readonly HoldingKind[];
}

/**
 * Counts each holding kind of `entity` with `count` (a database query on either side) and returns what
 * blocks the delete, or null when nothing does.
 */
export async function findDeleteBlock<E extends HeldEntity>(entity: E, count: (kind: HoldingKindOf<E>) => Promise<number>): Promise<DeleteBlock | null> {
  const held: HeldCount[] = [];
  for (const kind of HOLDING_RECORDS[entity] as readonly HoldingKindOf<E>[]) {
    const n = await count(kind);
    if (!Number.isInteger(n) || n < 0) throw new RangeError(`A count of ${kind} must be a whole number of at least 0, not ${n}`);
    if (n > 0) held.push({ kind, count: n });
  }
  if (held.length === 0) return null;
  return { held, permanent: held.filter((h) => HOLDING_KINDS[h.kind].permanent).map((h) => h.kind) };
}

/** The server's reason for refusing the delete (`Sample <id> cannot be deleted while it holds scans: 1, …`). */
export function deleteRefusal(what: string, block: DeleteBlock): string {
  const held = block.held.map((h) => `${HOLDING_KINDS[h.kind].label}: ${h.count}`).join(', ');
  return `${what} cannot be deleted while it holds ${held}: delete those first (permanent records are never deleted)`;
}
