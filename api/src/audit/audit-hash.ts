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
 * text. Values are taken as JSON takes them (dates become ISO strings, undefined members disappear, in
 * arrays they become null), in one walk: plain data is written directly, anything else (a value with
 * `toJSON` other than a date, a class instance) first goes through JSON.
 */
export function canonicalJson(value: unknown): string {
  return write(value ?? null);
}

/** Nothing in JSON: left out of an object, null in an array. */
const isOmitted = (value: unknown) => value === undefined || typeof value === 'function' || typeof value === 'symbol';

function write(value: unknown): string {
  if (value === null || typeof value !== 'object') return JSON.stringify(value);
  if (value instanceof Date) return JSON.stringify(value);
  if (Array.isArray(value)) {
    let text = '[';
    for (let i = 0; i < value.length; i += 1) {
      const item: unknown = value[i];
      text += `${i ? ',' : ''}${isOmitted(item) ? 'null' : write(item)}`;
    }
    return `${text}]`;
  }
  const prototype: unknown = Object.getPrototypeOf(value);
  if ((prototype !== Object.prototype && prototype !== null) || typeof (value as { toJSON?: unknown }).toJSON === 'function') {
    return write(JSON.parse(JSON.stringify(value)) as unknown);
  }
  const record = value as Record<string, unknown>;
  let text = '{';
  for (const key of Object.keys(record).sort()) {
    const member = record[key];
    if (isOmitted(member)) continue;
    text += `${text.length > 1 ? ',' : ''}${JSON.stringify(key)}:${write(member)}`;
  }
  return `${text}}`;
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
