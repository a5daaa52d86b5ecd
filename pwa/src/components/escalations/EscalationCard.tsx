import { IonItem, IonLabel } from '@ionic/react';
import { useTranslation } from 'react-i18next';
import { escalationPaths } from '../../features/escalations/escalationPaths';
import { hazardClassView } from '../../features/escalations/hazardClassView';
import type { Escalation } from '../../features/escalations/types';
import { formatDateTime } from '../../i18n/format';
import { EscalationStatusPill } from './EscalationStatusPill';

/** One escalation in the inbox as one large target: state, site, compounds, hazard classes, when and by whom. */
export function EscalationCard({ item }: { item: Escalation }) {
  const { t, i18n } = useTranslation();
  return (
    <IonItem
      routerLink={escalationPaths.escalation(item.id)}
      detail
      button
      className={`sb-link-item sb-escalation-card sb-escalation-card--${item.status}`}
      data-testid={`escalation-${item.id}`}
    >
      <IonLabel>
        <h2>
          <EscalationStatusPill status={item.status} /> {item.siteName}
        </h2>
        <p className="sb-escalation-card__compounds">
          {item.compounds.length > 0 ? item.compounds.join(', ') : t('escalations.noCompounds')}
        </p>
        <p>{item.hazardClasses.map((id) => hazardClassView(id).name).join(' · ')}</p>
        <p className="sb-muted">
          {t('escalations.raisedLine', { when: formatDateTime(Date.parse(item.raisedAt), i18n.language), who: item.inspector.displayName })}
        </p>
        {item.status !== 'raised' && item.acknowledgedByName && item.acknowledgedAt && (
          <p className="sb-muted">
            {t('escalations.acknowledgedLine', { who: item.acknowledgedByName, when: formatDateTime(Date.parse(item.acknowledgedAt), i18n.language) })}
          </p>
        )}
      </IonLabel>
    </IonItem>
  );
}
