import { defineConfig } from 'vitest/config';
import react from '@vitejs/plugin-react';

// Unit tests run without the PWA plugin: the service worker is covered by the browser e2e run.
export default defineConfig({
  plugins: [react()],
  test: {
    environment: 'happy-dom',
    setupFiles: ['fake-indexeddb/auto'],
    include: ['src/**/*.test.{ts,tsx}'],
    restoreMocks: true,
  },
});
