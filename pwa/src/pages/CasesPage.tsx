import { useState } from 'react';
import { IonButton, IonIcon, IonList } from '@ionic/react';
import { addOutline } from 'ionicons/icons';
import { useTranslation } from 'react-i18next';
import { CaseImportPanel } from '../components/caseArchive/CaseImportPanel';
import { CaseCard } from '../components/cases/CaseCard';
import { CaseFilters } from '../components/cases/CaseFilters';
import { StorageMeter } from '../components/cases/StorageMeter';
import { SyncBar } from '../components/cases/SyncBar';
import { CautionNote } from '../components/CautionNote';
import { PageShell } from '../components/PageShell';
import { casePaths } from '../features/cases/casePaths';
import { filterCases, NO_FILTER } from '../features/cases/filterCases';
import { useCaseList } from '../features/cases/useCases';

/** The inspector's cases on this tablet: search, filters, sync, storage and "new case". */
export default function CasesPage() {
  const { t } = useTranslation();
  const items = useCaseList();
  const [filter, setFilter] = useState(NO_FILTER);
  const shown = items ? filterCases(items, filter) : [];

  return (
    <PageShell title={t('pages.cases.title')}>
      <div className="sb-case-actions">
        <IonButton routerLink={casePaths.create} className="sb-primary" data-testid="new-case">
          <IonIcon icon={addOutline} slot="start" aria-hidden="true" />
          {t('capture.cases.new')}
        </IonButton>
        <SyncBar />
      </div>
      <section className="sb-panel" aria-labelledby="case-list-heading">
        <h2 id="case-list-heading" className="sb-panel__heading">
          {t('capture.cases.listHeading')}
        </h2>
        <CaseFilters value={filter} onChange={setFilter} />
        {items && items.length === 0 && <p className="sb-muted">{t('capture.cases.none')}</p>}
        {items && items.length > 0 && shown.length === 0 && <p className="sb-muted">{t('capture.cases.noMatch')}</p>}
        <IonList className="sb-link-list sb-case-list" lines="none">
          {shown.map((item) => (
            <CaseCard key={item.row.id} item={item} />
          ))}
        </IonList>
      </section>
      <CaseImportPanel />
      <section className="sb-panel" aria-labelledby="storage-heading">
        <h2 id="storage-heading" className="sb-panel__heading">
          {t('capture.storage.heading')}
        </h2>
        <StorageMeter refreshKey={items?.length} />
      </section>
      <CautionNote />
    </PageShell>
  );
}
