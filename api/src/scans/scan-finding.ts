import { hazardRank, type HazardRank } from '@siteband/shared';
import { asArray, asObject } from './json-reading';

/** What the review queue needs of a scan's result: its first likely compound and the hazard rank. */
export interface ScanFinding {
  likelyCompoundId: string | null;
  likelyCompoundName: string | null;
  hazardRank: HazardRank;
}

/**
 * Reads a stored identification result (the shared `IdentifyResult` shape, as sent by the tablet) for its
 * first likely compound, that compound's signal word and whether the scan escalates; the rank itself is
 * the shared rule. A result without a ranking (not reliable, or none) gives no compound.
 */
export function scanFinding(result: Record<string, unknown> | null): ScanFinding {
  const first = asObject(asArray(result?.candidates)[0]);
  const id = typeof first?.id === 'string' && first.id.length > 0 && first.id.length <= 64 ? first.id : null;
  const name = id && typeof first?.name === 'string' ? first.name.slice(0, 200) : id;
  const card = asObject(asArray(first?.hazards)[0]);
  const signalWord = card?.signalWord === 'Danger' || card?.signalWord === 'Warning' ? card.signalWord : null;
  const escalates = asObject(result?.escalation)?.required === true;
  return { likelyCompoundId: id, likelyCompoundName: name, hazardRank: hazardRank({ signalWord: id ? signalWord : null, escalates }) };
}
