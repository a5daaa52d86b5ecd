import { useTranslation } from 'react-i18next';
import { StructureCheckError } from '../../features/structure/structureWorkerClient';

/** The reason a structure was refused, announced to screen readers, with the line at fault. */
export function StructureProblemAlert({ error }: { error: Error }) {
  const { t } = useTranslation();
  const line = error instanceof StructureCheckError ? error.line : null;
  return (
    <div className="sb-error" role="alert" data-testid="structure-error">
      <p>
        <strong>{line === null ? t('library.structure.refused') : t('library.structure.refusedAtLine', { line })}</strong>
      </p>
      <p>{error.message}</p>
    </div>
  );
}
