// Imported into the generated service worker (vite.config.ts, workbox.importScripts). Receives the files
// another app shares to the installed Siteband (the manifest's share_target, a multipart POST), keeps each
// in the Cache Storage until the inspector files it, and opens the Capture tab's shared-files screen.
// Workbox's own routes answer GET requests only, so this POST listener never competes with the precache.
// The names below are read by src/features/share/sharedFiles.ts; its test checks that they match.
const SHARE_TARGET_PATH = '/share-target';
const SHARED_FILES_CACHE = 'siteband-shared-files';
const SHARED_FILE_PREFIX = '/shared-files/';
const SHARED_FILES_PAGE = '/tabs/capture/shared';

async function keepSharedFiles(request) {
  let received = 0;
  try {
    const form = await request.formData();
    const cache = await caches.open(SHARED_FILES_CACHE);
    for (const file of form.getAll('files')) {
      if (typeof file === 'string' || file.size === 0) continue;
      const headers = {
        'Content-Type': file.type || 'application/octet-stream',
        'X-Siteband-File-Name': encodeURIComponent(file.name || 'shared-file'),
        'X-Siteband-Shared-At': new Date().toISOString(),
      };
      await cache.put(`${SHARED_FILE_PREFIX}${crypto.randomUUID()}`, new Response(file, { headers }));
      received += 1;
    }
  } catch (error) {
    // An unreadable share keeps nothing; the screen then says that no file arrived.
    console.error('Siteband could not keep the shared files', error);
  }
  return Response.redirect(`${SHARED_FILES_PAGE}?received=${received}`, 303);
}

self.addEventListener('fetch', (event) => {
  const url = new URL(event.request.url);
  if (event.request.method === 'POST' && url.origin === self.location.origin && url.pathname === SHARE_TARGET_PATH) {
    event.respondWith(keepSharedFiles(event.request));
  }
});
