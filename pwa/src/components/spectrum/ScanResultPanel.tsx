import { useMemo, useState, useId } from 'react';
import { useTranslation } from 'react-i18next';
import type { IdentifyResult } from '@siteband/shared';
import type { IdentifyOutcome } from '../../features/identify/protocol';
import { formatNumber } from '../../features/identify/format';
import { resultView } from '../../features/identify/resultView';
import { AcknowledgeCautions } from '../caution/AcknowledgeCautions';
import { ResultCautions } from '../caution/ResultCautions';
import { CandidateCard } from './CandidateCard';
import { LazySpectrumPlot } from './LazySpectrumPlot';
import { MixtureSummary } from './MixtureSummary';
import { QualityVerdict } from './QualityVerdict';
import './results.css';

export interface ScanResultPanelProps {
  readonly outcome: IdentifyOutcome;
  /** True once this result's caution cards were acknowledged (the host keeps that state). */
  readonly acknowledged?: boolean;
  /**
   * Called when the inspector acknowledges the caution cards; the host marks the scan reviewed-by-inspector.
   * Without it (a supervisor reading a saved scan) the panel asks for no acknowledgement.
   */
  readonly onAcknowledge?: (result: IdentifyResult) => void;
  /** Called with the acknowledged result when it requires escalation; the host creates the escalation record. */
  readonly onEscalation?: (result: IdentifyResult) => void;
}

/**
 * The result of one scan, ready to embed in any scan page: the plot, the quality verdict, the
 * likely compounds with their evidence and caution cards, the cautions, and the acknowledgement.
 */
export function ScanResultPanel({ outcome, acknowledged, onAcknowledge, onEscalation }: ScanResultPanelProps) {
  const { t, i18n } = useTranslation();
  const { result, plot, processed } = outcome;
  const view = useMemo(() => resultView(result), [result]);
  const [selectedId, setSelectedId] = useState<string | null>(null);
  // Unique per panel: a review page shows several scans at once.
  const plotHeadingId = useId();
  const likelyHeadingId = useId();
  const candidates = view.status === 'ranked' ? view.candidates : [];
  const selected = candidates.find((c) => c.candidate.id === selectedId) ?? candidates[0];
  const yLabel = result.technique === 'ir' ? t('identify.plot.yIr') : t('identify.plot.yRaman');

  function acknowledge() {
    onAcknowledge?.(result);
    if (result.escalation.required) onEscalation?.(result);
  }

  return (
    <div className="sb-result" data-testid="scan-result">
      <section className="sb-panel sb-panel--plot" aria-labelledby={plotHeadingId}>
        <h2 id={plotHeadingId} className="sb-panel__heading">
          {outcome.title ? t('identify.plot.headingTitled', { title: outcome.title }) : t('identify.plot.heading')}
        </h2>
        <LazySpectrumPlot
          plot={plot}
          technique={result.technique}
          expectedCm1={selected?.expectedCm1 ?? []}
          yLabel={yLabel}
          peaksKey={t('identify.plot.peaksKey')}
          expectedKey={selected ? t('identify.plot.expectedKey', { name: selected.candidate.name }) : ''}
        />
        {plot.flaggedPeaks.length > 0 && (
          <ul className="sb-flagged" aria-label={t('identify.plot.flagged')}>
            {plot.flaggedPeaks.map((p) => (
              <li key={p.x}>{p.reason}</li>
            ))}
          </ul>
        )}
        <QualityVerdict
          snr={processed.quality.snr}
          spikesRemoved={processed.quality.spikesRemoved}
          unreliableReasons={view.status === 'no-reliable-result' ? view.reasons : null}
        />
      </section>

      {view.status === 'ranked' && (
        <section aria-labelledby={likelyHeadingId} className="sb-likely">
          <h2 id={likelyHeadingId} className="sb-section-title">
            {t('identify.likely.heading')}
          </h2>
          <p className="sb-muted">{t('identify.likely.intro', {
              tolerance: formatNumber(result.parameters.toleranceCm1, i18n.language),
              compounds: result.parameters.libraryCompounds,
              version: result.libraryVersion.version,
            })}</p>
          {view.mixture && <MixtureSummary mixture={view.mixture} />}
          {candidates.length === 0 ? (
            <p className="sb-notice" data-testid="no-candidates">{t('identify.likely.none')}</p>
          ) : (
            <ol className="sb-candidates">
              {candidates.map((c) => (
                <li key={c.candidate.id}>
                  <CandidateCard view={c} selected={c === selected} onSelect={() => setSelectedId(c.candidate.id)} />
                </li>
              ))}
            </ol>
          )}
        </section>
      )}

      <ResultCautions cautions={view.cautions} />
      {onAcknowledge && <AcknowledgeCautions escalation={result.escalation} acknowledged={acknowledged ?? false} onAcknowledge={acknowledge} />}
    </div>
  );
}
