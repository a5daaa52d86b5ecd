import type { TFunction } from 'i18next';
import { REFERENCE_STANDARDS } from '@siteband/shared';
import type { CaseCheckRow } from '../../db/caseChecksTable';
import type { ScanData } from '../../db/scansTable';
import { formatAgreement, formatNumber } from '../../features/identify/format';
import { processingSettingsOf, scanSettingsOf } from '../../features/scans/editScan';
import { storedCandidates } from '../../features/scans/storedResult';
import { formatDateTime } from '../../i18n/format';

/** How many likely compounds of each copy's result the conflict shows. */
const SHOWN_CANDIDATES = 3;

/**
 * A scan's copy in the words the conflict table shows, field by field: how it was taken, its instrument
 * check (looked up among the case's checks on this tablet), its top likely compounds and whether the
 * inspector acknowledged its result. Ids, hashes and the raw result are left out.
 */
export function scanConflictFields(data: ScanData, checks: readonly CaseCheckRow[], t: TFunction, language: string): Record<string, string | null> {
  const when = (iso: string) => formatDateTime(Date.parse(iso), language);
  const result = data.result && typeof data.result === 'object' ? data.result : {};
  const settings = scanSettingsOf({ ...data, result });
  const processing = processingSettingsOf({ ...data, result }, data.technique);
  const check = data.instrumentCheckId ? checks.find((c) => c.id === data.instrumentCheckId) : undefined;
  const standard = check ? (REFERENCE_STANDARDS.find((s) => s.id === check.data.standardId)?.name ?? check.data.standardId) : null;
  const candidates = storedCandidates(result).slice(0, SHOWN_CANDIDATES);
  return {
    technique: t(`identify.settings.${data.technique}`),
    phase: t(`identify.settings.${data.phase}`),
    excitationNm: data.excitationNm === null ? null : t('capture.scanDetail.nm', { value: data.excitationNm }),
    atr: data.technique === 'ir' ? t(settings.atr ? 'identify.settings.atrYes' : 'identify.settings.atrNo') : null,
    processing:
      processing.baselineLambda === null || processing.smoothingWindow === null || processing.peakThresholdSigma === null
        ? t('capture.conflict.scan.processingNotRecorded')
        : t('identify.processing.summary', {
            lambda: processing.baselineLambda.toExponential(0),
            window: processing.smoothingWindow,
            sigma: formatNumber(processing.peakThresholdSigma, language),
          }),
    instrumentCheckId: !data.instrumentCheckId
      ? t('scanEdit.checkNone')
      : check
        ? t(check.data.passed ? 'capture.conflict.scan.checkPassed' : 'capture.conflict.scan.checkFailed', { standard, time: when(check.data.performedAt) })
        : t('capture.conflict.scan.checkNotHere'),
    likelyCompounds:
      candidates.length === 0
        ? t('capture.conflict.scan.noCandidates')
        : candidates.map((c) => t('capture.scans.top', { name: c.name, agreement: formatAgreement(c.score, language) })).join('; '),
    inspectorAcknowledgedAt: data.inspectorAcknowledgedAt ? when(data.inspectorAcknowledgedAt) : t('capture.scans.notAcknowledged'),
    recordedAt: when(data.recordedAt),
  };
}
