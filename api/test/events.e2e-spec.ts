import type { AddressInfo } from 'node:net';
import { raiseEscalation } from './support/escalations';
import { demo, push, upsert } from './support/field-records';
import { DEMO, signIn, startTestApp, type TestApp } from './support/test-app';

interface Received {
  event: string;
  data: { type: string; id: string; caseId: string; at: string };
}

/** Reads `GET /api/events` as the PWA does (a fetch with the Bearer header), collecting every event. */
async function openStream(baseUrl: string, token: string) {
  const controller = new AbortController();
  const response = await fetch(`${baseUrl}/api/events`, { headers: { Authorization: `Bearer ${token}`, Accept: 'text/event-stream' }, signal: controller.signal });
  const received: Received[] = [];
  const waiters: { predicate: () => boolean; resolve: () => void }[] = [];
  const settle = () => {
    for (const waiter of [...waiters]) if (waiter.predicate()) waiters.splice(waiters.indexOf(waiter), 1) && waiter.resolve();
  };
  const reading = (async () => {
    if (!response.body) return;
    const decoder = new TextDecoder();
    let buffer = '';
    try {
      for await (const chunk of response.body) {
        buffer += decoder.decode(chunk as Uint8Array, { stream: true });
        let end: number;
        while ((end = buffer.indexOf('\n\n')) >= 0) {
          const block = buffer.slice(0, end);
          buffer = buffer.slice(end + 2);
          const fields = Object.fromEntries(block.split('\n').filter((line) => !line.startsWith(':')).map((line) => [line.slice(0, line.indexOf(':')), line.slice(line.indexOf(':') + 1).trim()]));
          if (fields.data) received.push({ event: fields.event, data: JSON.parse(fields.data) });
        }
        settle();
      }
    } catch {
      // aborted at the end of the test
    }
  })();
  return {
    status: response.status,
    contentType: response.headers.get('content-type'),
    received,
    waitFor: (predicate: () => boolean) => new Promise<void>((resolve) => (predicate() ? resolve() : waiters.push({ predicate, resolve }))),
    close: async () => {
      controller.abort();
      await reading;
    },
  };
}

describe('live events (e2e)', () => {
  let t: TestApp;
  let baseUrl: string;
  const tokens: Record<string, string> = {};
  let otherInspector: string;

  beforeAll(async () => {
    t = await startTestApp();
    await t.app.listen(0, '127.0.0.1');
    baseUrl = `http://127.0.0.1:${(t.app.getHttpServer().address() as AddressInfo).port}`;
    for (const [role, email] of Object.entries(DEMO)) tokens[role] = (await signIn(t, email)).accessToken;
    await t
      .http()
      .post('/api/users')
      .set('Authorization', `Bearer ${tokens.admin}`)
      .send({ email: 'events.inspector@demo.test', displayName: 'Events Inspector', role: 'inspector', password: 'events-inspector-pw' })
      .expect(201);
    otherInspector = (await signIn(t, 'events.inspector@demo.test', 'events-inspector-pw')).accessToken;
  });
  afterAll(async () => {
    await t?.close();
  });

  it('streams events of visible escalations and cases, and none of cases the user may not see', async () => {
    const safety = await openStream(baseUrl, tokens.safety_officer);
    const owner = await openStream(baseUrl, tokens.inspector);
    const stranger = await openStream(baseUrl, otherInspector);
    try {
      expect(safety.status).toBe(200);
      expect(safety.contentType).toMatch(/^text\/event-stream/);

      const ids = await raiseEscalation(t, tokens.inspector);
      await safety.waitFor(() => safety.received.some((item) => item.data.id === ids.escalation));
      await t.http().post(`/api/escalations/${ids.escalation}/acknowledge`).set('Authorization', `Bearer ${tokens.safety_officer}`).send({ actionTaken: 'no_action', baseVersion: 1 }).expect(200);
      await owner.waitFor(() => owner.received.some((item) => item.data.type === 'escalation.acknowledged'));
      expect(owner.received.filter((item) => item.data.id === ids.escalation)).toEqual([
        { event: 'escalation.raised', data: { type: 'escalation.raised', id: ids.escalation, caseId: ids.case, at: expect.any(String) } },
        { event: 'escalation.acknowledged', data: { type: 'escalation.acknowledged', id: ids.escalation, caseId: ids.case, at: expect.any(String) } },
      ]);

      // A later event of the stranger's own case: when it arrives, anything of the other case would have come first.
      const own = '7c1f0d52-3f0a-4d3e-9b7e-6a2f5c4b8e11';
      const [submitted] = await push(t, otherInspector, [upsert('case', own, demo.case({ siteName: 'Stranger site', status: 'submitted' }))]);
      expect(submitted.status).toBe('applied');
      await stranger.waitFor(() => stranger.received.length > 0);
      expect(stranger.received).toEqual([{ event: 'case.submitted', data: { type: 'case.submitted', id: own, caseId: own, at: expect.any(String) } }]);
      await safety.waitFor(() => safety.received.some((item) => item.data.id === own));
      expect(safety.received.map((item) => item.data.type)).toEqual(['escalation.raised', 'escalation.acknowledged', 'case.submitted']);
    } finally {
      await Promise.all([safety.close(), owner.close(), stranger.close()]);
    }
  });

  it('refuses administrators and requests without a token', async () => {
    const admin = await fetch(`${baseUrl}/api/events`, { headers: { Authorization: `Bearer ${tokens.admin}` } });
    expect(admin.status).toBe(403);
    const anonymous = await fetch(`${baseUrl}/api/events`);
    expect(anonymous.status).toBe(401);
  });
});
