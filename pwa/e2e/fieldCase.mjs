// A synced field case made through the API the way a tablet makes one (sync push, then the raw
// file's upload), so the review tests start from a case on the server without driving the tablet.
// The sites and people are an invented demo scenario.
import assert from 'node:assert/strict';
import { createHash, randomUUID } from 'node:crypto';
import { readFileSync } from 'node:fs';
import { dirname, join } from 'node:path';
import { fileURLToPath } from 'node:url';
import { identifySpectrum, importSpectrum, scanResultRecord } from '@siteband/shared';

const SPECTRA = join(dirname(fileURLToPath(import.meta.url)), '..', '..', 'fixtures', 'spectra');

/** The case as the server gives it (`GET /api/cases/:id`, with its records); fails the test on anything but 200. */
export async function caseOnServer(baseUrl, token, caseId) {
  const response = await fetch(`${baseUrl}/api/cases/${caseId}`, { headers: { Authorization: `Bearer ${token}` } });
  assert.equal(response.status, 200, `GET /api/cases/${caseId} answered ${response.status}`);
  return response.json();
}

/**
 * Pushes changes as one batch from the tablet `clientId` and asserts every one was applied; gives the
 * new versions by id. The browser tests use it as another tablet writing to the server meanwhile.
 */
export async function push(baseUrl, token, changes, clientId = 'e2e-review') {
  const response = await fetch(`${baseUrl}/api/sync/push`, {
    method: 'POST',
    headers: { 'Content-Type': 'application/json', Authorization: `Bearer ${token}` },
    body: JSON.stringify({ clientId, batchId: randomUUID(), changes: changes.map((c) => ({ changeId: randomUUID(), op: 'upsert', ...c })) }),
  });
  assert.equal(response.status, 200, `push answered ${response.status}`);
  const { results } = await response.json();
  results.forEach((r, i) => assert.equal(r.status, 'applied', `${changes[i].entity} ${JSON.stringify(r)}`));
  return Object.fromEntries(results.map((r, i) => [changes[i].id, r.version]));
}

/**
 * The tablet's stored result for a fixture spectrum: the shared identification with its quality,
 * processing and code version, as the PWA stores it (the shared scanResultRecord).
 */
function storedResult(bytes, fileName, technique, excitationNm) {
  const spectrum = importSpectrum(new Uint8Array(bytes), { fileName, technique, ...(excitationNm ? { excitationNm } : {}) });
  const { processed, result } = identifySpectrum(spectrum, { process: { technique, phase: 'condensed' } });
  return scanResultRecord(result, processed);
}

/**
 * Creates a submitted case with one sample, a hand-over, a site note and one scan of a fixture file
 * (raw file uploaded and verified) as the given inspector. Gives the ids and the stored result.
 */
export async function submitFieldCase({ baseUrl, token, site, fixture = 'synthetic-ir-ethanol-liquid.csv', technique = 'ir', excitationNm = null }) {
  const raw = readFileSync(join(SPECTRA, fixture));
  const sha256 = createHash('sha256').update(raw).digest('hex');
  const caseId = randomUUID();
  const sampleId = randomUUID();
  const scanId = randomUUID();
  const attachmentId = randomUUID();
  const now = new Date();
  const at = (minutes) => new Date(now.getTime() - minutes * 60_000).toISOString();
  const result = storedResult(raw, fixture, technique, excitationNm);
  const caseData = { siteName: site, address: '12 Quay Road, Port Averin (demo)', startedAt: at(90), status: 'open' };
  const versions = await push(baseUrl, token, [
    { entity: 'case', id: caseId, baseVersion: null, data: caseData },
    {
      entity: 'sample', id: sampleId, baseVersion: null,
      data: { caseId, label: 'RV-01', container: 'Glass vial', locationOnSite: 'Drum 2, bung', observations: { state: 'liquid', colour: 'clear' }, collectedBy: 'Demo Inspector', collectedAt: at(80), sealNumber: 'S-4471' },
    },
    {
      entity: 'scan', id: scanId, baseVersion: null,
      data: { sampleId, technique, phase: 'condensed', excitationNm, recordedAt: at(70), rawAttachmentId: attachmentId, rawSha256: sha256, result, inspectorAcknowledgedAt: at(69) },
    },
    { entity: 'attachment', id: attachmentId, baseVersion: null, data: { ownerType: 'scan', ownerId: scanId, kind: 'raw-scan', fileName: fixture, contentType: 'text/csv', size: raw.length, sha256 } },
    { entity: 'handover', id: randomUUID(), baseVersion: null, data: { sampleId, from: 'Demo Inspector', to: 'Courier J. Demo', at: at(60), sealNumber: 'S-4471', note: 'Cool box 3' } },
    { entity: 'note', id: randomUUID(), baseVersion: null, data: { caseId, text: 'Sweet solvent-like smell reported by the caretaker; drum label torn.', recordedAt: at(75) } },
  ]);
  const upload = await fetch(`${baseUrl}/api/attachments/${attachmentId}/content`, {
    method: 'PUT',
    headers: { 'Content-Type': 'text/csv', Authorization: `Bearer ${token}` },
    body: raw,
  });
  assert.equal(upload.status, 200, `raw upload answered ${upload.status}`);
  await push(baseUrl, token, [{ entity: 'case', id: caseId, baseVersion: versions[caseId], data: { ...caseData, status: 'submitted' } }]);
  return { caseId, sampleId, scanId, attachmentId, result };
}
