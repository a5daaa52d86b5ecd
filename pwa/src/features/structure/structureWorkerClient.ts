import type { StructureCheck } from '@siteband/shared';
import type { CharacterTable, StructureProblem, StructureReply, StructureRequest } from './structureProtocol';

/** A finished structure check with its group's character table. */
export interface StructureOutcome {
  readonly check: StructureCheck;
  readonly table: CharacterTable;
}

/** The structure reader or the symmetry engine refused the input; `line` is 1-based when known. */
export class StructureCheckError extends Error {
  readonly line: number | null;

  constructor(problem: StructureProblem) {
    super(problem.message);
    this.name = 'StructureCheckError';
    this.line = problem.line;
  }
}

/** Options of one structure check, as the page's controls give them. */
export type StructureInput = Omit<StructureRequest, 'id'>;

/** Something that can carry requests to a structure worker and bring its replies back. */
export interface StructurePort {
  postMessage(request: StructureRequest): void;
  addEventListener(type: 'message', listener: (event: MessageEvent<StructureReply>) => void): void;
  addEventListener(type: 'error', listener: (event: ErrorEvent) => void): void;
}

/** Sends structure checks to one worker and resolves each by its request id. */
export function createStructureClient(port: StructurePort): (input: StructureInput) => Promise<StructureOutcome> {
  let nextId = 1;
  const pending = new Map<number, { resolve: (o: StructureOutcome) => void; reject: (e: Error) => void }>();
  port.addEventListener('message', (event) => {
    const reply = event.data;
    const waiting = pending.get(reply.id);
    if (!waiting) return;
    pending.delete(reply.id);
    if (reply.ok) waiting.resolve({ check: reply.check, table: reply.table });
    else waiting.reject(new StructureCheckError(reply.problem));
  });
  port.addEventListener('error', (event) => {
    // A crashed worker answers nothing more: fail every open request rather than leave it spinning.
    const error = new Error(event.message || 'The structure worker stopped');
    for (const waiting of pending.values()) waiting.reject(error);
    pending.clear();
  });
  return (input) =>
    new Promise((resolve, reject) => {
      const id = nextId++;
      pending.set(id, { resolve, reject });
      port.postMessage({ id, ...input });
    });
}

let shared: ((input: StructureInput) => Promise<StructureOutcome>) | undefined;

/** Runs a structure check in the app's one structure worker (started on first use). */
export function checkStructureInWorker(input: StructureInput): Promise<StructureOutcome> {
  shared ??= createStructureClient(
    new Worker(new URL('../../workers/structure.worker.ts', import.meta.url), { type: 'module' }) as unknown as StructurePort,
  );
  return shared(input);
}
