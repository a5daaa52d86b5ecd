import { IonButton } from '@ionic/react';
import { useTranslation } from 'react-i18next';
import { captureDb } from '../../features/cases/captureDb';
import { tabletData } from '../../features/sync/captureTables';
import { resolveConflict } from '../../features/sync/resolveConflict';
import { useConflicts } from '../../features/sync/useConflicts';

/** Each conflict of the case with both copies side by side and the two choices. */
export function ConflictPanel({ caseId }: { caseId: string }) {
  const { t } = useTranslation();
  const conflicts = useConflicts(caseId);
  if (!conflicts || conflicts.length === 0) return null;
  return (
    <section className="sb-panel sb-panel--conflict" aria-labelledby="conflict-heading" data-testid="conflicts">
      <h2 id="conflict-heading" className="sb-panel__heading">
        {t('capture.conflict.heading', { count: conflicts.length })}
      </h2>
      <p className="sb-muted">{t('capture.conflict.explain')}</p>
      {conflicts.map(({ entity, row }) => {
        const server = row.conflictServer;
        const fields = server ? tabletData(entity, server.data) : undefined;
        return (
          <article key={row.id} className="sb-conflict">
            <h3>{t(`capture.entity.${entity}`)}</h3>
            <div className="sb-conflict__columns">
              <div>
                <h4>{t('capture.conflict.mine')}</h4>
                <pre>{JSON.stringify(row.data, null, 2)}</pre>
              </div>
              <div>
                <h4>{t('capture.conflict.server', { version: server?.version ?? '?' })}</h4>
                <pre>{fields ? JSON.stringify(fields, null, 2) : t('capture.conflict.serverMissing')}</pre>
              </div>
            </div>
            <div className="sb-button-row">
              <IonButton className="sb-primary" disabled={!server} onClick={() => void resolveConflict(captureDb(), entity, row.id, 'mine')}>
                {t('capture.conflict.keepMine')}
              </IonButton>
              <IonButton fill="outline" disabled={!server} onClick={() => void resolveConflict(captureDb(), entity, row.id, 'server')}>
                {t('capture.conflict.takeServer')}
              </IonButton>
            </div>
          </article>
        );
      })}
    </section>
  );
}
