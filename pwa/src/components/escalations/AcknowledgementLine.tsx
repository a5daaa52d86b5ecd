import { useTranslation } from 'react-i18next';
import type { EscalationAction, PpeLevel } from '../../features/escalations/types';
import { formatDateTime } from '../../i18n/format';

export interface Acknowledgement {
  byName: string;
  at: string;
  action: EscalationAction | null;
  ppeLevel: PpeLevel | null;
  comment: string | null;
}

/** "Acknowledged by <name> at <time>: <action>", with the PPE level and the comment: the same words on every screen. */
export function AcknowledgementLine({ ack }: { ack: Acknowledgement }) {
  const { t, i18n } = useTranslation();
  const action = ack.action ? (ack.action === 'ppe_required' && ack.ppeLevel ? t('escalations.actionWithPpe', { level: ack.ppeLevel }) : t(`escalations.action.${ack.action}`)) : '';
  return (
    <div data-testid="acknowledgement">
      <p className="sb-ack-outcome">
        {t('escalations.acknowledgedBy', { who: ack.byName, when: formatDateTime(Date.parse(ack.at), i18n.language), action })}
      </p>
      {ack.comment && <p>{t('escalations.ackComment', { comment: ack.comment })}</p>}
    </div>
  );
}
