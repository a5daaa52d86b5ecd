/**
 * Types of the hazard data a compound carries (GHS classes, H-statements, pictograms) and of
 * the caution card and escalation built from them.
 */

/** GHS pictogram codes as the standard numbers them. */
export type PictogramCode =
  | 'GHS01'
  | 'GHS02'
  | 'GHS03'
  | 'GHS04'
  | 'GHS05'
  | 'GHS06'
  | 'GHS07'
  | 'GHS08'
  | 'GHS09';

/** GHS hazard classes, one id per class (routes of acute toxicity kept apart, as GHS does). */
export type HazardClassId =
  | 'explosive'
  | 'flammable-gas'
  | 'chemically-unstable-gas'
  | 'oxidising-gas'
  | 'gas-under-pressure'
  | 'flammable-liquid'
  | 'flammable-solid'
  | 'self-reactive'
  | 'pyrophoric'
  | 'water-reactive'
  | 'oxidising-liquid'
  | 'oxidising-solid'
  | 'organic-peroxide'
  | 'corrosive-to-metals'
  | 'acute-toxicity-oral'
  | 'acute-toxicity-dermal'
  | 'acute-toxicity-inhalation'
  | 'skin-corrosion-irritation'
  | 'serious-eye-damage-irritation'
  | 'respiratory-sensitisation'
  | 'skin-sensitisation'
  | 'germ-cell-mutagenicity'
  | 'carcinogenicity'
  | 'reproductive-toxicity'
  | 'stot-single-exposure'
  | 'stot-repeated-exposure'
  | 'aspiration-hazard'
  | 'aquatic-acute'
  | 'aquatic-chronic'
  | 'ozone-layer';

/** One classification: a class and its category as written in GHS/CLP ("1", "1B", "1.1", "liquefied"). */
export interface GhsClassification {
  readonly hazardClass: HazardClassId;
  readonly category: string;
}

/** Where a value came from: a key of the library's source list and how we know it. */
export interface SourceRef {
  readonly ref: string;
  readonly basis: SourceBasis;
  readonly note?: string;
}

/** `read` only where the value was read on the named document; everything recalled is `from memory`. */
export type SourceBasis = 'read' | 'from memory' | 'common practice' | 'computed' | 'invented';

/** The hazard data of one compound. */
export interface CompoundHazards {
  readonly signalWord: 'Danger' | 'Warning' | null;
  readonly classifications: readonly GhsClassification[];
  /** H-statement codes (H200–H420, EUH…). */
  readonly hStatements: readonly string[];
  readonly pictograms: readonly PictogramCode[];
  /** Markers outside GHS that still matter in the field, e.g. `explosive-precursor`, `energetic`. */
  readonly flags: readonly string[];
  readonly unNumber: string | null;
  readonly source: SourceRef;
}

/** A caution card: what a technician must see beside a candidate. */
export interface CautionCard {
  readonly compoundId: string;
  readonly name: string;
  readonly signalWord: 'Danger' | 'Warning' | null;
  readonly pictograms: readonly { readonly code: PictogramCode; readonly description: string }[];
  readonly hStatements: readonly { readonly code: string; readonly text: string }[];
  readonly classifications: readonly (GhsClassification & { readonly name: string })[];
  readonly unNumber: string | null;
  /** Protective cautions of the trade for the candidate's hazard classes and flags. */
  readonly cautions: readonly string[];
  readonly hazardous: boolean;
}
