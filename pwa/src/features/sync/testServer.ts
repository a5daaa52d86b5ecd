/**
 * An in-memory stand-in for the sync routes, for unit tests only: versions, stored change outcomes
 * (so a re-sent changeId answers `duplicate`), conflicts on a stale base version, a rejection rule,
 * a pull cursor and chunked uploads with SHA-256. It follows PROTOCOL.md, not the server's code.
 */
import { sha256Hex } from '@siteband/shared';
import type { ServerRecord } from '../../db/captureRecord';
import type { ChangeEnvelope, ChangeResult } from './syncTypes';

interface Stored {
  record: ServerRecord;
}

export interface TestServer {
  fetch: typeof fetch;
  records: Map<string, Stored>;
  /** Every push received, refused ones included. */
  pushes: ChangeEnvelope[][];
  /** Applied writes per record id, to check exactly-once delivery. */
  writes: Map<string, number>;
  uploads: Map<string, Uint8Array>;
  /** Makes the next push commit and then lose its answer (the client sees a network error). */
  loseNextPushAnswer(): void;
  /** Makes the next n requests fail before reaching the server. */
  failNext(n: number): void;
  /** Makes the next n requests get an error answer with this status, without touching anything. */
  answerNext(n: number, status: number): void;
  /** Writes a record as another device would. */
  writeAsOtherDevice(entity: string, id: string, data: object): void;
}

function json(body: unknown, status = 200): Response {
  return new Response(JSON.stringify(body), { status, headers: { 'Content-Type': 'application/json' } });
}

/** Builds a fresh test server. */
export interface TestServerOptions {
  rejectIf?: (change: ChangeEnvelope) => string | undefined;
  /** Push bodies over this many characters get 413 and nothing is applied (the server's JSON body limit). */
  maxPushChars?: number;
  /** Uploads of files declared larger than this get 413 (the server's size limit per kind). */
  maxFileBytes?: number;
}

export function createTestServer({ rejectIf, maxPushChars = Infinity, maxFileBytes = Infinity }: TestServerOptions = {}): TestServer {
  const records = new Map<string, Stored>();
  const outcomes = new Map<string, ChangeResult>();
  const writes = new Map<string, number>();
  const uploads = new Map<string, Uint8Array>();
  const pushes: ChangeEnvelope[][] = [];
  let seq = 0;
  let loseAnswer = false;
  let failing = 0;
  let erring = { n: 0, status: 500 };

  function write(entity: string, id: string, data: Record<string, unknown>, deleted = false): ServerRecord {
    const previous = records.get(id)?.record;
    const record: ServerRecord = {
      entity, id, version: (previous?.version ?? 0) + 1, syncSeq: ++seq, deleted,
      createdAt: previous?.createdAt ?? '2026-01-01T00:00:00.000Z', updatedAt: '2026-01-01T00:00:00.000Z',
      data: entity === 'case' ? { ...data, inspectorId: 'u-1' } : data,
    };
    records.set(id, { record });
    writes.set(id, (writes.get(id) ?? 0) + 1);
    return record;
  }

  function apply(change: ChangeEnvelope): ChangeResult {
    const first = outcomes.get(change.changeId);
    if (first) return { changeId: change.changeId, status: 'duplicate', firstStatus: first.status as 'applied', version: first.version, reason: first.reason };
    const current = records.get(change.id)?.record;
    let result: ChangeResult;
    const reason = rejectIf?.(change);
    if (reason) result = { changeId: change.changeId, status: 'rejected', reason };
    else if ((current?.version ?? null) !== change.baseVersion) result = { changeId: change.changeId, status: 'conflict', reason: 'baseVersion is stale', server: current };
    else if (change.op === 'delete') {
      result = current && !current.deleted
        ? { changeId: change.changeId, status: 'applied', version: write(change.entity, change.id, current.data, true).version }
        : { changeId: change.changeId, status: 'rejected', reason: `There is no ${change.entity} ${change.id} on the server to delete` };
    }
    else result = { changeId: change.changeId, status: 'applied', version: write(change.entity, change.id, change.data ?? {}).version };
    outcomes.set(change.changeId, result);
    return result;
  }

  const fetchFn = async (input: RequestInfo | URL, init: RequestInit = {}): Promise<Response> => {
    if (failing > 0) {
      failing -= 1;
      throw new TypeError('Failed to fetch');
    }
    if (erring.n > 0) {
      erring.n -= 1;
      return json({ statusCode: erring.status, message: `answered ${erring.status} for the test` }, erring.status);
    }
    const url = new URL(String(input), 'http://tablet.test');
    if (url.pathname === '/api/sync/push') {
      const body = JSON.parse(String(init.body)) as { changes: ChangeEnvelope[] };
      pushes.push(body.changes);
      if (String(init.body).length > maxPushChars) return json({ statusCode: 413, error: 'Payload Too Large', message: 'request entity too large' }, 413);
      const results = body.changes.map(apply);
      if (loseAnswer) {
        loseAnswer = false;
        throw new TypeError('Failed to fetch');
      }
      return json({ results });
    }
    if (url.pathname === '/api/sync/pull') {
      const after = Number(url.searchParams.get('cursor') ?? 0);
      const changes = [...records.values()].map((s) => s.record).filter((r) => r.syncSeq > after).sort((a, b) => a.syncSeq - b.syncSeq);
      return json({ changes, cursor: String(seq), hasMore: false });
    }
    const content = url.pathname.match(/^\/api\/attachments\/([^/]+)\/(content|status)$/);
    if (content) {
      const id = content[1];
      const meta = records.get(id)?.record.data as { size: number; sha256: string } | undefined;
      if (!meta) return json({ message: 'No such attachment' }, 404);
      const have = uploads.get(id) ?? new Uint8Array(0);
      // Read at answer time: after a chunk, the answer tells what the server holds with it.
      const status = async () => {
        const held = uploads.get(id) ?? new Uint8Array(0);
        return { id, size: meta.size, receivedBytes: held.length, complete: held.length === meta.size && (await sha256Hex(held)) === meta.sha256, sha256: meta.sha256, uploadedAt: held.length === meta.size ? '2026-01-01T00:00:01.000Z' : null };
      };
      if (content[2] === 'status') return json(await status());
      if (meta.size > maxFileBytes) return json({ statusCode: 413, error: 'Payload Too Large', message: `The file is larger than ${maxFileBytes} bytes` }, 413);
      const range = String((init.headers as Record<string, string>)['Content-Range']).match(/^bytes (\d+)-(\d+)\/(\d+)$/);
      if (!range || Number(range[1]) !== have.length) return json({ message: `upload must resume at ${have.length}` }, 409);
      const chunk = new Uint8Array(init.body as ArrayBuffer);
      const next = new Uint8Array(have.length + chunk.length);
      next.set(have);
      next.set(chunk, have.length);
      uploads.set(id, next);
      return json(await status());
    }
    return json({ message: 'not found' }, 404);
  };

  return {
    fetch: fetchFn as typeof fetch,
    records,
    pushes,
    writes,
    uploads,
    loseNextPushAnswer: () => void (loseAnswer = true),
    failNext: (n) => void (failing = n),
    answerNext: (n, status) => void (erring = { n, status }),
    writeAsOtherDevice: (entity, id, data) => void write(entity, id, data as Record<string, unknown>),
  };
}
