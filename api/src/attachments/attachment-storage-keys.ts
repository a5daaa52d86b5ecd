/** Where the parts of an unfinished upload wait: one object per chunk, named by its start offset. */
export function stagingPrefix(attachmentId: string): string {
  return `staging/${attachmentId}/`;
}

/** The object of the chunk starting at `offset` (zero-padded, so keys sort in byte order). */
export function chunkKey(attachmentId: string, offset: number): string {
  return `${stagingPrefix(attachmentId)}${String(offset).padStart(12, '0')}`;
}

/** The verified file of a complete upload. */
export function fileKey(caseId: string, attachmentId: string): string {
  return `attachments/${caseId}/${attachmentId}`;
}
