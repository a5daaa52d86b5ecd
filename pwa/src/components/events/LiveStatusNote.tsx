import { useTranslation } from 'react-i18next';
import { useLiveEvents } from '../../features/events/EventsProvider';
import './events.css';

/** One line saying whether this screen updates by itself right now. */
export function LiveStatusNote() {
  const { t } = useTranslation();
  const status = useLiveEvents();
  return (
    <p className={`sb-live sb-live--${status}`} role="status" data-testid="live-status" data-live={status}>
      <span className="sb-live__dot" aria-hidden="true" />
      {t(`events.status.${status}`)}
    </p>
  );
}
