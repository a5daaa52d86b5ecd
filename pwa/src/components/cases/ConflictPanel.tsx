import { IonButton } from '@ionic/react';
import { useLiveQuery } from 'dexie-react-hooks';
import { useTranslation } from 'react-i18next';
import type { CaptureEntity } from '../../db/captureRecord';
import type { ScanData } from '../../db/scansTable';
import { captureDb } from '../../features/cases/captureDb';
import { tabletData } from '../../features/sync/captureTables';
import { resolveConflict } from '../../features/sync/resolveConflict';
import { useConflicts, type ConflictItem } from '../../features/sync/useConflicts';
import { ConflictTable } from './ConflictTable';
import { scanConflictFields } from './scanConflictFields';

/** A copy's fields as the conflict table shows them: a scan's in words (how it was taken, its check, result and acknowledgement), any other record's as sent. */
function useShownFields(entity: CaptureEntity, caseId: string): (data: Record<string, unknown>) => Record<string, unknown> {
  const { t, i18n } = useTranslation();
  const checks = useLiveQuery(() => (entity === 'scan' ? captureDb().caseChecks.where('caseId').equals(caseId).toArray() : []), [entity, caseId]);
  return (data) => (entity === 'scan' ? scanConflictFields(data as unknown as ScanData, checks ?? [], t, i18n.language) : data);
}

/**
 * One conflict: the tablet's copy beside the server's and the two choices. When the tablet's side is a
 * delete it says so, shows the server's copy alone, and the choices read as deleting it anyway or keeping
 * the server's copy.
 */
function ConflictItemView({ entity, row }: ConflictItem) {
  const { t } = useTranslation();
  const shownFields = useShownFields(entity, row.caseId);
  const server = row.conflictServer;
  const fields = server ? shownFields(tabletData(entity, server.data)) : undefined;
  const deleted = row.deletePending === true;
  const mine = deleted ? null : shownFields(row.data as Record<string, unknown>);
  // A scan's result travels with its own acknowledgement: say so when the two copies' results differ.
  const resultDiffers = entity === 'scan' && mine !== null && fields !== undefined && mine.likelyCompounds !== fields.likelyCompounds;
  const choice = deleted ? 'conflict.deleted' : 'conflict';
  return (
    <article className="sb-conflict" data-testid={`conflict-${row.id}`} data-op={deleted ? 'delete' : 'upsert'}>
      <h3>{t(`capture.entity.${entity}`)}</h3>
      {deleted && (
        <p className="sb-notice" data-testid="conflict-deleted-here">
          {server ? t('capture.conflict.deleted.explain', { version: server.version }) : t('capture.conflict.deleted.here')}
        </p>
      )}
      {resultDiffers && (
        <p className="sb-notice" data-testid="conflict-result-differs">
          {t('capture.conflict.scan.resultChanged')}
        </p>
      )}
      {fields ? (
        <ConflictTable mine={mine} server={fields} serverVersion={server!.version} />
      ) : (
        <p className="sb-muted">{t('capture.conflict.serverMissing')}</p>
      )}
      <div className="sb-button-row">
        <IonButton className="sb-primary" disabled={!server} onClick={() => void resolveConflict(captureDb(), entity, row.id, 'mine')}>
          {t(`capture.${choice}.keepMine`)}
        </IonButton>
        <IonButton fill="outline" disabled={!server} onClick={() => void resolveConflict(captureDb(), entity, row.id, 'server')}>
          {t(`capture.${choice}.takeServer`)}
        </IonButton>
      </div>
    </article>
  );
}

/** Each conflict of the case with both versions and a choice. */
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
      {conflicts.map((conflict) => (
        <ConflictItemView key={conflict.row.id} {...conflict} />
      ))}
    </section>
  );
}
