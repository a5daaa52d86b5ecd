/**
 * Cautions shown with every result, whatever the ranking says. Wording is ours; the practice is
 * the trade's (common practice): field IR/Raman identification is presumptive.
 */
export const GENERAL_CAUTIONS: readonly string[] = [
  'Identification is presumptive: these are likely compounds, not a confirmed identity.',
  'Confirm by laboratory analysis before any decision that depends on the identity.',
  "Follow the SDS, your agency's procedures and local codes; this result does not replace them.",
  'Nothing in this result shows that the sample is safe: a compound missing from the compound library, a mixture or a poor scan can hide a hazard.',
];

/** Shown on every Raman scan: the laser is an ignition source. */
export const RAMAN_LASER_CAUTION =
  'Raman lasers can ignite dark or energetic samples: use the lowest power and shortest exposure, scan through the container where possible, and never scan a suspected explosive at full power (common practice).';

/** Shown when the scan cannot be ranked. */
export const NO_RELIABLE_RESULT_CAUTION =
  'No reliable result: treat the sample as unknown and hazardous until identified by other means (common practice).';
