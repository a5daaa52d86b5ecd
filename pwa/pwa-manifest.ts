import type { ManifestOptions } from 'vite-plugin-pwa';

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
  icons: [
    { src: '/icons/siteband-192.png', sizes: '192x192', type: 'image/png', purpose: 'any' },
    { src: '/icons/siteband-512.png', sizes: '512x512', type: 'image/png', purpose: 'any' },
    { src: '/icons/siteband-maskable-512.png', sizes: '512x512', type: 'image/png', purpose: 'maskable' },
  ],
};
