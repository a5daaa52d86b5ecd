import { useTranslation } from 'react-i18next';
import type { CaseOutcome } from '../../features/cases/useCaseOutcome';
import { formatDateTime } from '../../i18n/format';
import './outcome.css';
import { AcknowledgementLine } from '../escalations/AcknowledgementLine';
import { EscalationStatusPill } from '../escalations/EscalationStatusPill';

/** The case's escalations on the tablet: state, who acknowledged with which action, notes, closing. Works offline. */
export function CaseEscalationsPanel({ outcome }: { outcome: CaseOutcome }) {
  const { t, i18n } = useTranslation();
  const when = (iso: string) => formatDateTime(Date.parse(iso), i18n.language);
  if (outcome.escalations.length === 0) return null;
  return (
    <section className="sb-panel" aria-labelledby="case-escalations-heading" data-testid="case-escalations">
      <h2 id="case-escalations-heading" className="sb-panel__heading">
        {t('caseOutcome.escalationsHeading')}
      </h2>
      <ul className="sb-decisions">
        {outcome.escalations.map(({ row, notes }) => {
          const server = row.serverState;
          return (
            <li key={row.id} data-testid={`case-escalation-${row.id}`}>
              <p>
                <EscalationStatusPill status={server?.status ?? 'raised'} /> {row.data.reason}
              </p>
              <p className="sb-muted">{t('caseOutcome.raisedAt', { when: when(row.data.raisedAt) })}</p>
              {!server && <p className="sb-muted">{t('caseOutcome.notYetOnServer')}</p>}
              {server?.status === 'raised' && <p>{t('caseOutcome.waiting')}</p>}
              {server?.acknowledgedByName && server.acknowledgedAt && (
                <AcknowledgementLine
                  ack={{ byName: server.acknowledgedByName, at: server.acknowledgedAt, action: server.actionTaken, ppeLevel: server.ppeLevel, comment: server.ackComment }}
                />
              )}
              {server?.status === 'closed' && server.closedAt && <p>{t('escalations.closedLine', { when: when(server.closedAt), comment: server.closeComment ?? '' })}</p>}
              {notes.length > 0 && (
                <ul className="sb-escalation-notes">
                  {notes.map((note) => (
                    <li key={note.id}>
                      <p>{note.text}</p>
                      <p className="sb-muted">{t('escalations.notes.by', { who: note.authorName, when: when(note.at) })}</p>
                    </li>
                  ))}
                </ul>
              )}
            </li>
          );
        })}
      </ul>
    </section>
  );
}
