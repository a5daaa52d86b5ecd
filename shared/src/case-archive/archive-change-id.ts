import { strToU8 } from 'fflate';
import type { ArchiveRecord } from './format.js';
import { sha256Hex } from './sha256-hex.js';

/**
 * The sync changeId under which an archived record is applied. The exporting tablet's own change when the
 * archive names it (so the server answers `duplicate` to whichever of the tablet and the archive arrives
 * second); otherwise a UUID derived from the importing user and the record as archived, so importing the
 * same archive again is answered `duplicate` too and changes nothing.
 */
export async function archiveChangeId(userId: string, record: ArchiveRecord): Promise<string> {
  if (record.changeId) return record.changeId;
  const hex = await sha256Hex(strToU8(JSON.stringify([userId, record.entity, record.id, record.version, record.data])));
  // RFC 9562 layout: version nibble 5 (name-based, here with SHA-256) and the 10xx variant bits (from memory).
  const variant = ((parseInt(hex[16], 16) & 0x3) | 0x8).toString(16);
  return `${hex.slice(0, 8)}-${hex.slice(8, 12)}-5${hex.slice(13, 16)}-${variant}${hex.slice(17, 20)}-${hex.slice(20, 32)}`;
}
