import { describe, expect, it } from 'vitest';
import { answerStructureRequest, type StructureReply, type StructureRequest } from './structureProtocol';
import { createStructureClient, StructureCheckError, type StructurePort } from './structureWorkerClient';

const AMMONIA = ['4', 'ammonia', 'N 0 0 0.1', 'H 0.94 0 -0.27', 'H -0.47 0.814 -0.27', 'H -0.47 -0.814 -0.27'].join('\n');

/** An in-process port that answers with the real protocol, optionally in reverse order. */
function localPort({ reverse = false } = {}) {
  const listeners: { message: ((e: MessageEvent<StructureReply>) => void)[]; error: ((e: ErrorEvent) => void)[] } = { message: [], error: [] };
  const queue: StructureRequest[] = [];
  const port: StructurePort & { flush(): void; crash(message: string): void } = {
    postMessage: (request) => queue.push(request),
    addEventListener: ((type: 'message' | 'error', listener: never) => listeners[type].push(listener)) as StructurePort['addEventListener'],
    flush() {
      const batch = queue.splice(0);
      if (reverse) batch.reverse();
      for (const request of batch) for (const l of listeners.message) l(new MessageEvent('message', { data: answerStructureRequest(request) }));
    },
    crash(message) {
      for (const l of listeners.error) l(new ErrorEvent('error', { message }));
    },
  };
  return port;
}

describe('createStructureClient', () => {
  it('matches replies to their requests even when they come back out of order', async () => {
    const port = localPort({ reverse: true });
    const check = createStructureClient(port);
    const good = check({ text: AMMONIA });
    const bad = check({ text: '2\nbroken\nN 0 0 0\n' });
    port.flush();
    expect((await good).check.pointGroup).toBe('C3v');
    const error = await bad.catch((e: unknown) => e);
    expect(error).toBeInstanceOf(StructureCheckError);
    expect((error as StructureCheckError).message.length).toBeGreaterThan(0);
  });

  it('fails every open request when the worker crashes', async () => {
    const port = localPort();
    const check = createStructureClient(port);
    const open = check({ text: AMMONIA });
    port.crash('out of memory');
    await expect(open).rejects.toThrow('out of memory');
  });
});
