import { HAZARD_CLASSES, isHazardClassId } from '@siteband/shared';

/** A hazard class named on an escalation, with its protective cautions; a rule id outside GHS is shown as it is. */
export interface HazardClassView {
  id: string;
  name: string;
  cautions: readonly string[];
}

export function hazardClassView(id: string): HazardClassView {
  if (isHazardClassId(id)) return { id, name: HAZARD_CLASSES[id].name, cautions: HAZARD_CLASSES[id].cautions };
  return { id, name: id, cautions: [] };
}
