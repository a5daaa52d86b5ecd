import { IonButton } from '@ionic/react';
import { useTranslation } from 'react-i18next';
import { captureDb } from '../../features/cases/captureDb';
import { tabletData } from '../../features/sync/captureTables';
import { resolveConflict } from '../../features/sync/resolveConflict';
import { useConflicts } from '../../features/sync/useConflicts';
import { ConflictTable } from './ConflictTable';

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
            {fields ? (
              <ConflictTable mine={row.data as Record<string, unknown>} server={fields} serverVersion={server!.version} />
            ) : (
              <p className="sb-muted">{t('capture.conflict.serverMissing')}</p>
            )}
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
