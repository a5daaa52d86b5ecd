import {
  personCircleOutline,
  alertCircleOutline,
  checkmarkDoneOutline,
  flaskOutline,
  folderOpenOutline,
  peopleOutline,
  shieldCheckmarkOutline,
  pulseOutline,
} from 'ionicons/icons';
import type { TabId } from '../features/navigation/roleTabs';

/** The icon drawn above each tab's label. */
export const TAB_ICONS: Readonly<Record<TabId, string>> = {
  cases: folderOpenOutline,
  capture: pulseOutline,
  review: checkmarkDoneOutline,
  library: flaskOutline,
  escalations: alertCircleOutline,
  users: peopleOutline,
  audit: shieldCheckmarkOutline,
  account: personCircleOutline,
};
