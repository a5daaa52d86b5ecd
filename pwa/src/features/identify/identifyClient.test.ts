import { describe, expect, it } from 'vitest';
import { handleRequest } from './handleRequest';
import { createIdentifyClient, IdentifyError, type WorkerPort } from './identifyClient';
import type { WorkerRequest, WorkerResponse } from './protocol';
import { DEFAULT_PROCESSING, DEFAULT_SCAN_SETTINGS } from './scanSettings';
import { fixtureScan, textScan } from './testFixtures';

/**
 * A port that runs the real handler; answers are held until `flush`, in the order the test
 * chooses, so out-of-order answers can be checked. A structured clone stands in for postMessage.
 */
function handlerPort() {
  const listeners: { message: ((e: MessageEvent<WorkerResponse>) => void)[]; error: ((e: ErrorEvent) => void)[] } = { message: [], error: [] };
  const held: WorkerResponse[] = [];
  const port: WorkerPort = {
    postMessage(message: WorkerRequest) {
      held.push(handleRequest(structuredClone(message)));
    },
    addEventListener(type: 'message' | 'error', listener: never) {
      listeners[type].push(listener);
    },
  };
  return {
    port,
    flush(order: 'as sent' | 'reversed' = 'as sent') {
      const out = order === 'reversed' ? held.reverse() : held;
      for (const response of out.splice(0)) listeners.message.forEach((l) => l(new MessageEvent('message', { data: structuredClone(response) })));
    },
    crash(message: string) {
      listeners.error.forEach((l) => l(new ErrorEvent('error', { message })));
    },
  };
}

describe('createIdentifyClient', () => {
  it('matches each answer to its request even when answers arrive out of order', async () => {
    const worker = handlerPort();
    const client = createIdentifyClient(worker.port);
    const scan = client.identify(fixtureScan('synthetic-ir-ethanol-liquid.csv'), { ...DEFAULT_SCAN_SETTINGS, atr: false }, DEFAULT_PROCESSING);
    const check = client.checkInstrument(fixtureScan('synthetic-ir-polystyrene-film.csv'), 'ir-polystyrene-ep-ft');
    worker.flush('reversed');
    expect((await scan).result.candidates[0]!.name).toBe('Ethanol');
    expect((await check).check.pass).toBe(true);
  });

  it('rejects with the worker error code and message', async () => {
    const worker = handlerPort();
    const client = createIdentifyClient(worker.port);
    const failing = client.identify(textScan('empty.csv', '   '), DEFAULT_SCAN_SETTINGS, DEFAULT_PROCESSING);
    worker.flush();
    await expect(failing).rejects.toBeInstanceOf(IdentifyError);
    await expect(failing).rejects.toMatchObject({ code: 'import', message: expect.stringMatching(/empty/) });
  });

  it('fails every waiting request when the worker crashes, instead of leaving them hanging', async () => {
    const worker = handlerPort();
    const client = createIdentifyClient(worker.port);
    const first = client.warmUp();
    const second = client.checkInstrument(fixtureScan('synthetic-ir-ethanol-liquid.csv'), 'ir-polystyrene-ep-ft');
    worker.crash('out of memory');
    await expect(first).rejects.toMatchObject({ code: 'internal', message: 'out of memory' });
    await expect(second).rejects.toMatchObject({ code: 'internal' });
  });
});
