/**
 * Every tuning constant of the ranking, in one place. Values are engineering choices tuned on
 * synthetic scans (common practice where noted), not published rules: the published identity
 * tests give no numeric band tolerance (Ph. Eur. 2.2.24, ASTM E1252 — see the project check values §5).
 */
import type { BandIntensity } from '../library/types.js';

/** Default match window for condensed-phase scans, ±cm⁻¹ (common practice for handheld instruments: ±5–10). */
export const DEFAULT_TOLERANCE_CONDENSED_CM1 = 10;
/** Default match window for gas-cell scans, ±cm⁻¹: band centres of gases are sharper and tabulated. */
export const DEFAULT_TOLERANCE_GAS_CM1 = 6;
/** A broad band (given FWHM) is matched within a quarter of its width when that exceeds the tolerance. */
export const BROAD_BAND_WINDOW_FRACTION = 0.25;

/** Weight of an expected band by its tabulated relative intensity. */
export const INTENSITY_WEIGHT: Readonly<Record<BandIntensity, number>> = { vs: 1, s: 0.7, m: 0.4, w: 0.15, vw: 0.05 };
/** Intensity assumed for an active fundamental whose intensity the library does not give. */
export const DEFAULT_INTENSITY: BandIntensity = 'w';
/** Expected bands at or above this weight are reported as missing bands when not seen. */
export const MISSING_REPORT_WEIGHT = INTENSITY_WEIGHT.m;
/** A match at the edge of its window counts this fraction of a centred one (quadratic fall-off between). */
export const EDGE_MATCH_CREDIT = 0.5;

/** Observed peaks at least this tall (relative to the tallest) can be evidence against. */
export const AGAINST_MIN_RELATIVE_HEIGHT = 0.1;
/** The score is multiplied by (1 − AGAINST_PENALTY × share of observed intensity that argues against). */
export const AGAINST_PENALTY = 2;

/** Candidates scored in detail after the fast pass over the whole library. */
export const DETAIL_POOL_SIZE = 40;
/** Candidates listed in a result (best first). */
export const MAX_CANDIDATES = 10;
/** Candidates below this band agreement are not listed. */
export const MIN_CANDIDATE_SCORE = 0.1;
/**
 * A hazardous candidate at or above this band agreement is plausible: listed even beyond
 * MAX_CANDIDATES and named in the result's cautions when it is not first. It sits below the
 * escalation threshold (minScore 0.5 in escalation-rules.json) on purpose: a caution card costs
 * a glance, an escalation calls a safety officer. Checked on the synthetic ranking scans: no
 * hazardous compound that ranks first goes unescalated, and 3.8 % (IR) / 6.0 % (Raman) of
 * harmless scans escalate (5.3 % / 7.5 % before the one-minor-peak rule below).
 */
export const PLAUSIBLE_HAZARD_SCORE = 0.4;
/** At most this many hazardous candidates are added beyond MAX_CANDIDATES. */
export const MAX_EXTRA_HAZARDOUS = 5;

/** Candidates tried as mixture components. */
export const MIXTURE_POOL_SIZE = 6;
/** Only candidates at or above this band agreement enter the mixture search. */
export const MIXTURE_MIN_CANDIDATE_SCORE = 0.15;
/** A mixture is reported only when it explains at least this much more observed intensity than the best single compound. */
export const MIXTURE_MIN_GAIN = 0.15;
/** A third component is kept only when it adds at least this much explained intensity to the best pair. */
export const MIXTURE_THIRD_COMPONENT_GAIN = 0.08;
/** Every reported component must explain at least this share of the observed intensity. */
export const MIXTURE_MIN_SHARE = 0.08;
/** Grid step of the mixture band models, cm⁻¹. */
export const MIXTURE_GRID_STEP_CM1 = 2;
/** Gaussian σ of each band in the mixture models, as a fraction of the match tolerance. */
export const MIXTURE_SIGMA_FRACTION = 0.6;

/** Version of the ranking method, recorded with every result. */
export const IDENTIFY_METHOD_VERSION = '1.1.0';

/**
 * Gas cells: an unresolved parallel band shows its P and R maxima, not its centre. Two peaks of
 * similar height (ratio ≤ PR_PAIR_MAX_HEIGHT_RATIO) this far apart count as a band at their
 * midpoint. The span covers Δν(P–R) = 2.358·√(B·T) at 296 K from OCS (18 cm⁻¹) to HCl (131 cm⁻¹)
 * (Herzberg 1945, computed in the project check values §4.2).
 */
export const PR_PAIR_MIN_SEPARATION_CM1 = 12;
export const PR_PAIR_MAX_SEPARATION_CM1 = 140;
export const PR_PAIR_MAX_HEIGHT_RATIO = 3;

/** Where the library holds a reference spectrum, band agreement becomes (1 − w)·bands + w·max(0, r). */
export const CORRELATION_WEIGHT = 0.5;

/**
 * A candidate whose library phases do not include the scan's (a gas in a condensed scan, a solid
 * in a gas cell) keeps this fraction of its band agreement: it is shown, last among equals, with
 * the reason. The library's `phases` say where a compound is met, liquefied or dissolved included.
 */
export const PHASE_MISMATCH_FACTOR = 0.5;

/**
 * Escalation needs evidence beyond one coincidence: a candidate whose explained peaks are a single
 * observed peak escalates only when that peak carries at least this share of the observed
 * intensity (a one-band salt such as ammonium nitrate in Raman does; ozone matching one ethanol
 * band in a five-band scan does not). Its caution card is shown either way.
 */
export const ESCALATION_SINGLE_PEAK_MIN_SHARE = 0.5;
