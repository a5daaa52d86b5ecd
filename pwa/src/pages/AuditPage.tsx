import { useState } from 'react';
import { IonButton } from '@ionic/react';
import { useMutation, useQuery } from '@tanstack/react-query';
import { useTranslation } from 'react-i18next';
import { PageShell } from '../components/PageShell';
import { useApiClient } from '../features/api/ApiClientContext';
import { AUDIT_PAGE_SIZE, auditEntriesQuery, verifyAuditChain } from '../features/audit/auditApi';
import { useOnlineStatus } from '../features/network/onlineStatus';
import { formatDateTime } from '../i18n/format';

/** The admin's view of the audit trail: verify the hash chain, and the recent entries. */
export default function AuditPage() {
  const { t, i18n } = useTranslation();
  const client = useApiClient();
  const online = useOnlineStatus();
  const [page, setPage] = useState(1);
  const entries = useQuery({ ...auditEntriesQuery(client, page), enabled: online });
  const verify = useMutation({ mutationFn: () => verifyAuditChain(client) });
  const pages = entries.data ? Math.max(1, Math.ceil(entries.data.total / AUDIT_PAGE_SIZE)) : 1;
  const result = verify.data;

  return (
    <PageShell title={t('audit.title')}>
      {!online && <p className="sb-notice">{t('audit.offline')}</p>}
      <section className="sb-panel" aria-labelledby="audit-verify-heading">
        <h2 id="audit-verify-heading" className="sb-panel__heading">
          {t('audit.verifyHeading')}
        </h2>
        <p>{t('audit.verifyIntro')}</p>
        <IonButton className="sb-primary" disabled={!online || verify.isPending} onClick={() => verify.mutate()} data-testid="audit-verify">
          {verify.isPending ? t('audit.verifying') : t('audit.verify')}
        </IonButton>
        {verify.isError && (
          <p className="sb-error" role="alert">
            {t('audit.verifyError', { message: verify.error.message })}
          </p>
        )}
        {result?.ok && (
          <p className="sb-success" role="status" data-testid="audit-result">
            {t('audit.intact', { count: result.checked })}
          </p>
        )}
        {result && !result.ok && (
          <div className="sb-error" role="alert" data-testid="audit-result">
            <p>{t('audit.broken', { seq: result.firstBroken?.seq ?? '?', reason: result.firstBroken?.reason ?? '' })}</p>
            <p>{t('audit.brokenChecked', { count: result.checked })}</p>
          </div>
        )}
      </section>
      <section className="sb-panel" aria-labelledby="audit-entries-heading">
        <h2 id="audit-entries-heading" className="sb-panel__heading">
          {t('audit.entriesHeading')}
        </h2>
        {entries.isError && (
          <p className="sb-error" role="alert">
            {t('audit.loadError', { message: entries.error.message })}
          </p>
        )}
        {entries.data && entries.data.items.length === 0 && <p>{t('audit.empty')}</p>}
        {entries.data && entries.data.items.length > 0 && (
          <div className="sb-table-wrap">
            <table className="sb-table" data-testid="audit-entries">
              <thead>
                <tr>
                  <th scope="col">{t('audit.colSeq')}</th>
                  <th scope="col">{t('audit.colAt')}</th>
                  <th scope="col">{t('audit.colActor')}</th>
                  <th scope="col">{t('audit.colRecord')}</th>
                  <th scope="col">{t('audit.colAction')}</th>
                  <th scope="col">{t('audit.colHash')}</th>
                </tr>
              </thead>
              <tbody>
                {entries.data.items.map((entry) => (
                  <tr key={entry.seq}>
                    <td>{entry.seq}</td>
                    <td>{formatDateTime(Date.parse(entry.at), i18n.language)}</td>
                    <td>{entry.actorRole ? t(`roles.${entry.actorRole}`, { defaultValue: entry.actorRole }) : t('audit.server')}</td>
                    <td>
                      {entry.entity} <code>{entry.entityId.slice(0, 8)}</code>
                    </td>
                    <td>{entry.action}</td>
                    <td>
                      <code title={entry.hash}>{entry.hash.slice(0, 12)}</code>
                    </td>
                  </tr>
                ))}
              </tbody>
            </table>
          </div>
        )}
        {entries.data && pages > 1 && (
          <nav className="sb-button-row" aria-label={t('audit.pager')}>
            <IonButton fill="outline" disabled={page <= 1} onClick={() => setPage(page - 1)}>
              {t('audit.newer')}
            </IonButton>
            <span>{t('audit.pageOf', { page, pages })}</span>
            <IonButton fill="outline" disabled={page >= pages} onClick={() => setPage(page + 1)}>
              {t('audit.older')}
            </IonButton>
          </nav>
        )}
      </section>
    </PageShell>
  );
}
