import { defineConfig } from 'vite';
import react from '@vitejs/plugin-react';
import { VitePWA } from 'vite-plugin-pwa';
import { webManifest } from './pwa-manifest.ts';
import { precompress } from './precompress.ts';
import { preloadFonts } from './preloadFonts.ts';
import { parseOfflineSessionHours } from './src/config/offlineSessionHours.ts';
import { parseIdleLockMinutes } from './src/config/idleLockMinutes.ts';

// Fail the build, not the tablet, when the offline period or the idle time is mistyped.
parseOfflineSessionHours(process.env.VITE_OFFLINE_SESSION_HOURS);
parseIdleLockMinutes(process.env.VITE_IDLE_LOCK_MINUTES);

const IONIC_COMPONENTS = /node_modules\/@ionic\/core\/components\/.*\.js$/;

// The API serves the built app and /api on one port; in development Vite forwards /api to it.
const apiTarget = `http://127.0.0.1:${process.env.API_PORT || '3000'}`;

export default defineConfig({
  plugins: [
    react(),
    VitePWA({
      registerType: 'autoUpdate',
      injectRegister: false,
      includeAssets: ['icons/siteband.svg'],
      manifest: webManifest,
      workbox: {
        // Without these two the first visit stays uncontrolled, so an offline reload would fail.
        clientsClaim: true,
        skipWaiting: true,
        globPatterns: ['**/*.{js,css,html,svg,png,woff2}'],
        navigateFallback: '/index.html',
        navigateFallbackDenylist: [/^\/api\//],
        // Ionic's chunk is above workbox's 2 MiB default once unminified source maps are excluded.
        maximumFileSizeToCacheInBytes: 4 * 1024 * 1024,
        // Files shared from another app arrive as a POST the generated worker does not route (public/share-target-sw.js).
        importScripts: ['/share-target-sw.js'],
      },
    }),
    preloadFonts(),
    precompress(),
  ],
  build: {
    rolldownOptions: {
      treeshake: {
        // @ionic/core declares "sideEffects": false in components/package.json, a nested file the
        // bundler does not read; honouring it drops every Ionic component the app never uses (~1 MB).
        moduleSideEffects: (id: string) => (IONIC_COMPONENTS.test(id) ? false : undefined),
      },
    },
  },
  server: {
    proxy: { '/api': { target: apiTarget, changeOrigin: false } },
  },
  preview: {
    proxy: { '/api': { target: apiTarget, changeOrigin: false } },
  },
});
