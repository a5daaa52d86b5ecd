import { useTranslation } from 'react-i18next';
import type { EscalationStatus } from '../../features/escalations/types';
import './escalations.css';

/** The escalation's state in words, never by colour alone. */
export function EscalationStatusPill({ status }: { status: EscalationStatus }) {
  const { t } = useTranslation();
  return <span className={`sb-pill sb-escalation--${status}`} data-testid="escalation-status">{t(`escalations.status.${status}`)}</span>;
}
