/** Hazards: GHS pictograms and H-statements, protective cautions, caution cards and escalation. */
export * from './types.js';
export { PICTOGRAMS, isPictogramCode } from './pictograms.js';
export { H_STATEMENTS, hStatementText } from './h-statements.js';
export { HAZARD_CLASSES, FLAG_CAUTIONS, isHazardClassId, type HazardClassInfo } from './hazard-classes.js';
export { GENERAL_CAUTIONS, RAMAN_LASER_CAUTION, NO_RELIABLE_RESULT_CAUTION } from './general-cautions.js';
export { cautionCard, UNCLASSIFIED_CAUTION } from './caution-card.js';
export {
  escalationFor,
  parseEscalationRules,
  type Escalation,
  type EscalationCandidate,
  type EscalationCondition,
  type EscalationRule,
  type EscalationRules,
  type EscalationTrigger,
} from './escalation.js';
export { HAZARD_RANK_LABELS, MAX_HAZARD_RANK, hazardRank, hazardRankOf, type HazardRank, type HazardRankLabel } from './hazard-rank.js';
