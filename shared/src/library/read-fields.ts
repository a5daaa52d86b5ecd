/**
 * Small typed readers for validating raw JSON: each throws a TypeError that names the compound
 * and the field, so a bad library file is reported precisely and nothing is half-loaded.
 */
import type { SourceBasis, SourceRef } from '../hazards/types.js';

/** A raw JSON object with the path used in error messages. */
export interface Fields {
  readonly o: Record<string, unknown>;
  readonly where: string;
}

const BASES: readonly SourceBasis[] = ['read', 'from memory', 'common practice', 'computed', 'invented'];

/** Throw the library's validation error. */
export function fail(where: string, message: string): never {
  throw new TypeError(`Compound library: ${where}: ${message}`);
}

/** Treat a value as a JSON object or fail. */
export function asFields(value: unknown, where: string): Fields {
  if (typeof value !== 'object' || value === null || Array.isArray(value)) fail(where, 'must be an object');
  return { o: value as Record<string, unknown>, where };
}

/** A required non-empty string field. */
export function str(f: Fields, key: string): string {
  const v = f.o[key];
  if (typeof v !== 'string' || v.trim() === '') fail(`${f.where}.${key}`, 'must be a non-empty string');
  return v;
}

/** An optional string field. */
export function optStr(f: Fields, key: string): string | undefined {
  return f.o[key] === undefined ? undefined : str(f, key);
}

/** A required finite number field within [min, max]. */
export function num(f: Fields, key: string, min: number, max: number): number {
  const v = f.o[key];
  if (typeof v !== 'number' || !Number.isFinite(v) || v < min || v > max) fail(`${f.where}.${key}`, `must be a number in ${min}..${max}, got ${JSON.stringify(v)}`);
  return v;
}

/** A required array field (possibly empty unless `nonEmpty`). */
export function arr(f: Fields, key: string, nonEmpty = false): unknown[] {
  const v = f.o[key];
  if (!Array.isArray(v) || (nonEmpty && v.length === 0)) fail(`${f.where}.${key}`, nonEmpty ? 'must be a non-empty list' : 'must be a list');
  return v;
}

/** A string that must be one of the allowed values. */
export function oneOf<T extends string>(f: Fields, key: string, allowed: readonly T[]): T {
  const v = str(f, key);
  if (!(allowed as readonly string[]).includes(v)) fail(`${f.where}.${key}`, `"${v}" is not one of ${allowed.join(', ')}`);
  return v as T;
}

/** A source reference whose key must be in the library's source list. */
export function source(value: unknown, where: string, sources: ReadonlySet<string>): SourceRef {
  const f = asFields(value, where);
  const ref = str(f, 'ref');
  if (!sources.has(ref)) fail(`${where}.ref`, `"${ref}" is not in the library's source list`);
  const basis = oneOf(f, 'basis', BASES);
  const note = optStr(f, 'note');
  return note === undefined ? { ref, basis } : { ref, basis, note };
}
