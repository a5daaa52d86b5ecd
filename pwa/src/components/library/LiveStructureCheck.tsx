import { useTranslation } from 'react-i18next';
import { gammaFormula } from '../../features/structure/gammaFormula';
import type { StructureOutcome } from '../../features/structure/structureWorkerClient';
import { StructureProblemAlert } from '../structure/StructureProblemAlert';

/** The edited geometry's point group and Γvib, and whether the fundamentals' labels match it. */
export function LiveStructureCheck({ outcome, error, running, problems }: {
  outcome: StructureOutcome | undefined;
  error: Error | null;
  running: boolean;
  problems: readonly string[];
}) {
  const { t } = useTranslation();
  return (
    <section className="sb-panel" aria-labelledby="live-check-heading" aria-live="polite">
      <h2 id="live-check-heading" className="sb-panel__heading">
        {t('library.editor.liveCheck')}
      </h2>
      {running && <p className="sb-muted">{t('library.structure.running')}</p>}
      {error && <StructureProblemAlert error={error} />}
      {outcome && !error && (
        <>
          <p className="sb-gamma">
            <span data-testid="editor-point-group">{outcome.check.pointGroup}</span> · Γ<sub>vib</sub> = {gammaFormula(outcome.check.vibrations.modes)}
          </p>
          {problems.length === 0 ? (
            <p className="sb-success" data-testid="labels-match">
              {t('library.editor.labelsMatch')}
            </p>
          ) : (
            <ul className="sb-error" data-testid="labels-mismatch">
              {problems.map((p) => (
                <li key={p}>{p}</li>
              ))}
            </ul>
          )}
        </>
      )}
    </section>
  );
}
