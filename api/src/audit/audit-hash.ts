import { createHash } from 'node:crypto';

/** The prevHash of the first entry: 64 zeros. */
export const GENESIS_HASH = '0'.repeat(64);

/** The fields an entry's hash covers, as stored. */
export interface HashedFields {
  seq: number;
  at: Date;
  actorId: string | null;
  actorRole: string | null;
  entity: string;
  entityId: string;
  caseId: string | null;
  action: string;
  /** Canonical JSON text, or null. */
  before: string | null;
  after: string | null;
  prevHash: string;
}

/**
 * JSON with object keys sorted at every depth and no whitespace, so the same value always gives the same
 * text. Values are first taken through JSON (dates become ISO strings, undefined members disappear).
 */
export function canonicalJson(value: unknown): string {
  const plain: unknown = JSON.parse(JSON.stringify(value ?? null));
  return write(plain);
}

function write(value: unknown): string {
  if (Array.isArray(value)) return `[${value.map(write).join(',')}]`;
  if (value !== null && typeof value === 'object') {
    const record = value as Record<string, unknown>;
    const members = Object.keys(record)
      .sort()
      .map((key) => `${JSON.stringify(key)}:${write(record[key])}`);
    return `{${members.join(',')}}`;
  }
  return JSON.stringify(value);
}

/** SHA-256 (lower-case hex) over the canonical JSON of an entry's fields, prevHash included. */
export function entryHash(fields: HashedFields): string {
  const text = canonicalJson({
    seq: fields.seq,
    at: fields.at.toISOString(),
    actorId: fields.actorId,
    actorRole: fields.actorRole,
    entity: fields.entity,
    entityId: fields.entityId,
    caseId: fields.caseId,
    action: fields.action,
    before: fields.before,
    after: fields.after,
    prevHash: fields.prevHash,
  });
  return createHash('sha256').update(text, 'utf8').digest('hex');
}
