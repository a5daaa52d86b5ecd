import type { StructureOutcome } from '../../features/structure/structureWorkerClient';
import { useTranslation } from 'react-i18next';
import { CharacterTableView } from './CharacterTableView';
import { ContributionsTable } from './ContributionsTable';
import { ModesTable } from './ModesTable';
import { StructureSummary } from './StructureSummary';

/** Everything the structure check found, from the point group down to its notes and cautions. */
export function StructureCheckResult({ outcome }: { outcome: StructureOutcome }) {
  const { t } = useTranslation();
  const { check, table } = outcome;
  const notes = [...check.vibrations.notes, ...(check.internalCoordinates?.notes ?? [])];
  return (
    <div data-testid="structure-result">
      <StructureSummary check={check} />
      <ModesTable modes={check.vibrations.modes} />
      <ContributionsTable check={check} />
      <CharacterTableView table={table} pointGroup={check.pointGroup} />
      <section className="sb-panel" aria-labelledby="structure-notes-heading">
        <h2 id="structure-notes-heading" className="sb-panel__heading">
          {t('library.structure.notesHeading')}
        </h2>
        <ul>
          {notes.map((note) => <li key={note}>{note}</li>)}
          {check.cautions.map((caution) => <li key={caution} className="sb-notice">{caution}</li>)}
        </ul>
      </section>
    </div>
  );
}
