import type { ManifestOptions } from 'vite-plugin-pwa';
import { PHOTO_TYPES } from './src/features/photos/photoTypes.ts';
import { SHARE_SCAN_EXTENSIONS, SHARE_SCAN_TYPES, SHARE_TARGET_PATH } from './src/features/share/sharedFiles.ts';

/** The install manifest: our own names, colours and icons (drawn in public/icons/*.svg). */
export const webManifest: Partial<ManifestOptions> = {
  name: 'Siteband',
  short_name: 'Siteband',
  description: 'Offline field tool for IR and Raman screening of unknown substances',
  lang: 'en',
  start_url: '/',
  scope: '/',
  display: 'standalone',
  orientation: 'any',
  theme_color: '#16324a',
  background_color: '#f4f6f3',
  // Another app (the instrument's, a file manager, the camera) can share scan exports and photos to the installed app.
  share_target: {
    action: SHARE_TARGET_PATH,
    method: 'POST',
    enctype: 'multipart/form-data',
    params: { files: [{ name: 'files', accept: [...SHARE_SCAN_EXTENSIONS, ...SHARE_SCAN_TYPES, ...PHOTO_TYPES] }] },
  },
  icons: [
    { src: '/icons/siteband-192.png', sizes: '192x192', type: 'image/png', purpose: 'any' },
    { src: '/icons/siteband-512.png', sizes: '512x512', type: 'image/png', purpose: 'any' },
    { src: '/icons/siteband-maskable-512.png', sizes: '512x512', type: 'image/png', purpose: 'maskable' },
  ],
};
