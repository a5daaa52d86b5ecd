import { createHash } from 'node:crypto';
import type { LibraryVersion } from '@siteband/shared';

/** A compound's current edit as the version and the merge need it (the latest row of `library_edits`). */
export interface CurrentEdit {
  readonly compoundId: string;
  readonly version: number;
  readonly document: Record<string, unknown>;
  readonly retired: boolean;
  readonly editedAt: Date;
}

/**
 * The version stamp of the bundled library with supervisors' edits applied: unchanged without edits,
 * otherwise `<bundled version>+edits.<12 hex>` with the SHA-256 of the bundled content hash and every
 * current edit, so any save gives a new stamp and identical states give identical stamps on any server.
 */
export function mergedVersion(bundled: LibraryVersion, current: readonly CurrentEdit[]): LibraryVersion {
  if (current.length === 0) return bundled;
  const hash = createHash('sha256').update(bundled.contentHash);
  const ordered = [...current].sort((a, b) => (a.compoundId < b.compoundId ? -1 : a.compoundId > b.compoundId ? 1 : 0));
  for (const edit of ordered) {
    hash.update(`\n${edit.compoundId}\t${edit.version}\t${edit.retired ? 'retired' : 'active'}\t${JSON.stringify(edit.document)}`);
  }
  const contentHash = hash.digest('hex');
  const latest = Math.max(...current.map((edit) => edit.editedAt.getTime()));
  return {
    version: `${bundled.version}+edits.${contentHash.slice(0, 12)}`,
    date: new Date(latest).toISOString().slice(0, 10),
    contentHash,
  };
}
