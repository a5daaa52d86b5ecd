import { useLiveEvents } from '../events/EventsProvider';
import { useSync } from './SyncProvider';

/**
 * On the inspector's tablet, an event about one of their cases (an acknowledged escalation, a review
 * decision) starts a sync at once, so the outcome is on the tablet before the next scheduled cycle.
 */
export function SyncOnLiveEvents({ enabled }: { enabled: boolean }) {
  const { syncNow } = useSync();
  useLiveEvents(enabled ? () => void syncNow() : undefined);
  return null;
}
