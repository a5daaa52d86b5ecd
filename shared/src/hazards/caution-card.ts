import { FLAG_CAUTIONS, HAZARD_CLASSES } from './hazard-classes.js';
import { hStatementText } from './h-statements.js';
import { PICTOGRAMS } from './pictograms.js';
import type { CautionCard, CompoundHazards } from './types.js';

/** Said on the card of a compound with no GHS classification, so the card never reads as "safe". */
export const UNCLASSIFIED_CAUTION =
  'Not classified as hazardous in the compound library — this does not make the sample harmless; handle it as an unknown (common practice).';

/** Build the caution card of one compound from its hazard data. */
export function cautionCard(compound: { id: string; name: string; hazards: CompoundHazards }): CautionCard {
  const { hazards } = compound;
  const cautions: string[] = [];
  const add = (text: string): void => {
    if (!cautions.includes(text)) cautions.push(text);
  };
  for (const c of hazards.classifications) HAZARD_CLASSES[c.hazardClass].cautions.forEach(add);
  for (const flag of hazards.flags) {
    const text = FLAG_CAUTIONS[flag];
    if (text !== undefined) add(text);
  }
  const hazardous = hazards.classifications.length > 0 || hazards.flags.some((f) => f in FLAG_CAUTIONS);
  if (!hazardous) add(UNCLASSIFIED_CAUTION);
  return {
    compoundId: compound.id,
    name: compound.name,
    signalWord: hazards.signalWord,
    pictograms: hazards.pictograms.map((code) => ({ code, description: PICTOGRAMS[code] })),
    hStatements: hazards.hStatements.map((code) => ({ code, text: hStatementText(code) })),
    classifications: hazards.classifications.map((c) => ({ ...c, name: HAZARD_CLASSES[c.hazardClass].name })),
    unNumber: hazards.unNumber,
    cautions,
    hazardous,
  };
}
