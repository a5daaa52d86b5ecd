// The tablet's own sync code, bundled for Node by client.mjs so the fault suite and the sync bench
// drive the very engine the PWA runs (no copy). Only re-exports: nothing here may hold logic.
export { openDb, type SitebandDb } from '../../pwa/src/db/db';
export { createApiClient, type TokenSource } from '../../pwa/src/features/api/client';
export { createByteSender } from '../../pwa/src/features/sync/byteSender';
export { createSyncEngine } from '../../pwa/src/features/sync/syncEngine';
export { everythingSynced } from '../../pwa/src/features/sync/syncState';
export { CHUNK_BYTES } from '../../pwa/src/features/sync/uploadAttachments';
export { MAX_BATCH } from '../../pwa/src/features/sync/syncTypes';
export { saveCase } from '../../pwa/src/features/cases/saveCase';
export { saveSample, addHandover } from '../../pwa/src/features/samples/saveSample';
export { addNote } from '../../pwa/src/features/notes/addNote';
export { addPhoto } from '../../pwa/src/features/photos/addPhoto';
export { saveScan } from '../../pwa/src/features/scans/saveScan';
export { handleRequest } from '../../pwa/src/features/identify/handleRequest';
export { DEFAULT_PROCESSING, DEFAULT_SCAN_SETTINGS } from '../../pwa/src/features/identify/scanSettings';
