/** The one identification worker of the app, started on first use and warmed up at once. */
import { createIdentifyClient, type IdentifyClient } from './identifyClient';

let client: IdentifyClient | undefined;

/** The shared client; the first call starts the worker and builds the library indices in it. */
export function identifyClient(): IdentifyClient {
  if (!client) {
    const worker = new Worker(new URL('../../workers/identify.worker.ts', import.meta.url), { type: 'module' });
    client = createIdentifyClient(worker as unknown as Parameters<typeof createIdentifyClient>[0]);
    // Failing here is not fatal: the first scan then builds the indices itself.
    client.warmUp().catch(() => undefined);
  }
  return client;
}
