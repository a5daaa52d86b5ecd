import type { QueryKey } from '@tanstack/react-query';

/** The kinds of live event the server sends on `GET /api/events` (api/README.md). */
export const LIVE_EVENT_TYPES = ['escalation.raised', 'escalation.acknowledged', 'escalation.closed', 'case.submitted', 'case.decided'] as const;
export type LiveEventType = (typeof LIVE_EVENT_TYPES)[number];

/** One live event: what happened to which record (an escalation's or a case's id), and when. */
export interface LiveEvent {
  type: LiveEventType;
  id: string;
  caseId: string | null;
  at: string;
}

function isLiveEventType(value: unknown): value is LiveEventType {
  return LIVE_EVENT_TYPES.includes(value as LiveEventType);
}

/**
 * Reads one server-sent message: JSON `{ type, id, caseId?, at }` in `data`, the type possibly also as
 * the SSE `event` name. Anything else (keep-alives, kinds this build does not know) gives undefined.
 */
export function parseLiveEvent(message: { event?: string; data: string }): LiveEvent | undefined {
  let body: unknown;
  try {
    body = JSON.parse(message.data);
  } catch {
    return undefined;
  }
  if (!body || typeof body !== 'object') return undefined;
  const { type, id, caseId, at } = body as Record<string, unknown>;
  const kind = type ?? message.event;
  if (!isLiveEventType(kind) || typeof id !== 'string' || id === '') return undefined;
  return { type: kind, id, caseId: typeof caseId === 'string' ? caseId : null, at: typeof at === 'string' ? at : new Date().toISOString() };
}

/**
 * The server data a live event can change, as TanStack Query key prefixes. Escalations show their case's
 * status and the review queue counts open escalations, so every event refreshes both areas; features keep
 * their query keys under these roots (`['escalations', …]`, `['review', …]`, `['audit', …]`).
 */
export const LIVE_QUERY_ROOTS: readonly QueryKey[] = [['escalations'], ['review'], ['audit']];
