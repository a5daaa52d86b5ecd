/** The screens' side of the worker protocol: one promise per request, matched by id. */
import type { InstrumentCheckResult, Library } from '@siteband/shared';
import type { IdentifyOutcome, PlotData, RecordedProcessing, ScanFile, WorkerError, WorkerRequest, WorkerResponse } from './protocol';
import type { ProcessingSettings, ScanSettings } from './scanSettings';

/** The part of a Worker the client uses (a real Worker, or the handler in a test). */
export interface WorkerPort {
  postMessage(message: WorkerRequest): void;
  addEventListener(type: 'message', listener: (event: MessageEvent<WorkerResponse>) => void): void;
  addEventListener(type: 'error', listener: (event: ErrorEvent) => void): void;
}

/** A failed request, carrying the worker's error code and readable message. */
export class IdentifyError extends Error {
  readonly code: WorkerError['code'];
  constructor(error: WorkerError) {
    super(error.message);
    this.name = 'IdentifyError';
    this.code = error.code;
  }
}

/** Sends requests to the identification worker. */
export interface IdentifyClient {
  warmUp(): Promise<void>;
  identify(file: ScanFile, scan: ScanSettings, processing: ProcessingSettings | RecordedProcessing, library?: Library): Promise<IdentifyOutcome>;
  checkInstrument(file: ScanFile, standardId: string, excitationNm?: number): Promise<{ check: InstrumentCheckResult; plot: PlotData }>;
}

// Omit on a union must apply per member, or the members' own fields are lost.
type RequestBody = WorkerRequest extends infer R ? (R extends WorkerRequest ? Omit<R, 'id'> : never) : never;

type Pending = { resolve: (response: WorkerResponse & { ok: true }) => void; reject: (error: Error) => void };

/** Wraps a worker port; a worker that crashes fails every waiting request instead of leaving it hanging. */
export function createIdentifyClient(port: WorkerPort): IdentifyClient {
  let nextId = 1;
  const pending = new Map<number, Pending>();

  port.addEventListener('message', (event: MessageEvent<WorkerResponse>) => {
    const response = event.data;
    const waiting = pending.get(response.id);
    if (!waiting) return;
    pending.delete(response.id);
    if (response.ok) waiting.resolve(response);
    else waiting.reject(new IdentifyError(response.error));
  });
  port.addEventListener('error', (event: ErrorEvent) => {
    const error = new IdentifyError({ code: 'internal', message: event.message || 'the identification worker stopped' });
    for (const waiting of pending.values()) waiting.reject(error);
    pending.clear();
  });

  function send(request: RequestBody): Promise<WorkerResponse & { ok: true }> {
    const id = nextId++;
    return new Promise((resolve, reject) => {
      pending.set(id, { resolve, reject });
      port.postMessage({ ...request, id } as WorkerRequest);
    });
  }

  return {
    async warmUp() {
      await send({ kind: 'warm-up' });
    },
    async identify(file, scan, processing, library) {
      const response = await send({ kind: 'identify', file, scan, processing, ...(library ? { library } : {}) });
      if (response.kind !== 'identify') throw new IdentifyError({ code: 'internal', message: `unexpected answer ${response.kind}` });
      return response.outcome;
    },
    async checkInstrument(file, standardId, excitationNm) {
      const response = await send({ kind: 'instrument-check', file, standardId, ...(excitationNm !== undefined ? { excitationNm } : {}) });
      if (response.kind !== 'instrument-check') throw new IdentifyError({ code: 'internal', message: `unexpected answer ${response.kind}` });
      return { check: response.check, plot: response.plot };
    },
  };
}
