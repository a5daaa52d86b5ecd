/** Largest raw file the server takes (api/src/attachments/attachment-limits.ts, RAW_SCAN_MAX_BYTES). */
export const MAX_RAW_SCAN_BYTES = 20 * 1024 * 1024;

/**
 * The content type a raw file is declared with, from its extension. `chemical/x-jcamp-dx` is the
 * customary JCAMP-DX type (from memory: the chemical MIME convention, as the server lists it).
 */
export function rawScanContentType(fileName: string): string {
  const extension = fileName.toLowerCase().split('.').pop() ?? '';
  if (['jdx', 'dx', 'jcamp'].includes(extension)) return 'chemical/x-jcamp-dx';
  if (extension === 'csv') return 'text/csv';
  if (extension === 'tsv') return 'text/tab-separated-values';
  return 'text/plain';
}

/** Refuses a raw file the server would refuse, before anything is written. */
export function checkRawScanFile(fileName: string, bytes: ArrayBuffer): void {
  if (bytes.byteLength === 0) throw new RangeError(`${fileName} is empty`);
  if (bytes.byteLength > MAX_RAW_SCAN_BYTES) throw new RangeError(`${fileName} is larger than 20 MB, the most the server keeps for a raw scan file`);
}
