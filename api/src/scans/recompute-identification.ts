import type { Scan } from './scan.entity';

/** A server-side identification of a scan, to compare with the tablet's. */
export interface ServerIdentification {
  result: Record<string, unknown>;
  /** true when it disagrees with the tablet's result. */
  mismatch: boolean;
}

/**
 * Hook for recomputing a scan's identification on the server from its raw file, with the shared
 * identification code. Not wired yet: it returns null, so scans keep the tablet's result with
 * `serverResult`, `resultMismatch` and `serverRecomputedAt` all null (nothing is claimed as checked).
 */
export function recomputeIdentification(_scan: Scan): ServerIdentification | null {
  return null;
}
