import { describe, expect, it } from 'vitest';
import type { ApiClient } from '../api/client';
import { EventStreamRefused, streamEvents } from './eventsApi';
import { parseLiveEvent, type LiveEvent } from './liveEvent';
import { notificationFor } from './notifications';

function sse(body: string): Response {
  return new Response(body, { status: 200, headers: { 'Content-Type': 'text/event-stream' } });
}

/** A client whose event stream answers the given responses in turn, recording the requests. */
function streamingClient(answers: (() => Response)[]) {
  const requests: { input: string; accept: string | null }[] = [];
  const client: ApiClient = {
    request: () => Promise.reject(new Error('the stream does not read JSON')),
    async authorizedFetch(input, init = {}) {
      requests.push({ input: String(input), accept: new Headers(init.headers).get('accept') });
      const next = answers.shift();
      if (!next) throw new TypeError('Failed to fetch');
      return next();
    },
  };
  return { client, requests };
}

describe('live events', () => {
  it('reads an event from its JSON data, with the type from the data or the event name', () => {
    expect(parseLiveEvent({ data: '{"type":"escalation.raised","id":"e1","caseId":"c1","at":"2026-12-01T10:00:00.000Z"}' })).toEqual({
      type: 'escalation.raised',
      id: 'e1',
      caseId: 'c1',
      at: '2026-12-01T10:00:00.000Z',
    });
    expect(parseLiveEvent({ event: 'case.submitted', data: '{"id":"c2","at":"2026-12-01T11:00:00.000Z"}' })).toEqual({
      type: 'case.submitted',
      id: 'c2',
      caseId: null,
      at: '2026-12-01T11:00:00.000Z',
    });
  });

  it('ignores keep-alives, unknown kinds and messages without an id', () => {
    expect(parseLiveEvent({ data: '' })).toBeUndefined();
    expect(parseLiveEvent({ data: 'ping' })).toBeUndefined();
    expect(parseLiveEvent({ data: '{"type":"case.deleted","id":"c1"}' })).toBeUndefined();
    expect(parseLiveEvent({ data: '{"type":"escalation.closed"}' })).toBeUndefined();
  });

  it('notifies the safety officer of new escalations and the supervisor of submitted cases only', () => {
    const raised: LiveEvent = { type: 'escalation.raised', id: 'e 1', caseId: 'c1', at: '' };
    const submitted: LiveEvent = { type: 'case.submitted', id: 'c1', caseId: 'c1', at: '' };
    expect(notificationFor('safety_officer', raised)?.path).toBe('/tabs/escalations/e%201');
    expect(notificationFor('supervisor', submitted)?.path).toBe('/tabs/review/cases/c1');
    expect(notificationFor('supervisor', raised)).toBeUndefined();
    expect(notificationFor('safety_officer', submitted)).toBeUndefined();
    expect(notificationFor('inspector', { ...raised, type: 'escalation.acknowledged' })).toBeUndefined();
  });

  it('delivers the events, reopens a stream the server closed, and stops when the server refuses it', async () => {
    const { client, requests } = streamingClient([
      () =>
        sse(
          'data: {"type":"escalation.raised","id":"e1","caseId":"c1","at":"2026-12-01T10:00:00.000Z"}\n\n' +
            ': keep-alive\n\n' +
            'event: case.decided\ndata: {"id":"c1","caseId":"c1","at":"2026-12-01T10:05:00.000Z"}\n\n',
        ),
      () => new Response('{"message":"Forbidden"}', { status: 403, headers: { 'Content-Type': 'application/json' } }),
    ]);
    const seen: string[] = [];
    let opens = 0;
    const drops: unknown[] = [];
    const done = streamEvents(client, new AbortController().signal, {
      onOpen: () => (opens += 1),
      onEvent: (event) => seen.push(`${event.type} ${event.id}`),
      onDrop: (error) => {
        drops.push(error);
        return 0;
      },
    });
    await expect(done).rejects.toBeInstanceOf(EventStreamRefused);
    expect(seen).toEqual(['escalation.raised e1', 'case.decided c1']);
    expect(opens).toBe(1);
    expect(drops).toHaveLength(1);
    expect(String(drops[0])).toContain('closed');
    expect(requests).toEqual([
      { input: '/api/events', accept: 'text/event-stream' },
      { input: '/api/events', accept: 'text/event-stream' },
    ]);
  });

  it('retries after a network failure and a wrong answer, then stops when aborted', async () => {
    const controller = new AbortController();
    const { client, requests } = streamingClient([
      () => {
        throw new TypeError('Failed to fetch');
      },
      () => new Response('<html>', { status: 502, headers: { 'Content-Type': 'text/html' } }),
      () => {
        controller.abort();
        return sse('');
      },
    ]);
    const drops: string[] = [];
    await streamEvents(client, controller.signal, {
      onOpen: () => undefined,
      onEvent: () => undefined,
      onDrop: (error) => {
        drops.push(String(error));
        return 0;
      },
    });
    expect(drops).toEqual(['TypeError: Failed to fetch', 'Error: The live events answered 502 text/html']);
    expect(requests).toHaveLength(3);
  });
});
