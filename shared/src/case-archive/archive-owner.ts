import type { CaseArchiveManifest } from './format.js';

/**
 * Why this user may not import the archive, or null. A case stays its own inspector's: an archive is
 * imported only by the person who exported it (on another tablet of theirs, or at the server under their
 * account), never taken over by a colleague. The server checks the case's owner again when it applies it.
 */
export function archiveOwnerProblem(manifest: Pick<CaseArchiveManifest, 'exportedBy'>, userId: string): string | null {
  const { id, displayName, email } = manifest.exportedBy;
  if (id === userId) return null;
  return `This case was exported by ${displayName} (${email}): only they can import it, signed in as themselves`;
}
