/** A byte range of an upload: `start` and `end` inclusive, `total` the whole file's size. */
export interface ByteRange {
  start: number;
  end: number;
  total: number;
}

const CONTENT_RANGE = /^bytes (\d{1,12})-(\d{1,12})\/(\d{1,12})$/;

/**
 * Reads a `Content-Range: bytes <start>-<end>/<total>` request header (RFC 9110 §14.4). Without the
 * header the body is the whole file of `declaredSize` bytes. Returns the range, or why it is unusable.
 */
export function parseContentRange(header: string | undefined, declaredSize: number): ByteRange | { problem: string } {
  if (header === undefined || header.trim() === '') return { start: 0, end: declaredSize - 1, total: declaredSize };
  const match = CONTENT_RANGE.exec(header.trim());
  if (!match) return { problem: `Content-Range must look like "bytes 0-1048575/${declaredSize}", got "${header}"` };
  const [start, end, total] = match.slice(1).map(Number);
  if (end < start) return { problem: `Content-Range end ${end} is before its start ${start}` };
  if (end >= total) return { problem: `Content-Range end ${end} must be below the total ${total}` };
  return { start, end, total };
}
