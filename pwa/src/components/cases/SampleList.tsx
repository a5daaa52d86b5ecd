import { IonItem, IonLabel, IonList } from '@ionic/react';
import { useTranslation } from 'react-i18next';
import { casePaths } from '../../features/cases/casePaths';
import { useSamples } from '../../features/samples/useSamples';
import { SyncBadge } from './SyncBadge';

/** The samples of a case as large links to each sample. */
export function SampleList({ caseId }: { caseId: string }) {
  const { t } = useTranslation();
  const samples = useSamples(caseId);
  if (samples && samples.length === 0) return <p className="sb-muted">{t('capture.sample.none')}</p>;
  return (
    <IonList className="sb-link-list sb-case-list" lines="none">
      {samples?.map((s) => (
        <IonItem key={s.id} routerLink={casePaths.sample(caseId, s.id)} detail button className="sb-link-item" data-testid={`sample-${s.data.label}`}>
          <IonLabel>
            <h2>{s.data.label}</h2>
            <p className="sb-case-card__meta">
              {s.data.container && <span>{s.data.container}</span>}
              {s.data.observations.state && <span>{t(`capture.sample.states.${s.data.observations.state}`)}</span>}
              <SyncBadge state={s.sync} />
            </p>
            {s.rejectedReason && <p className="sb-error">{t('capture.sync.rejected', { reason: s.rejectedReason })}</p>}
          </IonLabel>
        </IonItem>
      ))}
    </IonList>
  );
}
