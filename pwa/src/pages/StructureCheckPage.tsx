import { useEffect, useRef, useState } from 'react';
import { IonButton, IonIcon } from '@ionic/react';
import { arrowBackOutline } from 'ionicons/icons';
import { useLocation } from 'react-router-dom';
import { useTranslation } from 'react-i18next';
import { CautionNote } from '../components/CautionNote';
import { PageShell } from '../components/PageShell';
import { StructureCheckResult } from '../components/structure/StructureCheckResult';
import { StructureInputForm } from '../components/structure/StructureInputForm';
import { StructureProblemAlert } from '../components/structure/StructureProblemAlert';
import { libraryPaths } from '../features/library/libraryPaths';
import { useStructureCheck } from '../features/structure/useStructureCheck';
import type { StructureInput } from '../features/structure/structureWorkerClient';

/** The structure check: a pasted or uploaded structure → point group, Γvib and selection rules, computed on the tablet. */
export default function StructureCheckPage() {
  const { t } = useTranslation();
  const paths = libraryPaths(useLocation().pathname);
  const [input, setInput] = useState<StructureInput>();
  const result = useStructureCheck(input);
  const answer = useRef<HTMLDivElement>(null);
  // On a tablet the form fills the screen: bring each new answer (or refusal) into view.
  useEffect(() => {
    if (result.dataUpdatedAt || result.errorUpdatedAt) answer.current?.scrollIntoView({ block: 'start' });
  }, [result.dataUpdatedAt, result.errorUpdatedAt]);
  return (
    <PageShell title={t('pages.structure.title')}>
      <IonButton fill="outline" routerLink={paths.list} routerDirection="back" className="sb-back">
        <IonIcon icon={arrowBackOutline} slot="start" aria-hidden="true" />
        {t('pages.structure.back')}
      </IonButton>
      <div className="sb-structure-layout sb-structure-layout--split">
        <section className="sb-panel" aria-labelledby="structure-input-heading">
          <h2 id="structure-input-heading" className="sb-panel__heading">
            {t('library.structure.inputHeading')}
          </h2>
          <p className="sb-muted">{t('library.structure.intro')}</p>
          <StructureInputForm onRun={setInput} busy={result.isFetching} />
        </section>
        <div aria-live="polite" ref={answer}>
          {result.isError && <StructureProblemAlert error={result.error} />}
          {result.data && !result.isError && <StructureCheckResult outcome={result.data} />}
          {!input && <p className="sb-panel sb-muted">{t('library.structure.empty')}</p>}
        </div>
      </div>
      <CautionNote laser />
    </PageShell>
  );
}
