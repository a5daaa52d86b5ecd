import type { Technique } from './types.js';

/** Safety sentences that travel with every processed scan, so no screen shows a result without them. */
export const SCAN_CAUTIONS = {
  presumptive: 'Identification from a field scan is presumptive: confirm it by laboratory analysis.',
  procedures: "Handle the sample as the SDS, your agency's procedures and local codes require.",
  ramanLaser:
    'The Raman laser can heat, ignite or set off dark or energetic samples: start at low power and short exposure, and keep clear of the sample.',
} as const;

/** The cautions that apply to a scan of the given technique. */
export function scanCautions(technique: Technique): string[] {
  const list: string[] = [SCAN_CAUTIONS.presumptive, SCAN_CAUTIONS.procedures];
  if (technique === 'raman') list.push(SCAN_CAUTIONS.ramanLaser);
  return list;
}
