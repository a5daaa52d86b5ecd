import { isDeepStrictEqual } from 'node:util';
import { asObject } from './json-reading';

/** One value that differs between two JSON documents, by its dotted path. */
export interface ValueDifference {
  path: string;
  tablet: unknown;
  server: unknown;
}

/**
 * The leaf values that differ between two JSON objects, in key order, at most `limit` of them. A key
 * missing on one side is shown as null there, so the list survives being stored as JSON.
 */
export function jsonDifferences(tablet: unknown, server: unknown, limit: number, path = ''): ValueDifference[] {
  const left = asObject(tablet);
  const right = asObject(server);
  if (!left || !right) return isDeepStrictEqual(tablet, server) ? [] : [{ path, tablet: tablet ?? null, server: server ?? null }];
  const found: ValueDifference[] = [];
  for (const key of new Set([...Object.keys(left), ...Object.keys(right)])) {
    if (found.length >= limit) break;
    found.push(...jsonDifferences(left[key], right[key], limit - found.length, path ? `${path}.${key}` : key));
  }
  return found;
}
