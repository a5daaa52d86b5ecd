import { sha256Hex } from '@siteband/shared';
import type { SitebandDb } from '../../db/db';
import type { PhotoData } from '../../db/photosTable';
import { recordUpsert } from '../sync/recordChange';
import { compressPhoto } from './compressPhoto';
import { MAX_PHOTO_BYTES, PHOTO_TYPES } from './photoTypes';

/** Keeps a photo of a sample (or case) on the tablet with its SHA-256, queued for upload. */
export async function addPhoto(
  db: SitebandDb,
  owner: { caseId: string; ownerType: PhotoData['ownerType']; ownerId: string },
  photo: { fileName: string; contentType: string; bytes: ArrayBuffer },
): Promise<string> {
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
  };
  await recordUpsert(db, { entity: 'attachment', id, caseId: owner.caseId, data, extra: { bytes: photo.bytes, receivedBytes: 0, uploadedAt: null } });
  return id;
}

/** Compresses a camera or shared image to JPEG on the tablet and keeps it as a photo of the sample. */
export async function addSamplePhotoFile(db: SitebandDb, owner: { caseId: string; sampleId: string }, file: Blob & { name: string }): Promise<string> {
  const bytes = await compressPhoto(file);
  const fileName = file.name.replace(/\.[^.]*$/, '') + '.jpg';
  return addPhoto(db, { caseId: owner.caseId, ownerType: 'sample', ownerId: owner.sampleId }, { fileName, contentType: 'image/jpeg', bytes });
}
