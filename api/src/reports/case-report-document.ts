import { GENERAL_CAUTIONS, RAMAN_LASER_CAUTION, scanCautions } from '@siteband/shared';
import type { Content, TDocumentDefinitions } from 'pdfmake/interfaces';
import type { AuditVerifyDto } from '../audit/dto/audit.dto';
import type { FlatRecord } from '../cases/dto/case-list.dto';
import type { BundleDecisionDto, DecisionDto } from '../review/dto/decision.dto';
import { asArray, asNumber, asObject } from '../scans/json-reading';
import { spectrumPlot, type PlotInput } from './spectrum-plot';

/** Everything one case report shows, gathered by the report service. */
export interface CaseReportData {
  generatedAt: Date;
  generatedBy: string;
  caseRecord: FlatRecord;
  inspectorName: string;
  samples: (FlatRecord & { handovers?: FlatRecord[] })[];
  instrumentChecks: FlatRecord[];
  notes: FlatRecord[];
  /** The case's live photos (attachments of kind photo), with their captions. */
  photos: FlatRecord[];
  /** Each scan with its plot from the raw file, or why there is none. */
  scans: { record: FlatRecord; plot: PlotInput | null; plotNote: string | null }[];
  escalations: FlatRecord[];
  decisions: BundleDecisionDto[];
  currentDecisions: Record<string, DecisionDto>;
  audit: { entries: number; firstAt: string | null; lastAt: string | null; chain: AuditVerifyDto };
}

/** Section headings, in order (tests look for them in the extracted text). */
export const REPORT_SECTIONS = [
  'Site',
  'Samples and chain of custody',
  'Scans',
  'Likely compounds and evidence',
  'Hazards and cautions',
  'Review decisions and sign-off',
  'Escalations',
  'Audit summary',
] as const;

/** Candidates shown per scan besides those listed for caution. */
const FIRST_CANDIDATES = 3;
/** Peaks listed per scan (the tallest). */
const LISTED_PEAKS = 15;

const DECISION_LABELS: Record<string, string> = {
  accept: 'Identification accepted',
  replace: 'Identification replaced',
  needs_lab: 'Needs laboratory confirmation',
  return: 'Returned to the inspector',
  sign_off: 'Signed off',
  reopen: 'Reopened',
};

const text = (value: unknown): string => (value === null || value === undefined || value === '' ? '-' : String(value));
const when = (value: unknown): string => (typeof value === 'string' && value !== '' ? value.replace('T', ' ').replace(/\.\d{3}Z$/, ' UTC') : '-');
const cm1 = (value: unknown): string => (asNumber(value) === null ? '-' : (value as number).toFixed(1));

function heading(title: (typeof REPORT_SECTIONS)[number]): Content {
  return { text: title, style: 'h1' };
}

function keyValues(rows: [string, string][]): Content {
  return {
    table: { widths: [140, '*'], body: rows.map(([key, value]) => [{ text: key, bold: true }, value]) },
    layout: 'lightHorizontalLines',
    margin: [0, 0, 0, 8],
  };
}

function grid(header: string[], rows: string[][], widths?: (number | string)[]): Content {
  if (rows.length === 0) return { text: 'None recorded.', italics: true, margin: [0, 0, 0, 8] };
  return {
    table: { headerRows: 1, widths: widths ?? header.map(() => '*'), body: [header.map((cell) => ({ text: cell, bold: true })), ...rows] },
    layout: 'lightHorizontalLines',
    fontSize: 9,
    margin: [0, 0, 0, 8],
  };
}

/** The identification the report reads: the server's recomputation when there is one, else the tablet's. */
function identificationOf(scan: FlatRecord): { result: Record<string, unknown> | null; from: string } {
  const server = asObject(scan.serverResult);
  if (server) return { result: server, from: 'the server recomputation from the raw file' };
  const tablet = asObject(scan.result);
  return { result: tablet, from: tablet ? 'the tablet (no server recomputation yet)' : 'no identification recorded' };
}

/** The first candidates and every one listed for caution. */
function shownCandidates(result: Record<string, unknown> | null): Record<string, unknown>[] {
  const all = asArray(result?.candidates).map(asObject).filter((candidate): candidate is Record<string, unknown> => candidate !== null);
  return all.filter((candidate, index) => index < FIRST_CANDIDATES || candidate.listedForCaution === true);
}

/** The server's recomputation in one line: not run, failed or cannot reproduce (its reason), agrees, or differs. */
function serverRecomputation(scan: FlatRecord): string {
  if (typeof scan.serverRecomputeError === 'string' && scan.serverRecomputeError !== '') return text(scan.serverRecomputeError);
  if (!scan.serverRecomputedAt) return 'not run';
  return `${when(scan.serverRecomputedAt)}${scan.resultMismatch ? ': DIFFERS from the tablet, see review' : ': agrees with the tablet'}`;
}

function scanTitle(scan: FlatRecord, samples: CaseReportData['samples']): string {
  const sample = samples.find((candidate) => candidate.id === scan.sampleId);
  const laser = scan.technique === 'raman' && scan.excitationNm ? `, ${scan.excitationNm} nm` : '';
  return `Scan of ${text(sample?.label)}: ${scan.technique === 'raman' ? 'Raman' : 'IR'}${laser}, ${text(scan.phase)}, ${when(scan.recordedAt)}`;
}

function siteSection(data: CaseReportData): Content[] {
  const c = data.caseRecord;
  const position =
    asNumber(c.latitude) !== null && asNumber(c.longitude) !== null
      ? `${c.latitude}, ${c.longitude}${asNumber(c.locationAccuracyM) !== null ? ` (within ${c.locationAccuracyM} m)` : ''}${c.locationEnteredByHand ? ', entered by hand' : ''}`
      : '-';
  return [
    heading('Site'),
    keyValues([
      ['Site', text(c.siteName)],
      ['Address', text(c.address)],
      ['Position', position],
      ['Started', when(c.startedAt)],
      ['Inspector', data.inspectorName],
      ['Status', text(c.status).replace('_', ' ')],
      ['Weather', text(c.weatherNotes)],
      ['Access', text(c.accessNotes)],
      ['Case', `${c.id} (version ${c.version})`],
    ]),
    { text: 'Site notes', style: 'h2' },
    grid(['Recorded', 'Note'], data.notes.map((note) => [when(note.recordedAt), text(note.text)]), [110, '*']),
  ];
}

function samplesSection(data: CaseReportData): Content[] {
  const out: Content[] = [heading('Samples and chain of custody')];
  if (data.samples.length === 0) out.push({ text: 'No samples recorded.', italics: true });
  for (const sample of data.samples) {
    const observations = asObject(sample.observations);
    out.push(
      { text: `Sample ${text(sample.label)}`, style: 'h2' },
      keyValues([
        ['Container', text(sample.container)],
        ['Description', text(sample.description)],
        ['Location on site', text(sample.locationOnSite)],
        ['Observations', observations ? [observations.colour, observations.state, observations.notes].filter(Boolean).join('; ') || '-' : '-'],
        ['Collected', `${when(sample.collectedAt)} by ${text(sample.collectedBy)}`],
        ['Seal', text(sample.sealNumber)],
      ]),
      { text: 'Chain of custody', bold: true, margin: [0, 0, 0, 2] },
      grid(['At', 'From', 'To', 'Seal', 'Note'], (sample.handovers ?? []).map((h) => [when(h.at), text(h.from), text(h.to), text(h.sealNumber), text(h.note)])),
      ...photoList(data.photos.filter((photo) => photo.ownerId === sample.id)),
    );
  }
  const ofCase = data.photos.filter((photo) => photo.ownerType === 'case');
  if (ofCase.length > 0) out.push({ text: 'Photos of the site', style: 'h2' }, ...photoList(ofCase));
  return out;
}

/** Photos as a list: file name and caption (the bytes stay in object storage). */
function photoList(photos: FlatRecord[]): Content[] {
  if (photos.length === 0) return [];
  return [
    { text: 'Photos', bold: true, margin: [0, 0, 0, 2] },
    grid(['File', 'Caption'], photos.map((photo) => [text(photo.fileName), text(photo.caption)]), [140, '*']),
  ];
}

function scansSection(data: CaseReportData): Content[] {
  const out: Content[] = [heading('Scans')];
  if (data.scans.length === 0) out.push({ text: 'No scans recorded.', italics: true });
  for (const { record: scan, plot, plotNote } of data.scans) {
    const check = data.instrumentChecks.find((candidate) => candidate.id === scan.instrumentCheckId);
    const { result } = identificationOf(scan);
    const peaks = asArray(result?.peaks)
      .map(asObject)
      .filter((peak): peak is Record<string, unknown> => peak !== null)
      .sort((a, b) => (asNumber(b.relativeHeight) ?? 0) - (asNumber(a.relativeHeight) ?? 0))
      .slice(0, LISTED_PEAKS)
      .sort((a, b) => (asNumber(a.x) ?? 0) - (asNumber(b.x) ?? 0));
    out.push(
      { text: scanTitle(scan, data.samples), style: 'h2' },
      keyValues([
        ['Instrument check', check ? `${text(check.standardId)} at ${when(check.performedAt)}: ${check.passed ? 'passed' : 'FAILED'}` : 'none linked'],
        ['Server recomputation', serverRecomputation(scan)],
      ]),
      plot ? spectrumPlot(plot) : { text: plotNote ?? 'No spectrum plot.', italics: true, margin: [0, 0, 0, 6] },
      { text: 'Peaks (cm-1, tallest first up to 15, listed by position)', bold: true, margin: [0, 0, 0, 2] },
      grid(['Position (cm-1)', 'Relative height', 'Width (cm-1)'], peaks.map((peak) => [cm1(peak.x), (asNumber(peak.relativeHeight) ?? 0).toFixed(2), cm1(peak.widthCm1)])),
    );
  }
  return out;
}

function compoundsSection(data: CaseReportData): Content[] {
  const out: Content[] = [heading('Likely compounds and evidence')];
  for (const { record: scan } of data.scans) {
    const { result, from } = identificationOf(scan);
    out.push({ text: scanTitle(scan, data.samples), style: 'h2' }, { text: `From ${from}.`, italics: true, margin: [0, 0, 0, 4] });
    if (result && result.reliable === false) {
      out.push({ text: `No reliable result: ${asArray(result.reasons).map(String).join('; ') || 'the scan did not pass the quality check'}.`, margin: [0, 0, 0, 4] });
    }
    const candidates = shownCandidates(result);
    if (candidates.length === 0) out.push({ text: 'No likely compounds.', italics: true, margin: [0, 0, 0, 6] });
    candidates.forEach((candidate) => {
      const score = asNumber(candidate.score) ?? asNumber(candidate.bandAgreement);
      const caution = candidate.listedForCaution === true ? ' - listed for caution' : '';
      out.push(
        { text: `${text(candidate.rank ?? '')}${candidate.rank ? '. ' : ''}${text(candidate.name ?? candidate.id)} (CAS ${text(candidate.cas)})${caution}: band agreement ${score === null ? '-' : score.toFixed(2)}`, bold: true, margin: [0, 4, 0, 2] },
        { text: 'Explained peaks', fontSize: 9, italics: true },
        grid(['Observed', 'Expected', 'Assignment'], asArray(candidate.explained).map(asObject).filter(Boolean).map((peak) => [cm1(peak!.x), cm1(peak!.expectedCm1), text(peak!.assignment)]), [70, 70, '*']),
        { text: 'Missing bands', fontSize: 9, italics: true },
        grid(['Expected', 'Intensity', 'Assignment'], asArray(candidate.missing).map(asObject).filter(Boolean).map((band) => [cm1(band!.expectedCm1), text(band!.intensity), text(band!.assignment)]), [70, 70, '*']),
        { text: 'Evidence against', fontSize: 9, italics: true },
        grid(['Observed', 'Forbidden band', 'Why'], asArray(candidate.against).map(asObject).filter(Boolean).map((peak) => [cm1(peak!.x), cm1(peak!.forbiddenCm1), text(peak!.reason)]), [70, 70, '*']),
      );
    });
    const mixture = asObject(result?.mixture);
    if (mixture) {
      const parts = asArray(mixture.components).map(asObject).filter(Boolean).map((part) => `${text(part!.name)} (${((asNumber(part!.share) ?? 0) * 100).toFixed(0)} %)`);
      out.push({ text: `Possible mixture: ${parts.join(', ')}.`, margin: [0, 0, 0, 6] });
    }
  }
  return out;
}

function hazardsSection(data: CaseReportData): Content[] {
  const techniques = new Set(data.scans.map(({ record }) => (record.technique === 'raman' ? 'raman' : 'ir') as 'ir' | 'raman'));
  const cautions = new Set<string>(GENERAL_CAUTIONS);
  for (const technique of techniques) for (const caution of scanCautions(technique)) cautions.add(caution);
  if (techniques.has('raman')) cautions.add(RAMAN_LASER_CAUTION);
  for (const { record } of data.scans) for (const caution of asArray(identificationOf(record).result?.cautions)) cautions.add(String(caution));

  const cards = new Map<string, Record<string, unknown>>();
  for (const { record } of data.scans) {
    for (const candidate of shownCandidates(identificationOf(record).result)) {
      for (const card of asArray(candidate.hazards).map(asObject)) if (card && card.hazardous === true) cards.set(String(card.compoundId ?? card.name), card);
    }
  }
  const out: Content[] = [heading('Hazards and cautions'), { ul: [...cautions], margin: [0, 0, 0, 8] }];
  if (cards.size === 0) out.push({ text: 'None of the likely compounds carries a hazard classification in the compound library; the sample may still be hazardous.', italics: true });
  for (const card of cards.values()) {
    const pictograms = asArray(card.pictograms).map(asObject).filter(Boolean).map((p) => `${text(p!.code)} ${text(p!.description)}`);
    const statements = asArray(card.hStatements).map(asObject).filter(Boolean).map((h) => `${text(h!.code)} ${text(h!.text)}`);
    out.push(
      { text: `${text(card.name)}: ${text(card.signalWord)}${card.unNumber ? `, UN ${card.unNumber}` : ''}`, style: 'h2' },
      { ul: [...pictograms, ...statements, ...asArray(card.cautions).map(String)], fontSize: 9, margin: [0, 0, 0, 6] },
    );
  }
  return out;
}

function reviewSection(data: CaseReportData): Content[] {
  const scanName = (scanId: string | null) => {
    if (!scanId) return 'case';
    const scan = data.scans.find(({ record }) => record.id === scanId);
    return scan ? scanTitle(scan.record, data.samples).replace(/^Scan of /, '').split(':')[0] : scanId;
  };
  const signOff = [...data.decisions].reverse().find((decision) => decision.kind === 'sign_off');
  const status = text(data.caseRecord.status).replace('_', ' ');
  const current = data.scans.map(({ record }) => {
    const decision = data.currentDecisions[record.id];
    return [scanName(record.id), decision ? DECISION_LABELS[decision.kind] ?? decision.kind : 'no decision yet', text(decision?.compoundName)];
  });
  return [
    heading('Review decisions and sign-off'),
    {
      text: data.caseRecord.status === 'accepted' && signOff ? `Signed off by ${signOff.decidedByName} at ${when(signOff.decidedAt)}.` : `Not signed off: the case is ${status}.`,
      bold: true,
      margin: [0, 0, 0, 6],
    },
    { text: 'Current decision per scan', style: 'h2' },
    grid(['Scan', 'Decision', 'Compound'], current),
    { text: 'Every decision', style: 'h2' },
    grid(
      ['#', 'Decision', 'On', 'Compound', 'Reason or comment', 'By', 'At'],
      data.decisions.map((d) => [String(d.revision), `${DECISION_LABELS[d.kind] ?? d.kind}${d.earlier ? ' (earlier submission)' : ''}`, scanName(d.scanId), text(d.compoundName), [d.reason, d.comment].filter(Boolean).join(' / ') || '-', d.decidedByName, when(d.decidedAt)]),
      [18, 70, 60, 60, '*', 60, 60],
    ),
  ];
}

function escalationsSection(data: CaseReportData): Content[] {
  const rows = data.escalations.map((e) => [
    when(e.raisedAt),
    text(e.reason),
    asArray(e.hazardClasses).map(String).join(', ') || '-',
    text(e.status),
    e.acknowledgedAt ? `${text(e.acknowledgedByName)} at ${when(e.acknowledgedAt)}: ${text(e.actionTaken).replace(/_/g, ' ')}${e.ppeLevel ? ` (PPE level ${e.ppeLevel})` : ''}${e.ackComment ? `; ${e.ackComment}` : ''}` : '-',
    e.closedAt ? `${when(e.closedAt)}${e.closeComment ? `: ${e.closeComment}` : ''}` : '-',
  ]);
  return [heading('Escalations'), grid(['Raised', 'Reason', 'Hazard classes', 'Status', 'Acknowledged', 'Closed'], rows, [60, '*', 70, 50, 100, 70])];
}

function auditSection(data: CaseReportData): Content[] {
  const { chain } = data.audit;
  const verdict = chain.ok
    ? `This case's ${chain.checked} audit entries verified intact when this report was made: each entry's hash recomputed and its link to the entry before it.`
    : `This case's audit trail is BROKEN at entry ${chain.firstBroken?.seq}: ${chain.firstBroken?.reason}. Tell an administrator.`;
  return [
    heading('Audit summary'),
    keyValues([
      ['Entries for this case', String(data.audit.entries)],
      ['First', when(data.audit.firstAt)],
      ['Last', when(data.audit.lastAt)],
    ]),
    { text: verdict, bold: !chain.ok },
  ];
}

/** Our own layout of a case report: the sections in `REPORT_SECTIONS`, every page footed with the presumptive caution. */
export function caseReportDocument(data: CaseReportData): TDocumentDefinitions {
  return {
    pageSize: 'A4',
    pageMargins: [40, 50, 40, 50],
    info: { title: `Case report: ${text(data.caseRecord.siteName)}`, creator: 'Siteband' },
    content: [
      { text: `Case report: ${text(data.caseRecord.siteName)}`, style: 'title' },
      { text: `Made ${when(data.generatedAt.toISOString())} for ${data.generatedBy}.`, margin: [0, 0, 0, 4] },
      { text: 'Identification is presumptive: confirm by laboratory analysis.', bold: true, margin: [0, 0, 0, 10] },
      ...siteSection(data),
      ...samplesSection(data),
      ...scansSection(data),
      ...compoundsSection(data),
      ...hazardsSection(data),
      ...reviewSection(data),
      ...escalationsSection(data),
      ...auditSection(data),
    ],
    footer: (page, pages) => ({
      columns: [
        { text: 'Presumptive identification: confirm by laboratory analysis; follow the SDS, agency procedures and local codes.', fontSize: 7 },
        { text: `Page ${page} of ${pages}`, alignment: 'right', fontSize: 7, width: 70 },
      ],
      margin: [40, 20, 40, 0],
    }),
    styles: {
      title: { fontSize: 18, bold: true, margin: [0, 0, 0, 6] },
      h1: { fontSize: 14, bold: true, margin: [0, 12, 0, 6] },
      h2: { fontSize: 11, bold: true, margin: [0, 6, 0, 3] },
    },
    defaultStyle: { fontSize: 10 },
  };
}
