import { IonItem, IonLabel } from '@ionic/react';
import { useTranslation } from 'react-i18next';
import type { CaseListItem } from '../../features/cases/useCases';
import { casePaths } from '../../features/cases/casePaths';
import { formatDateTime } from '../../i18n/format';
import { SyncBadge } from './SyncBadge';

/** One case in the list: site, visit time, status, sample count and sync state, as one large target. */
export function CaseCard({ item }: { item: CaseListItem }) {
  const { t, i18n } = useTranslation();
  const { row, sampleCount } = item;
  return (
    <IonItem routerLink={casePaths.case(row.id)} detail button className="sb-link-item sb-case-card" data-testid={`case-${row.id}`}>
      <IonLabel>
        <h2>{row.data.siteName}</h2>
        <p className="sb-case-card__meta">
          <span>{formatDateTime(Date.parse(row.data.startedAt), i18n.language)}</span>
          <span className={`sb-pill sb-status--${row.data.status}`}>{t(`capture.status.${row.data.status}`)}</span>
          <span>{t('capture.cases.sampleCount', { count: sampleCount })}</span>
          <SyncBadge state={row.sync} />
        </p>
        {row.data.address && <p>{row.data.address}</p>}
      </IonLabel>
    </IonItem>
  );
}
