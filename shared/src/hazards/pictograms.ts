import type { PictogramCode } from './types.js';

/**
 * Our short descriptions of the nine GHS pictograms (the codes and symbols are the standard's,
 * GHS Rev. 9 Annex 1, from memory; the wording is ours).
 */
export const PICTOGRAMS: Readonly<Record<PictogramCode, string>> = {
  GHS01: 'Exploding bomb: may explode from shock, friction, heat or fire',
  GHS02: 'Flame: catches fire easily',
  GHS03: 'Flame over circle: oxidiser, feeds a fire',
  GHS04: 'Gas cylinder: gas under pressure',
  GHS05: 'Corrosion: destroys skin, eyes or metal',
  GHS06: 'Skull and crossbones: small amounts can kill',
  GHS07: 'Exclamation mark: harmful or irritant',
  GHS08: 'Health hazard: long-term or organ damage, cancer, airways',
  GHS09: 'Environment: toxic to aquatic life',
};

/** Whether a string is one of the nine GHS pictogram codes. */
export function isPictogramCode(code: string): code is PictogramCode {
  return Object.prototype.hasOwnProperty.call(PICTOGRAMS, code);
}
