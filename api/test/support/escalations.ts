import { randomUUID } from 'node:crypto';
import { demo, push, upsert } from './field-records';
import type { TestApp } from './test-app';

/** An invented hazardous scan result: the tablet's likely compounds, best first. */
export const HAZARDOUS_RESULT = {
  codeVersion: '0.1.0',
  libraryVersion: 'demo-1',
  parameters: { smoothing: 7 },
  candidates: [
    { id: 'sodium-azide', name: 'Sodium azide', bandAgreement: 0.91 },
    { id: 'sodium-nitrate', name: 'Sodium nitrate', bandAgreement: 0.62 },
  ],
};

/** Pushes a new case with one sample, a hazardous scan and an escalation from it; returns the ids. */
export async function raiseEscalation(t: TestApp, inspectorToken: string, siteName = 'Quay 7 drum store, Port Averin') {
  const ids = { case: randomUUID(), sample: randomUUID(), scan: randomUUID(), escalation: randomUUID() };
  const results = await push(t, inspectorToken, [
    upsert('case', ids.case, demo.case({ siteName })),
    upsert('sample', ids.sample, demo.sample(ids.case)),
    upsert('scan', ids.scan, demo.scan(ids.sample, { result: HAZARDOUS_RESULT })),
    upsert('escalation', ids.escalation, {
      caseId: ids.case,
      scanId: ids.scan,
      raisedAt: '2026-11-30T09:00:00.000Z',
      reason: 'Likely azide: toxic, forms explosive metal azides',
      hazardClasses: ['Acute toxicity (oral), category 2', 'Hazardous to the aquatic environment'],
    }),
  ]);
  for (const result of results) if (result.status !== 'applied') throw new Error(`push not applied: ${JSON.stringify(result)}`);
  return ids;
}

/** Resolves when the condition holds, checking every 100 ms (the test's own timeout bounds the wait). */
export async function eventually<T>(check: () => Promise<T | undefined | null | false>): Promise<T> {
  for (;;) {
    const value = await check();
    if (value) return value;
    await new Promise((resolve) => setTimeout(resolve, 100));
  }
}
