import { fetchEventSource, EventStreamContentType } from '@microsoft/fetch-event-source';
import type { ApiClient } from '../api/client';
import { parseLiveEvent, type LiveEvent } from './liveEvent';

export const EVENTS_PATH = '/api/events';

/** The server refused the stream for this person (401 after a refresh, 403): retrying will not help. */
export class EventStreamRefused extends Error {
  readonly status: number;
  constructor(status: number) {
    super(`The live events were refused (${status})`);
    this.name = 'EventStreamRefused';
    this.status = status;
  }
}

export interface EventStreamHandlers {
  /** The stream is open (again). */
  onOpen(): void;
  onEvent(event: LiveEvent): void;
  /** The stream failed or the server closed it; answers the delay in ms before the next attempt. */
  onDrop(error: unknown): number;
}

/**
 * Reads the live events with the session's bearer token (through the API client, so a 401 refreshes
 * the token once) until `signal` aborts. Dropped connections are retried after `onDrop`'s delay;
 * a refusal ends the promise with an EventStreamRefused.
 */
export function streamEvents(client: ApiClient, signal: AbortSignal, handlers: EventStreamHandlers): Promise<void> {
  return fetchEventSource(EVENTS_PATH, {
    signal,
    // Kept open in a background tab: that is when a notification matters most.
    openWhenHidden: true,
    fetch: (input, init) => client.authorizedFetch(input, init),
    async onopen(response) {
      if (response.status === 401 || response.status === 403) throw new EventStreamRefused(response.status);
      const type = response.headers.get('content-type') ?? '';
      if (!response.ok || !type.startsWith(EventStreamContentType)) throw new Error(`The live events answered ${response.status} ${type}`.trim());
      handlers.onOpen();
    },
    onmessage(message) {
      const event = parseLiveEvent(message);
      if (event) handlers.onEvent(event);
    },
    onclose() {
      // A stream the server ended (restart, load balancer timeout) is reopened like a failed one.
      throw new Error('The server closed the live events');
    },
    onerror(error: unknown) {
      if (error instanceof EventStreamRefused) throw error;
      return handlers.onDrop(error);
    },
  });
}
