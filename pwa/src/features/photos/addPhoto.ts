import { photoCaptionOf, photoCaptionProblem, sha256Hex } from '@siteband/shared';
import type { SitebandDb } from '../../db/db';
import type { PhotoData, PhotoRow } from '../../db/photosTable';
import { recordUpsert } from '../sync/recordChange';
import { compressPhoto } from './compressPhoto';
import { MAX_PHOTO_BYTES, PHOTO_TYPES } from './photoTypes';

/** Keeps a photo of a sample (or case) on the tablet with its SHA-256, queued for upload. */
export async function addPhoto(
  db: SitebandDb,
  owner: { caseId: string; ownerType: PhotoData['ownerType']; ownerId: string },
  photo: { fileName: string; contentType: string; bytes: ArrayBuffer; caption?: string },
): Promise<string> {
  const caption = checkedCaption(photo.caption);
  if (!(PHOTO_TYPES as readonly string[]).includes(photo.contentType)) throw new TypeError(`A photo must be JPEG, PNG or WebP, not ${photo.contentType || 'an unknown type'}`);
  if (photo.bytes.byteLength === 0) throw new RangeError(`${photo.fileName} is empty`);
  if (photo.bytes.byteLength > MAX_PHOTO_BYTES) throw new RangeError(`${photo.fileName} is larger than 10 MB even after compression`);
  const id = crypto.randomUUID();
  const data: PhotoData = {
    ownerType: owner.ownerType,
    ownerId: owner.ownerId,
    kind: 'photo',
    fileName: photo.fileName.replace(/[/\\\0]/g, '_').slice(0, 255),
    contentType: photo.contentType,
    size: photo.bytes.byteLength,
    sha256: await sha256Hex(photo.bytes),
    caption,
  };
  await recordUpsert(db, { entity: 'attachment', id, caseId: owner.caseId, data, bytes: photo.bytes, extra: { receivedBytes: 0, uploadedAt: null } });
  return id;
}

/** Compresses a camera or shared image to JPEG on the tablet and keeps it as a photo of the sample, with its caption if one was written. */
export async function addSamplePhotoFile(db: SitebandDb, owner: { caseId: string; sampleId: string }, file: Blob & { name: string }, caption?: string): Promise<string> {
  checkedCaption(caption);
  const bytes = await compressPhoto(file);
  const fileName = file.name.replace(/\.[^.]*$/, '') + '.jpg';
  return addPhoto(db, { caseId: owner.caseId, ownerType: 'sample', ownerId: owner.sampleId }, { fileName, contentType: 'image/jpeg', bytes, caption });
}

/**
 * Changes the caption of a photo on the tablet, offline, as a whole-record change of its metadata. The
 * file fields stay as they are, so the server takes it as a caption edit and the bytes are not sent again
 * (uploads wait on `uploadedAt`, which a caption edit keeps).
 */
export async function setPhotoCaption(db: SitebandDb, photo: PhotoRow, text: string): Promise<void> {
  if (photo.data.kind !== 'photo') throw new TypeError('Only photos take a caption; a raw scan file has none');
  await recordUpsert(db, { entity: 'attachment', id: photo.id, caseId: photo.caseId, data: { ...photo.data, caption: checkedCaption(text) } });
}

/** The caption as kept (trimmed, null for none); throws with the reason when it is too long. */
function checkedCaption(text: string | undefined): string | null {
  const caption = photoCaptionOf(text);
  const problem = photoCaptionProblem(caption);
  if (problem) throw new RangeError(problem);
  return caption;
}
