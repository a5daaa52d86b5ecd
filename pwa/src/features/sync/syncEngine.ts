import type { SitebandDb } from '../../db/db';
import type { ApiClient } from '../api/client';
import { backoffDelayMs, type BackoffOptions } from '@siteband/shared';
import { pullChanges } from './pullChanges';
import { pushOutbox } from './pushOutbox';
import { uploadAttachments, type ByteSender } from './uploadAttachments';

/** What the screens show about sync as a whole. */
export interface SyncStatus {
  running: boolean;
  /** Epoch ms of the last cycle that finished without an error. */
  lastSuccessAt: number | null;
  lastError: string | null;
  /** Failures in a row; 0 after a success. */
  failures: number;
  /** Epoch ms of the scheduled retry after a failure. */
  retryAt: number | null;
}

export interface SyncEngineOptions {
  db: SitebandDb;
  api: ApiClient;
  sender: ByteSender;
  /** This device's id for the push envelope, or how to read it. */
  clientId: string | (() => Promise<string>);
  backoff?: BackoffOptions;
  now?: () => number;
  /** Schedules the retry (default setTimeout); returns a cancel function. */
  schedule?: (run: () => void, delayMs: number) => () => void;
}

export interface SyncEngine {
  /** Runs one cycle (push, upload attachments, pull); a call during a cycle joins the running one. */
  syncNow(): Promise<SyncStatus>;
  status(): SyncStatus;
  subscribe(listener: () => void): () => void;
  /** Cancels a scheduled retry. */
  stop(): void;
}

/** Builds the sync engine: one cycle at a time, retries with exponential backoff after a failure. */
export function createSyncEngine(options: SyncEngineOptions): SyncEngine {
  const { db, api, sender, clientId, now = Date.now } = options;
  const schedule =
    options.schedule ??
    ((run, delay) => {
      const timer = setTimeout(run, delay);
      return () => clearTimeout(timer);
    });
  let state: SyncStatus = { running: false, lastSuccessAt: null, lastError: null, failures: 0, retryAt: null };
  let running: Promise<SyncStatus> | undefined;
  let cancelRetry: (() => void) | undefined;
  const listeners = new Set<() => void>();

  function set(next: Partial<SyncStatus>) {
    state = { ...state, ...next };
    listeners.forEach((listener) => listener());
  }

  async function cycle(): Promise<SyncStatus> {
    cancelRetry?.();
    cancelRetry = undefined;
    set({ running: true, retryAt: null });
    try {
      // Push before pull, so a pulled record never meets a change whose answer was merely lost.
      await pushOutbox(db, api, typeof clientId === 'string' ? clientId : await clientId());
      await uploadAttachments(db, api, sender);
      await pullChanges(db, api);
      set({ running: false, lastSuccessAt: now(), lastError: null, failures: 0 });
    } catch (error) {
      const failures = state.failures + 1;
      const delay = backoffDelayMs(failures, options.backoff);
      set({ running: false, lastError: error instanceof Error ? error.message : String(error), failures, retryAt: now() + delay });
      cancelRetry = schedule(() => void syncNow(), delay);
    }
    return state;
  }

  function syncNow(): Promise<SyncStatus> {
    running ??= cycle().finally(() => {
      running = undefined;
    });
    return running;
  }

  return {
    syncNow,
    status: () => state,
    subscribe(listener) {
      listeners.add(listener);
      return () => listeners.delete(listener);
    },
    stop() {
      cancelRetry?.();
      cancelRetry = undefined;
    },
  };
}
