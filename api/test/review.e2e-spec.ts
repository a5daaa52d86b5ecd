import { randomUUID } from 'node:crypto';
import { ROLES, type Role } from '@siteband/shared';
import Papa from 'papaparse';
import { demo, pullAll, push, upsert } from './support/field-records';
import { DEMO, expectErrorShape, signIn, startTestApp, type TestApp } from './support/test-app';

/** A likely compound as a scan's result carries it (the shared result shape, trimmed to what review reads). */
interface Finding {
  id: string;
  name: string;
  signalWord: 'Danger' | 'Warning' | null;
  escalates?: boolean;
}

const ACETONE: Finding = { id: 'acetone', name: 'Acetone', signalWord: 'Danger' };
const CALCITE: Finding = { id: 'calcium-carbonate', name: 'Calcium carbonate', signalWord: null };
const ACETIC: Finding = { id: 'acetic-acid', name: 'Acetic acid', signalWord: 'Danger' };
const PHOSGENE: Finding = { id: 'phosgene', name: 'Phosgene', signalWord: 'Danger', escalates: true };
const CITRIC: Finding = { id: 'citric-acid', name: 'Citric acid', signalWord: 'Warning' };

function resultOf(finding: Finding | null) {
  return {
    codeVersion: 'e2e',
    libraryVersion: 'e2e-library',
    parameters: { methodVersion: 'e2e' },
    reliable: finding !== null,
    candidates: finding ? [{ id: finding.id, name: finding.name, score: 0.9, hazards: [{ signalWord: finding.signalWord }] }] : [],
    escalation: { required: finding?.escalates === true, triggers: [] },
  };
}

interface MadeCase {
  caseId: string;
  sampleId: string;
  scanIds: string[];
  version: number;
}

describe('Review: decisions, the queue, its CSV and the case bundle (e2e)', () => {
  let t: TestApp;
  const tokens = {} as Record<Role, string>;
  let otherInspector: string;
  let supervisorName: string;

  beforeAll(async () => {
    t = await startTestApp();
    for (const role of ROLES) tokens[role] = (await signIn(t, DEMO[role])).accessToken;
    supervisorName = (await t.http().get('/api/me').set('Authorization', `Bearer ${tokens.supervisor}`)).body.displayName;
    await t.http().post('/api/users').set('Authorization', `Bearer ${tokens.admin}`)
      .send({ email: 'review.other@demo.test', displayName: 'Other Inspector', role: 'inspector', password: 'review-other-pw-2026' }).expect(201);
    otherInspector = (await signIn(t, 'review.other@demo.test', 'review-other-pw-2026')).accessToken;
  });
  afterAll(async () => {
    await t?.close();
  });

  const auth = (token: string) => ({ Authorization: `Bearer ${token}` });

  /** A case with one sample and a scan per finding, pushed by the inspector and (by default) submitted. */
  async function makeCase(options: { token?: string; siteName?: string; address?: string; startedAt?: string; findings?: (Finding | null)[]; submit?: boolean } = {}): Promise<MadeCase> {
    const token = options.token ?? tokens.inspector;
    const caseId = randomUUID();
    const sampleId = randomUUID();
    const scanIds = (options.findings ?? [ACETONE]).map(() => randomUUID());
    const caseData = demo.case({
      siteName: options.siteName ?? 'Review yard',
      ...(options.address ? { address: options.address } : {}),
      ...(options.startedAt ? { startedAt: options.startedAt } : {}),
    });
    const changes = [
      upsert('case', caseId, caseData),
      upsert('sample', sampleId, demo.sample(caseId)),
      ...scanIds.map((id, i) => upsert('scan', id, demo.scan(sampleId, { result: resultOf((options.findings ?? [ACETONE])[i]) }))),
    ];
    if (options.submit !== false) changes.push(upsert('case', caseId, { ...caseData, status: 'submitted' }, 1));
    const results = await push(t, token, changes);
    expect(results.map((result) => result.status)).toEqual(changes.map(() => 'applied'));
    return { caseId, sampleId, scanIds, version: options.submit === false ? 1 : 2 };
  }

  function decide(caseId: string, body: Record<string, unknown>, token = tokens.supervisor) {
    return t.http().post(`/api/review/cases/${caseId}/decisions`).set(auth(token)).send(body);
  }

  describe('the workflow', () => {
    it('submit → decisions → return with comment → the inspector pulls, reopens, fixes, resubmits → sign-off → frozen → reopen', async () => {
      const made = await makeCase({ findings: [ACETONE, CALCITE] });
      const [first, second] = made.scanIds;
      const { cursor: startCursor } = await pullAll(t, tokens.inspector);

      const accepted = await decide(made.caseId, { kind: 'accept', scanId: first, baseVersion: made.version }).expect(201);
      expect(accepted.body.case).toEqual({ id: made.caseId, status: 'in_review', version: made.version + 1 });
      expect(accepted.body.decision).toMatchObject({
        caseId: made.caseId, scanId: first, kind: 'accept', compoundId: 'acetone', compoundName: 'Acetone', revision: 1, decidedByName: supervisorName,
      });
      // In review, the case is the supervisors': the tablet can no longer change it.
      const frozen = await push(t, tokens.inspector, [upsert('case', made.caseId, demo.case({ siteName: 'Review yard', status: 'open' }), made.version + 1)]);
      expect(frozen[0]).toMatchObject({ status: 'rejected', reason: expect.stringContaining('in_review') });

      const replaced = await decide(made.caseId, { kind: 'replace', scanId: second, compoundId: 'gypsum', reason: 'Bands at 1006 and 1136 cm-1 fit gypsum better', baseVersion: made.version + 1 }).expect(201);
      expect(replaced.body.decision).toMatchObject({ kind: 'replace', compoundId: 'gypsum', compoundName: expect.any(String), revision: 2 });

      const returned = await decide(made.caseId, { kind: 'return', comment: 'Photograph the second drum label, please', baseVersion: made.version + 2 }).expect(201);
      expect(returned.body.case.status).toBe('returned');
      let version = returned.body.case.version as number;
      // Until the inspector submits again, the returned submission is the latest: nothing is earlier yet.
      const whileReturned = await t.http().get(`/api/review/cases/${made.caseId}`).set(auth(tokens.supervisor)).expect(200);
      expect(whileReturned.body.decisions.map((decision: { earlier: boolean }) => decision.earlier)).toEqual([false, false, false]);
      expect(Object.keys(whileReturned.body.currentDecisions).sort()).toEqual([first, second].sort());

      // The inspector's tablet learns the decisions and the new status by pull.
      const pulled = await pullAll(t, tokens.inspector, startCursor);
      const decisions = pulled.changes.filter((change) => change.entity === 'decision');
      expect(decisions.map((change) => change.data.kind)).toEqual(['accept', 'replace', 'return']);
      expect(decisions[2].data).toEqual({
        caseId: made.caseId, scanId: null, kind: 'return', compoundId: null, compoundName: null, reason: null,
        comment: 'Photograph the second drum label, please', revision: 3, decidedBy: expect.any(String), decidedByName: supervisorName,
        decidedAt: expect.stringMatching(/Z$/),
      });
      const pulledCase = pulled.changes.find((change) => change.entity === 'case' && change.id === made.caseId)!;
      expect(pulledCase).toMatchObject({ version, data: { status: 'returned' } });

      // Returned: only a reopen is accepted from the tablet; then it fixes and resubmits.
      const notReopen = await push(t, tokens.inspector, [upsert('case', made.caseId, demo.case({ siteName: 'Review yard', status: 'submitted' }), version)]);
      expect(notReopen[0]).toMatchObject({ status: 'rejected', reason: expect.stringContaining('reopen it') });
      const reopened = await push(t, tokens.inspector, [upsert('case', made.caseId, demo.case({ siteName: 'Review yard', status: 'open' }), version)]);
      expect(reopened[0]).toMatchObject({ status: 'applied', version: version + 1 });
      // The fix changes the second scan (a better result for it) before the case goes back.
      const fixed = await push(t, tokens.inspector, [
        upsert('note', randomUUID(), demo.note(made.caseId)),
        upsert('scan', second, demo.scan(made.sampleId, { result: resultOf(CITRIC) }), 1),
        upsert('case', made.caseId, demo.case({ siteName: 'Review yard', status: 'submitted' }), version + 1),
      ]);
      expect(fixed.map((result) => result.status)).toEqual(['applied', 'applied', 'applied']);
      version += 2;

      // The supervisor decides on the resubmitted state: the decisions before the return are history.
      const stale = await decide(made.caseId, { kind: 'sign_off', baseVersion: version }).expect(409);
      expect(stale.body.message).toContain('as last submitted');
      expect(stale.body.message).toContain(first);
      expect(stale.body.message).toContain(second);
      const resubmitted = await t.http().get(`/api/review/cases/${made.caseId}`).set(auth(tokens.supervisor)).expect(200);
      expect(resubmitted.body.decisions.map((decision: { revision: number; earlier: boolean }) => [decision.revision, decision.earlier])).toEqual([[1, true], [2, true], [3, true]]);
      expect(resubmitted.body.currentDecisions).toEqual({});

      await decide(made.caseId, { kind: 'accept', scanId: first, baseVersion: version }).expect(201);
      const halfway = await decide(made.caseId, { kind: 'sign_off', baseVersion: version + 1 }).expect(409);
      expect(halfway.body.message).toContain(second);
      expect(halfway.body.message).not.toContain(first);
      const redecided = await decide(made.caseId, { kind: 'accept', scanId: second, baseVersion: version + 1 }).expect(201);
      expect(redecided.body.decision).toMatchObject({ compoundId: 'citric-acid', revision: 5 });
      version += 2;

      const signed = await decide(made.caseId, { kind: 'sign_off', comment: 'Presumptive identification confirmed by review', baseVersion: version }).expect(201);
      expect(signed.body.case).toEqual({ id: made.caseId, status: 'accepted', version: version + 1 });
      version += 1;

      // Accepted is frozen for the inspector, and for further decisions except reopen.
      const afterAccept = await push(t, tokens.inspector, [
        upsert('case', made.caseId, demo.case({ siteName: 'Changed after sign-off', status: 'open' }), version),
        upsert('note', randomUUID(), demo.note(made.caseId)),
      ]);
      expect(afterAccept.map((result) => result.status)).toEqual(['rejected', 'rejected']);
      expect(afterAccept[0].reason).toContain('accepted and frozen');
      const late = await decide(made.caseId, { kind: 'needs_lab', scanId: first, baseVersion: version }).expect(409);
      expect(late.body.message).toContain('is accepted');

      await decide(made.caseId, { kind: 'reopen', baseVersion: version }).expect(400);
      const reopenedBySupervisor = await decide(made.caseId, { kind: 'reopen', reason: 'The laboratory result disagrees', baseVersion: version }).expect(201);
      expect(reopenedBySupervisor.body.case.status).toBe('in_review');
      expect(reopenedBySupervisor.body.decision).toMatchObject({ kind: 'reopen', reason: 'The laboratory result disagrees', revision: 7 });

      const labbed = await decide(made.caseId, { kind: 'needs_lab', scanId: first, comment: 'Send to the laboratory', baseVersion: version + 1 }).expect(201);
      expect(labbed.body.decision.revision).toBe(8);

      // The bundle: every decision (those before the return marked earlier), the current one per scan
      // (a reopen is no new submission: the decisions since the return stand), samples with their hand-overs.
      const bundle = await t.http().get(`/api/review/cases/${made.caseId}`).set(auth(tokens.supervisor)).expect(200);
      expect(bundle.body.decisions.map((decision: { revision: number; earlier: boolean }) => [decision.revision, decision.earlier])).toEqual([
        [1, true], [2, true], [3, true], [4, false], [5, false], [6, false], [7, false], [8, false],
      ]);
      expect(bundle.body.currentDecisions[first]).toMatchObject({ kind: 'needs_lab', revision: 8 });
      expect(bundle.body.currentDecisions[second]).toMatchObject({ kind: 'accept', compoundId: 'citric-acid', revision: 5 });
      expect(bundle.body.case).toMatchObject({ id: made.caseId, status: 'in_review', version: version + 2 });
      expect(bundle.body.samples).toEqual([expect.objectContaining({ id: made.sampleId, handovers: [] })]);
      expect(bundle.body.scans.map((scan: { id: string }) => scan.id).sort()).toEqual([...made.scanIds].sort());
      expect(bundle.body.scans[0]).toEqual(expect.objectContaining({ result: expect.any(Object), serverResult: null, mismatch: null, rawAttachmentId: null }));
      expect(bundle.body.notes).toHaveLength(1);
      expect(bundle.body).not.toHaveProperty('handovers');

      // Every decision and status change is in the audit trail, the supervisor's reopen included.
      const audit = await t.http().get('/api/audit').query({ caseId: made.caseId, pageSize: 100 }).set(auth(tokens.admin)).expect(200);
      const entries = (audit.body.items as { entity: string; action: string; actorRole: string; before: Record<string, unknown> | null; after: Record<string, unknown> | null }[]).reverse();
      const byReview = entries.filter((entry) => entry.actorRole === 'supervisor');
      expect(byReview.filter((entry) => entry.entity === 'decision').map((entry) => entry.after?.kind)).toEqual(['accept', 'replace', 'return', 'accept', 'accept', 'sign_off', 'reopen', 'needs_lab']);
      const statusMoves = byReview.filter((entry) => entry.entity === 'case').map((entry) => `${entry.before?.status}→${entry.after?.status}`);
      expect(statusMoves).toEqual([
        'submitted→in_review', 'in_review→in_review', 'in_review→returned', 'submitted→in_review', 'in_review→in_review', 'in_review→accepted', 'accepted→in_review', 'in_review→in_review',
      ]);
      expect((await t.http().get('/api/audit/verify').set(auth(tokens.admin)).expect(200)).body.ok).toBe(true);
    });

    it('needs every scan decided before sign-off, and a likely compound to accept', async () => {
      const made = await makeCase({ findings: [ACETONE, null] });
      const early = await decide(made.caseId, { kind: 'sign_off', baseVersion: made.version }).expect(409);
      expect(early.body.message).toContain(made.scanIds[0]);
      expect(early.body.message).toContain(made.scanIds[1]);
      const noCompound = await decide(made.caseId, { kind: 'accept', scanId: made.scanIds[1], baseVersion: made.version }).expect(409);
      expect(noCompound.body.message).toContain('no likely compound');
      await decide(made.caseId, { kind: 'accept', scanId: made.scanIds[0], baseVersion: made.version }).expect(201);
      await decide(made.caseId, { kind: 'needs_lab', scanId: made.scanIds[1], baseVersion: made.version + 1 }).expect(201);
      await decide(made.caseId, { kind: 'sign_off', baseVersion: made.version + 2 }).expect(201);
    });

    it('refuses decisions on a case still open on the tablet, and on a scan of another case', async () => {
      const open = await makeCase({ submit: false });
      const other = await makeCase();
      const response = await decide(open.caseId, { kind: 'accept', scanId: open.scanIds[0], baseVersion: open.version }).expect(409);
      expect(response.body.message).toContain('is open');
      await decide(other.caseId, { kind: 'accept', scanId: open.scanIds[0], baseVersion: other.version }).expect(404);
      await decide(randomUUID(), { kind: 'return', comment: 'x', baseVersion: 1 }).expect(404);
    });

    it('validates the body: kinds, required and refused fields, library compounds (400, nothing written)', async () => {
      const made = await makeCase();
      const bad = async (body: Record<string, unknown>, text: string) => {
        const response = await decide(made.caseId, { baseVersion: made.version, ...body }).expect(400);
        expectErrorShape(response.body, 400, `/api/review/cases/${made.caseId}/decisions`);
        expect(response.body.message).toContain(text);
      };
      await bad({ kind: 'approve' }, 'kind must be one of accept, replace, needs_lab, return, sign_off, reopen');
      await bad({ kind: 'accept' }, 'scanId must be the UUID of a scan');
      await bad({ kind: 'replace', scanId: made.scanIds[0], reason: 'better fit' }, 'compoundId must name a compound');
      await bad({ kind: 'replace', scanId: made.scanIds[0], compoundId: 'ethanol' }, 'reason must be');
      await bad({ kind: 'replace', scanId: made.scanIds[0], compoundId: 'no-such-compound', reason: 'x' }, 'not a compound of the library in force');
      await bad({ kind: 'return' }, 'comment must be');
      await bad({ kind: 'return', comment: 'x', scanId: made.scanIds[0] }, 'does not take scanId');
      await bad({ kind: 'accept', scanId: made.scanIds[0], compoundId: 'ethanol' }, 'does not take compoundId');
      await bad({ kind: 'accept', scanId: made.scanIds[0], baseVersion: 'two' }, 'baseVersion must be');
      await bad({ kind: 'accept', scanId: made.scanIds[0], verdict: 'fine' }, 'property verdict should not exist');
      const bundle = await t.http().get(`/api/review/cases/${made.caseId}`).set(auth(tokens.supervisor)).expect(200);
      expect(bundle.body.decisions).toEqual([]);
      expect(bundle.body.case).toMatchObject({ status: 'submitted', version: made.version });
    });
  });

  describe('optimistic concurrency', () => {
    it('answers 409 to a decision made on a stale version, and writes nothing', async () => {
      const made = await makeCase({ findings: [ACETONE, CALCITE] });
      const firstSupervisorSaw = made.version;
      await decide(made.caseId, { kind: 'accept', scanId: made.scanIds[0], baseVersion: firstSupervisorSaw }).expect(201);
      const stale = await decide(made.caseId, { kind: 'return', comment: 'Resample', baseVersion: firstSupervisorSaw }).expect(409);
      expectErrorShape(stale.body, 409, `/api/review/cases/${made.caseId}/decisions`);
      expect(stale.body.message).toContain(`is at version ${firstSupervisorSaw + 1}, not ${firstSupervisorSaw}`);
      // An inspector's edit while submitted also moves the version on.
      const later = await makeCase();
      const edited = await push(t, tokens.inspector, [upsert('case', later.caseId, demo.case({ siteName: 'Review yard, gate B', status: 'submitted' }), later.version)]);
      expect(edited[0].status).toBe('applied');
      await decide(later.caseId, { kind: 'accept', scanId: later.scanIds[0], baseVersion: later.version }).expect(409);
      await decide(later.caseId, { kind: 'accept', scanId: later.scanIds[0], baseVersion: later.version + 1 }).expect(201);
      const bundle = await t.http().get(`/api/review/cases/${made.caseId}`).set(auth(tokens.supervisor)).expect(200);
      expect(bundle.body.decisions.map((decision: { kind: string }) => decision.kind)).toEqual(['accept']);
      expect(bundle.body.case.status).toBe('in_review');
    });

    it('two decisions sent at once on the same version: one is written, the other gets 409', async () => {
      const made = await makeCase({ findings: [ACETONE, CALCITE] });
      const answers = await Promise.all([
        decide(made.caseId, { kind: 'accept', scanId: made.scanIds[0], baseVersion: made.version }),
        decide(made.caseId, { kind: 'accept', scanId: made.scanIds[1], baseVersion: made.version }),
      ]);
      expect(answers.map((answer) => answer.status).sort()).toEqual([201, 409]);
    });
  });

  describe('pull and push of decisions', () => {
    it('a tablet cannot push a decision', async () => {
      const made = await makeCase();
      const [result] = await push(t, tokens.inspector, [upsert('decision', randomUUID(), { caseId: made.caseId, kind: 'accept' })]);
      expect(result.status).toBe('rejected');
      expect(result.reason).toBe('Written by the server only (review decision): tablets pull these records and never push them');
    });

    it("an inspector pulls only the decisions of their own cases; supervisors and safety officers pull all", async () => {
      const mine = await makeCase();
      const theirs = await makeCase({ token: otherInspector });
      await decide(mine.caseId, { kind: 'accept', scanId: mine.scanIds[0], baseVersion: mine.version }).expect(201);
      await decide(theirs.caseId, { kind: 'accept', scanId: theirs.scanIds[0], baseVersion: theirs.version }).expect(201);
      const decisionCases = async (token: string) =>
        (await pullAll(t, token)).changes.filter((change) => change.entity === 'decision').map((change) => change.data.caseId);
      const inspectorSees = await decisionCases(tokens.inspector);
      expect(inspectorSees).toContain(mine.caseId);
      expect(inspectorSees).not.toContain(theirs.caseId);
      expect(await decisionCases(otherInspector)).toEqual([theirs.caseId]);
      for (const role of ['supervisor', 'safety_officer'] as const) {
        expect(await decisionCases(tokens[role])).toEqual(expect.arrayContaining([mine.caseId, theirs.caseId]));
      }
    });
  });

  describe('the queue', () => {
    const SITE = 'Paging wharf';
    let made: (MadeCase & { n: number; findings: Finding[]; inspector: 'inspector' | 'other' })[];

    beforeAll(async () => {
      const catalogue = [ACETONE, CALCITE, ACETIC, PHOSGENE, CITRIC];
      made = [];
      for (let n = 0; n < 32; n++) {
        const findings = [catalogue[n % 5], catalogue[(n * 3 + 1) % 5]].slice(0, 1 + (n % 2));
        const inspector = n % 4 === 3 ? 'other' : 'inspector';
        const day = String(1 + (n % 28)).padStart(2, '0');
        const one = await makeCase({
          token: inspector === 'other' ? otherInspector : tokens.inspector,
          siteName: `${SITE} berth ${String(n).padStart(2, '0')}`,
          address: n % 8 === 0 ? '1 Lantern Row, Port Averin (demo)' : '9 Tidewater Lane, Port Averin (demo)',
          startedAt: `2026-10-${day}T${String(6 + (n % 12)).padStart(2, '0')}:00:00.000Z`,
          findings,
          submit: n % 10 !== 9,
        });
        made.push({ ...one, n, findings, inspector });
      }
      // One returned, one in review, one open escalation on a case without an escalating scan.
      await decide(made[0].caseId, { kind: 'return', comment: 'Label missing', baseVersion: made[0].version }).expect(201);
      await decide(made[1].caseId, { kind: 'accept', scanId: made[1].scanIds[0], baseVersion: made[1].version }).expect(201);
      const escalated = made[2];
      await push(t, tokens.inspector, [upsert('case', escalated.caseId, demo.case({ siteName: `${SITE} berth 02`, address: '9 Tidewater Lane, Port Averin (demo)', startedAt: '2026-10-03T08:00:00.000Z', status: 'open' }), escalated.version)]);
      const raised = await push(t, tokens.inspector, [
        upsert('escalation', randomUUID(), { caseId: escalated.caseId, raisedAt: '2026-10-03T08:30:00.000Z', reason: 'Strong smell of solvent reported by the harbour staff (demo)', hazardClasses: ['flammable-liquid'] }),
        upsert('case', escalated.caseId, demo.case({ siteName: `${SITE} berth 02`, address: '9 Tidewater Lane, Port Averin (demo)', startedAt: '2026-10-03T08:00:00.000Z', status: 'submitted' }), escalated.version + 1),
      ]);
      expect(raised.map((result) => result.status)).toEqual(['applied', 'applied']);
    });

    const queue = (query: Record<string, unknown>, token = tokens.supervisor) => t.http().get('/api/review/queue').query({ site: SITE, ...query }).set(auth(token));

    function expectedRank(one: (typeof made)[number]): number {
      if (one.n === 2) return 3;
      return Math.max(...one.findings.map((finding) => (finding.escalates ? 3 : finding.signalWord === 'Danger' ? 2 : finding.signalWord === 'Warning' ? 1 : 0)));
    }

    it('lists the cases that left the tablet with their columns', async () => {
      const response = await queue({ pageSize: 100 }).expect(200);
      const submitted = made.filter((one) => one.n % 10 !== 9);
      expect(response.body.total).toBe(submitted.length);
      expect(response.body).toMatchObject({ page: 1, pageSize: 100 });
      const byId = new Map(response.body.items.map((item: { caseId: string }) => [item.caseId, item]));
      for (const one of submitted) {
        const item = byId.get(one.caseId) as Record<string, unknown>;
        expect(item).toMatchObject({
          siteName: `${SITE} berth ${String(one.n).padStart(2, '0')}`,
          inspector: { id: expect.any(String), displayName: one.inspector === 'other' ? 'Other Inspector' : expect.any(String) },
          highestHazard: { rank: expectedRank(one) },
          likelyCompounds: expect.arrayContaining([...new Map(one.findings.map((finding) => [finding.id, { id: finding.id, name: finding.name }])).values()]),
          samples: 1,
          scans: one.findings.length,
          openEscalations: one.n === 2 ? 1 : 0,
          submittedAt: expect.stringMatching(/Z$/),
        });
        expect(item.likelyCompounds).toHaveLength(new Set(one.findings.map((finding) => finding.id)).size);
      }
      expect((byId.get(made[0].caseId) as { status: string }).status).toBe('returned');
      expect((byId.get(made[1].caseId) as { status: string }).status).toBe('in_review');
      expect((byId.get(made[2].caseId) as { highestHazard: unknown }).highestHazard).toEqual({ rank: 3, label: 'escalation' });
      expect((byId.get(made[5].caseId) as { highestHazard: unknown }).highestHazard).toEqual({ rank: 2, label: 'danger' });
    });

    it('pages without gaps or repeats in every sort order', async () => {
      for (const sort of ['startedAt', 'submittedAt', 'siteName', 'inspector', 'status', 'highestHazard']) {
        for (const order of ['asc', 'desc']) {
          const whole = (await queue({ sort, order, pageSize: 100 }).expect(200)).body.items.map((item: { caseId: string }) => item.caseId);
          const paged: string[] = [];
          for (let page = 1; page <= 4; page++) {
            const body = (await queue({ sort, order, page, pageSize: 8 }).expect(200)).body;
            expect(body).toMatchObject({ page, pageSize: 8, total: whole.length });
            paged.push(...body.items.map((item: { caseId: string }) => item.caseId));
          }
          expect(paged).toEqual(whole);
        }
      }
    });

    it('sorts by each column', async () => {
      const items = async (sort: string, order: string) => (await queue({ sort, order, pageSize: 100 }).expect(200)).body.items as Record<string, never>[];
      const sortedBy = <T>(list: T[], key: (item: T) => string | number, direction: 1 | -1) =>
        [...list].sort((a, b) => (key(a) < key(b) ? -direction : key(a) > key(b) ? direction : 0)).map(key);

      const bySite = await items('siteName', 'asc');
      expect(bySite.map((item) => item.siteName)).toEqual(sortedBy(bySite, (item) => item.siteName as string, 1));
      const byStartDesc = await items('startedAt', 'desc');
      expect(byStartDesc.map((item) => item.startedAt)).toEqual(sortedBy(byStartDesc, (item) => item.startedAt as string, -1));
      const byHazard = await items('highestHazard', 'desc');
      const ranks = byHazard.map((item) => (item.highestHazard as { rank: number }).rank);
      expect(ranks).toEqual([...ranks].sort((a, b) => b - a));
      expect(ranks[0]).toBe(3);
      const byHazardAsc = await items('highestHazard', 'asc');
      expect(byHazardAsc.map((item) => (item.highestHazard as { rank: number }).rank)).toEqual([...ranks].sort((a, b) => a - b));
      const byInspector = await items('inspector', 'asc');
      const names = byInspector.map((item) => (item.inspector as { displayName: string }).displayName);
      expect(names).toEqual([...names].sort((a, b) => a.localeCompare(b, 'en', { sensitivity: 'base' })));
      const byStatus = (await items('status', 'asc')).map((item) => item.status as string);
      const workflow = ['open', 'submitted', 'in_review', 'accepted', 'returned'];
      expect(byStatus).toEqual([...byStatus].sort((a, b) => workflow.indexOf(a) - workflow.indexOf(b)));
    });

    it('filters by status, inspector, site, dates, hazard, compound and free text', async () => {
      const ids = async (query: Record<string, unknown>) =>
        ((await queue({ pageSize: 100, ...query }).expect(200)).body.items as { caseId: string }[]).map((item) => item.caseId).sort();
      const expected = (keep: (one: (typeof made)[number]) => boolean) => made.filter(keep).map((one) => one.caseId).sort();
      const left = (one: (typeof made)[number]) => one.n % 10 !== 9;

      expect(await ids({ status: 'returned,in_review' })).toEqual([made[0].caseId, made[1].caseId].sort());
      expect(await ids({ status: 'open' })).toEqual(expected((one) => !left(one)));
      const otherId = (await queue({ pageSize: 100 }).expect(200)).body.items.find((item: { inspector: { displayName: string } }) => item.inspector.displayName === 'Other Inspector').inspector.id;
      expect(await ids({ inspectorId: otherId })).toEqual(expected((one) => left(one) && one.inspector === 'other'));
      expect(await ids({ site: `${SITE} berth 1` })).toEqual(expected((one) => left(one) && one.n >= 10 && one.n < 20));
      expect(await ids({ from: '2026-10-05', to: '2026-10-08' })).toEqual(expected((one) => left(one) && one.n % 28 >= 4 && one.n % 28 <= 7));
      expect(await ids({ from: '2026-10-05T10:00:00Z', to: '2026-10-05T12:00:00Z' })).toEqual(expected((one) => left(one) && one.n % 28 === 4 && 6 + (one.n % 12) >= 10 && 6 + (one.n % 12) <= 12));
      expect(await ids({ hazard: 3 })).toEqual(expected((one) => left(one) && expectedRank(one) === 3));
      expect(await ids({ hazard: 2 })).toEqual(expected((one) => left(one) && expectedRank(one) >= 2));
      expect(await ids({ compound: 'citric-acid' })).toEqual(expected((one) => left(one) && one.findings.some((finding) => finding.id === 'citric-acid')));
      expect(await ids({ compound: 'carbon' })).toEqual(expected((one) => left(one) && one.findings.some((finding) => finding.id === 'calcium-carbonate')));
      expect(await ids({ q: 'Lantern' })).toEqual(expected((one) => left(one) && one.n % 8 === 0));
      expect(await ids({ q: '100%_' })).toEqual([]);
    });

    it('refuses bad query values with 400', async () => {
      const cases: [Record<string, unknown>, string][] = [
        [{ page: 0 }, 'page must not be less than 1'],
        [{ pageSize: 101 }, 'pageSize must not be greater than 100'],
        [{ sort: 'hazard' }, 'sort must be one of'],
        [{ order: 'up' }, 'order must be asc or desc'],
        [{ status: 'submitted,done' }, 'status must be a comma-separated list'],
        [{ inspectorId: 'nobody' }, 'inspectorId must be a user id'],
        [{ from: '30/11/2026' }, 'from must be an ISO 8601'],
        [{ hazard: 4 }, 'hazard must be a rank from 0 to 3'],
        [{ colour: 'red' }, 'property colour should not exist'],
      ];
      for (const [query, text] of cases) {
        const response = await queue(query).expect(400);
        expectErrorShape(response.body, 400, '/api/review/queue');
        expect(response.body.message).toContain(text);
      }
      const csv = await t.http().get('/api/review/queue.csv').query({ hazard: -1 }).set(auth(tokens.supervisor)).expect(400);
      expect(csv.headers['content-type']).toContain('application/json');
      expectErrorShape(csv.body, 400, '/api/review/queue.csv');
      expect(csv.body.message).toContain('hazard must be');
    });

    it('exports every matching row as CSV, in the queue order', async () => {
      const query = { site: SITE, sort: 'siteName', order: 'desc' };
      const response = await t.http().get('/api/review/queue.csv').query(query).set(auth(tokens.supervisor)).expect(200);
      expect(response.headers['content-type']).toBe('text/csv; charset=utf-8');
      expect(response.headers['content-disposition']).toContain('attachment');
      const parsed = Papa.parse<Record<string, string>>(response.text, { header: true });
      expect(parsed.errors).toEqual([]);
      const items = (await t.http().get('/api/review/queue').query({ ...query, pageSize: 100 }).set(auth(tokens.supervisor)).expect(200)).body.items;
      expect(parsed.data).toHaveLength(items.length);
      expect(items.length).toBeGreaterThan(25);
      expect(parsed.meta.fields).toEqual(['caseId', 'siteName', 'address', 'status', 'inspector', 'startedAt', 'submittedAt', 'highestHazard', 'hazardRank', 'likelyCompounds', 'samples', 'scans', 'openEscalations']);
      parsed.data.forEach((row, i) => {
        const item = items[i];
        expect(row).toEqual({
          caseId: item.caseId,
          siteName: item.siteName,
          address: item.address,
          status: item.status,
          inspector: item.inspector.displayName,
          startedAt: item.startedAt,
          submittedAt: item.submittedAt,
          highestHazard: item.highestHazard.label,
          hazardRank: String(item.highestHazard.rank),
          likelyCompounds: item.likelyCompounds.map((compound: { name: string }) => compound.name).join('; '),
          samples: String(item.samples),
          scans: String(item.scans),
          openEscalations: String(item.openEscalations),
        });
      });
      const escalatedOnly = Papa.parse<Record<string, string>>(
        (await t.http().get('/api/review/queue.csv').query({ site: SITE, hazard: 3 }).set(auth(tokens.supervisor)).expect(200)).text,
        { header: true },
      ).data;
      expect(escalatedOnly.every((row) => row.highestHazard === 'escalation')).toBe(true);
      expect(escalatedOnly.map((row) => row.caseId)).toContain(made[2].caseId);
    });
    it('shows escalation notes in the bundle; a closed escalation no longer counts as open nor raises the hazard', async () => {
      const escalated = made[2];
      const bundleOf = async () => (await t.http().get(`/api/review/cases/${escalated.caseId}`).set(auth(tokens.supervisor)).expect(200)).body;
      const [escalation] = (await bundleOf()).escalations;
      expect(escalation.notes).toEqual([]);
      const safety = auth(tokens.safety_officer);
      await t.http().post(`/api/escalations/${escalation.id}/notes`).set(safety).send({ text: 'Harbour master informed (demo)' }).expect(201);
      const withNote = (await bundleOf()).escalations[0];
      expect(withNote.notes).toEqual([expect.objectContaining({ escalationId: escalation.id, caseId: escalated.caseId, text: 'Harbour master informed (demo)', authorName: expect.any(String) })]);

      const ack = await t.http().post(`/api/escalations/${escalation.id}/acknowledge`).set(safety).send({ actionTaken: 'no_action', baseVersion: escalation.version }).expect(200);
      const acknowledged = (await queue({ pageSize: 100 }).expect(200)).body.items.find((item: { caseId: string }) => item.caseId === escalated.caseId);
      expect(acknowledged).toMatchObject({ openEscalations: 1, highestHazard: { rank: 3 } });
      await t.http().post(`/api/escalations/${escalation.id}/close`).set(safety).send({ comment: 'No hazard found on re-check (demo)', baseVersion: ack.body.version }).expect(200);
      const closed = (await queue({ pageSize: 100 }).expect(200)).body.items.find((item: { caseId: string }) => item.caseId === escalated.caseId);
      expect(closed).toMatchObject({ openEscalations: 0, highestHazard: { rank: expectedRank({ ...escalated, n: -1 }) } });
    });
  });

  describe('role matrix', () => {
    let made: MadeCase;
    beforeAll(async () => {
      made = await makeCase({ findings: [ACETONE, CALCITE] });
    });

    const routes: { name: string; allowed: readonly Role[]; status: number; call: (token?: string) => ReturnType<ReturnType<TestApp['http']>['get']> }[] = [
      { name: 'GET /api/review/queue', allowed: ['supervisor', 'safety_officer'], status: 200, call: (token) => withToken(t.http().get('/api/review/queue'), token) },
      { name: 'GET /api/review/queue.csv', allowed: ['supervisor', 'safety_officer'], status: 200, call: (token) => withToken(t.http().get('/api/review/queue.csv'), token) },
      { name: 'GET /api/review/cases/:caseId', allowed: ['inspector', 'supervisor', 'safety_officer'], status: 200, call: (token) => withToken(t.http().get(`/api/review/cases/${made.caseId}`), token) },
      {
        name: 'POST /api/review/cases/:caseId/decisions',
        allowed: ['supervisor'],
        status: 201,
        // needs_lab can be repeated: each permitted call appends one more decision on a fresh version.
        call: (token) => withToken(t.http().post(`/api/review/cases/${made.caseId}/decisions`), token).send({ kind: 'needs_lab', scanId: made.scanIds[1], baseVersion: made.version }),
      },
    ];

    function withToken<T extends { set: (name: string, value: string) => T }>(call: T, token?: string): T {
      return token ? call.set('Authorization', `Bearer ${token}`) : call;
    }

    describe.each(routes)('$name', ({ name, allowed, status, call }) => {
      const path = name.split(' ')[1].split('/:')[0];
      it('is refused without a token (401)', async () => {
        const response = await call();
        expect(response.status).toBe(401);
        expectErrorShape(response.body, 401, expect.stringContaining(path));
      });
      for (const role of ROLES) {
        const permitted = allowed.includes(role);
        it(`as ${role}: ${permitted ? status : 403}`, async () => {
          const response = await call(tokens[role]);
          if (permitted) {
            expect(response.status).toBe(status);
            if (status === 201) made.version = response.body.case.version;
          } else {
            expect(response.status).toBe(403);
            expectErrorShape(response.body, 403, expect.stringContaining(path));
            expect(response.body.message).toBe(`This needs the role ${allowed.join(' or ')}; you are signed in as ${role}`);
          }
        });
      }
    });

    it("an inspector cannot read another inspector's case bundle (404, nothing revealed)", async () => {
      const response = await t.http().get(`/api/review/cases/${made.caseId}`).set(auth(otherInspector)).expect(404);
      expectErrorShape(response.body, 404, `/api/review/cases/${made.caseId}`);
      expect(JSON.stringify(response.body)).not.toContain('Review yard');
      await t.http().get(`/api/review/cases/${randomUUID()}`).set(auth(tokens.supervisor)).expect(404);
      await t.http().get('/api/review/cases/not-a-uuid').set(auth(tokens.supervisor)).expect(400);
    });
  });
});
