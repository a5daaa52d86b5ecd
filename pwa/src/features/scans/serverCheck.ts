import type { ScanServerCheck } from '../../db/scansTable';

/** The server's recomputation fields of a pulled scan, or undefined before it has run. */
export function serverCheckOf(data: Record<string, unknown>): ScanServerCheck | undefined {
  const recomputedAt = typeof data.serverRecomputedAt === 'string' ? data.serverRecomputedAt : null;
  const error = typeof data.serverRecomputeError === 'string' ? data.serverRecomputeError : null;
  if (recomputedAt === null && error === null) return undefined;
  const mismatch = data.mismatch as { differences?: unknown; libraryVersion?: { tablet?: unknown; server?: unknown } | null } | null | undefined;
  const differences = Array.isArray(mismatch?.differences) ? mismatch.differences.filter((d): d is string => typeof d === 'string') : [];
  const label = (value: unknown) => (typeof value === 'string' ? value : null);
  const library = mismatch?.libraryVersion;
  return {
    resultMismatch: typeof data.resultMismatch === 'boolean' ? data.resultMismatch : null,
    serverRecomputedAt: recomputedAt,
    serverRecomputeError: error,
    differences,
    ...(library && typeof library === 'object' ? { otherLibrary: { tablet: label(library.tablet), server: label(library.server) } } : {}),
  };
}
