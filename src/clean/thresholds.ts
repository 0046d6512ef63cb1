/**
 * Validity limits and quality-flag thresholds used by the cleaning layer, with where each
 * default comes from. Validity limits reject a row; quality thresholds only flag it.
 */

export interface ValidityLimits {
  epochMinJdTT: number; // earliest plausible osculation epoch
  epochMaxJdTT: number; // latest plausible osculation epoch
  hMin: number; // brightest plausible absolute magnitude
  hMax: number; // faintest plausible absolute magnitude
  eMax: number; // largest eccentricity accepted (strongly hyperbolic rows are kept up to this)
}

/**
 * Defaults. Epochs 1800-01-01 … 2200-01-01 TT: the span of published osculating-element
 * catalogues and of the planetary theory the core uses (common practice). H from −3
 * (brighter than any known minor body, the brightest being near −1) to 35 (fainter than
 * metre-sized bodies at discovery distances) (common practice, from memory). e up to 100:
 * interstellar visitors reach e of a few; larger values signal a bad row (from memory).
 */
export const DEFAULT_VALIDITY: Readonly<ValidityLimits> = {
  epochMinJdTT: 2_378_496.5, // 1800-01-01.0
  epochMaxJdTT: 2_524_593.5, // 2200-01-01.0
  hMin: -3,
  hMax: 35,
  eMax: 100,
};

export interface QualityThresholds {
  shortArcDays: number; // an observed arc shorter than this is 'short-arc'
  fewObservations: number; // fewer observations than this is 'few-observations'
  poorUncertainty: number; // U at or above this is 'poor-uncertainty'
  epochGapDays: number; // |epoch − last observation| above this is 'epoch-far-from-last-obs'
}

/**
 * Defaults. An arc under 30 days cannot separate a from e reliably for most bodies and
 * orbits from such arcs are routinely called short-arc (common practice). Fewer than 12
 * observations is below the three-nights-of-four that a typical discovery has (common
 * practice). U ≥ 6 means along-track runoff of more than about 2° per decade (see
 * uncertaintyParameter.ts), beyond which orbits are usually described as poorly
 * determined (from memory). An epoch more than 5 years from the last observation means
 * the elements were propagated without new data over many orbits of a main-belt body
 * (common practice).
 */
export const DEFAULT_QUALITY: Readonly<QualityThresholds> = {
  shortArcDays: 30,
  fewObservations: 12,
  poorUncertainty: 6,
  epochGapDays: 5 * 365.25,
};
