import { scanResultRecord } from '@siteband/shared';
import type { SitebandDb } from '../../db/db';
import { isLive } from '../../db/captureRecord';
import type { InstrumentCheckRow } from '../../db/instrumentChecksTable';
import type { PhotoRow } from '../../db/photosTable';
import type { ScanData, ScanRow } from '../../db/scansTable';
import type { IdentifyOutcome, ScanFile } from '../identify/protocol';
import { DEFAULT_PROCESSING, DEFAULT_SCAN_SETTINGS, type ProcessingSettings, type ScanSettings } from '../identify/scanSettings';
import { heldBytes } from '../photos/attachmentBytes';
import { captureScope } from '../sync/captureTables';
import { recordUpsert } from '../sync/recordChange';
import { escalationData } from './escalationData';
import { assertOutcomeOf, caseCheckId } from './saveScan';

type Recorded = { technique?: unknown; atr?: { enabled?: unknown }; baseline?: { lambda?: unknown }; smoothing?: { windowSize?: unknown }; peaks?: { thresholdSigma?: unknown } };

const recordedProcessing = (data: ScanData): Recorded | null => {
  const processing = data.result.processing;
  return processing && typeof processing === 'object' ? (processing as Recorded) : null;
};

/** How a saved scan was taken, as its settings form shows it: ATR as its result's processing recorded it. */
export function scanSettingsOf(data: ScanData): ScanSettings {
  const atr = recordedProcessing(data)?.atr?.enabled;
  return {
    technique: data.technique,
    phase: data.phase,
    atr: data.technique === 'ir' && (typeof atr === 'boolean' ? atr : DEFAULT_SCAN_SETTINGS.atr),
    excitationNm: data.excitationNm ?? DEFAULT_SCAN_SETTINGS.excitationNm,
  };
}

/**
 * The processing a re-run of a saved scan starts from: the baseline stiffness, smoothing window and peak
 * threshold its result recorded, while the technique stays the same; another technique starts from the
 * pipeline's defaults, since the recorded values belong to the other technique's processing.
 */
export function processingSettingsOf(data: ScanData, technique: ScanSettings['technique']): ProcessingSettings {
  const recorded = recordedProcessing(data);
  if (!recorded || recorded.technique !== technique) return DEFAULT_PROCESSING;
  const number = (value: unknown) => (typeof value === 'number' && Number.isFinite(value) ? value : null);
  return { baselineLambda: number(recorded.baseline?.lambda), smoothingWindow: number(recorded.smoothing?.windowSize), peakThresholdSigma: number(recorded.peaks?.thresholdSigma) };
}

/** True when the settings differ from the saved scan's in anything its identification depends on. */
export function identificationChanged(data: ScanData, settings: ScanSettings): boolean {
  const saved = scanSettingsOf(data);
  return (
    saved.technique !== settings.technique ||
    saved.phase !== settings.phase ||
    saved.atr !== (settings.technique === 'ir' && settings.atr) ||
    (settings.technique === 'raman' && saved.excitationNm !== settings.excitationNm)
  );
}

/** The scan's raw file as kept on the tablet, byte for byte, ready for the worker; null when only its metadata is here. */
export async function storedRawFile(db: SitebandDb, raw: PhotoRow | null): Promise<ScanFile | null> {
  const bytes = raw?.bytesHeld ? await heldBytes(db, raw.id) : undefined;
  return raw && bytes ? { name: raw.data.fileName, bytes } : null;
}

/** A change to a saved scan, as the scan page hands it over. */
export interface ScanEdit {
  readonly scan: ScanRow;
  readonly settings: ScanSettings;
  /** The identification run again from the raw file and acknowledged; null when nothing it depends on changed. */
  readonly reidentified: { readonly outcome: IdentifyOutcome; readonly acknowledgedAt: string } | null;
  /** The instrument check: keep the scan's, or link this local check (only a passed one is in force), or none. */
  readonly check: 'keep' | InstrumentCheckRow | null;
}

/** What was written: the scan's check, and the escalation raised by the new result, if any. */
export interface SavedScanEdit {
  readonly instrumentCheckId: string | null;
  readonly escalationId: string | null;
}

/**
 * Saves a change of a saved scan's metadata, offline, in ONE transaction with its changes. The raw file is
 * never touched. A change of anything the identification depends on needs the identification run again
 * from the raw file and acknowledged: the scan then carries the new result and acknowledgement, and an
 * escalation when the new result requires one (the capture's rule, `escalationData`), unless this scan
 * already raised the same one.
 */
export async function saveScanEdit(db: SitebandDb, edit: ScanEdit, now = Date.now()): Promise<SavedScanEdit> {
  const { scan, settings, reidentified } = edit;
  if (identificationChanged(scan.data, settings) && !reidentified) {
    throw new TypeError('Technique, phase, laser line or ATR changed: the identification must run again from the raw file, and be acknowledged, before saving');
  }
  if (reidentified) assertOutcomeOf(reidentified.outcome, settings);
  const escalation = reidentified ? escalationData(reidentified.outcome.result, { caseId: scan.caseId, scanId: scan.id, raisedAt: reidentified.acknowledgedAt }) : null;
  return db.transaction('rw', captureScope(db), async () => {
    const current = await db.scans.get(scan.id);
    if (!current || !isLive(current)) throw new Error('This scan is no longer on the tablet');
    const instrumentCheckId = edit.check === 'keep' ? current.data.instrumentCheckId : await caseCheckId(db, scan.caseId, edit.check, now);
    const data: ScanData = {
      ...current.data,
      technique: settings.technique,
      phase: settings.phase,
      excitationNm: settings.technique === 'raman' ? settings.excitationNm : null,
      instrumentCheckId,
      ...(reidentified ? { result: scanResultRecord(reidentified.outcome.result, reidentified.outcome.processed), inspectorAcknowledgedAt: reidentified.acknowledgedAt } : {}),
    };
    // The server's recomputation was of the old result: it no longer speaks for this one until the next pull.
    await recordUpsert(db, { entity: 'scan', id: scan.id, caseId: scan.caseId, data, ...(reidentified ? { extra: { serverCheck: undefined } } : {}) }, now);
    let escalationId: string | null = null;
    if (escalation) {
      const raised = await db.escalations.filter((e) => e.data.scanId === scan.id).toArray();
      const same = raised.some((e) => e.data.reason === escalation.reason && e.data.hazardClasses.join('\n') === escalation.hazardClasses.join('\n'));
      if (!same) {
        escalationId = crypto.randomUUID();
        await recordUpsert(db, { entity: 'escalation', id: escalationId, caseId: scan.caseId, data: escalation }, now);
      }
    }
    return { instrumentCheckId, escalationId };
  });
}
