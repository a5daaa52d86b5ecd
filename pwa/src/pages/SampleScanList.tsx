import { IonButton, IonIcon, IonItem, IonLabel, IonList } from '@ionic/react';
import { addOutline } from 'ionicons/icons';
import { useTranslation } from 'react-i18next';
import { SyncBadge } from '../components/cases/SyncBadge';
import { formatAgreement } from '../features/identify/format';
import { scanPaths } from '../features/scans/scanPaths';
import { storedCandidates } from '../features/scans/storedResult';
import { useSampleScans } from '../features/scans/useScans';
import { formatDateTime } from '../i18n/format';

/** A sample's scans (technique, time, top likely compound, acknowledgement, sync) and the way to add one. */
export function SampleScanList({ caseId, sampleId, editable }: { caseId: string; sampleId: string; editable: boolean }) {
  const { t, i18n } = useTranslation();
  const scans = useSampleScans(sampleId);
  return (
    <section className="sb-panel" aria-labelledby="scans-heading">
      <h2 id="scans-heading" className="sb-panel__heading">
        {t('capture.scans.heading')}
      </h2>
      {scans && scans.length === 0 && <p className="sb-muted">{t('capture.scans.none')}</p>}
      <IonList className="sb-link-list" lines="none">
        {scans?.map((scan) => {
          const top = storedCandidates(scan.data.result)[0];
          return (
            <IonItem key={scan.id} routerLink={scanPaths.scan(caseId, sampleId, scan.id)} detail button className="sb-link-item" data-testid="sample-scan">
              <IonLabel>
                <h3>
                  {t(`identify.settings.${scan.data.technique}`)} · <time dateTime={scan.data.recordedAt}>{formatDateTime(Date.parse(scan.data.recordedAt), i18n.language)}</time>
                </h3>
                <p>{top ? t('capture.scans.top', { name: top.name, agreement: formatAgreement(top.score, i18n.language) }) : t('capture.scans.noTop')}</p>
                <p className="sb-case-card__meta">
                  <span>{scan.data.inspectorAcknowledgedAt ? t('capture.scans.acknowledged') : t('capture.scans.notAcknowledged')}</span>
                  <SyncBadge state={scan.sync} />
                </p>
                {scan.rejectedReason && <p className="sb-error">{t('capture.sync.rejected', { reason: scan.rejectedReason })}</p>}
              </IonLabel>
            </IonItem>
          );
        })}
      </IonList>
      {editable && (
        <IonButton fill="outline" routerLink={scanPaths.newScan(caseId, sampleId)} data-testid="add-scan">
          <IonIcon icon={addOutline} slot="start" aria-hidden="true" />
          {t('capture.scans.add')}
        </IonButton>
      )}
    </section>
  );
}
