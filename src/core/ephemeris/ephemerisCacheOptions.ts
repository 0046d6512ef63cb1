/**
 * The choices an ephemeris Chebyshev cache (ephemerisCache.ts) is built with: per-body
 * segment layouts, the velocity mode, the fill method and the bulk-fill tolerances, with the
 * measurements that chose the defaults.
 */

/** Segment layout of one body: nominal segment length (days) and coefficients per axis. */
export interface ChebyshevLayout {
  segmentDays: number;
  coefficients: number;
}

/**
 * Default layouts, indexed like EPHEMERIS_BODIES, chosen by measurement against the direct
 * VSOP87 series (1900–2100, 320 random dates per body): worst position difference ≤ 1.3e-11
 * au (≈ 2 m) for every body, worst velocity difference ≤ 1e-10 au/day with 'derivative'.
 * The outer planets cannot use long segments: their heliocentric series carry indirect
 * terms of the Sun's reflex motion with periods of 15–90 days at 3e-8–8e-8 au (e.g. Neptune
 * R, a 14.7-day term of 3e-8 au), so a 128-day segment of degree 11 misses by ~1e-7 au.
 * Earth (the geocentre, not the EMB) carries the monthly lunar wobble (3e-5 au). The EMB
 * is not smooth either: VSOP87's lunar terms in the Earth and the ELP/MPP02 Moon disagree
 * at ~2e-9 au with monthly and shorter periods, so 'emb' keeps 16-day segments.
 * Cost of fitting by node sampling (nodes per day of span, summed over the nine bodies):
 * ≈ 4.3 evaluations of the direct series, dominated by 'emb' (ELP Moon) and Mercury
 * (7 000 terms); the bulk fill is dominated by the same two.
 */
export const DEFAULT_CHEBYSHEV_LAYOUTS: readonly ChebyshevLayout[] = [
  { segmentDays: 32, coefficients: 24 }, // mercury
  { segmentDays: 64, coefficients: 18 }, // venus
  { segmentDays: 24, coefficients: 18 }, // earth
  { segmentDays: 64, coefficients: 16 }, // mars
  { segmentDays: 48, coefficients: 14 }, // jupiter
  { segmentDays: 48, coefficients: 14 }, // saturn
  { segmentDays: 48, coefficients: 14 }, // uranus
  { segmentDays: 32, coefficients: 14 }, // neptune
  { segmentDays: 16, coefficients: 16 }, // emb
];

export type CacheVelocityMode = 'derivative' | 'fitted';

/**
 * How segments are fitted. 'bulk': the source fits runs of segments from its own series
 * (segmentFitter.ts; only sources that offer it, e.g. the direct VSOP87/ELP series);
 * 'nodes': the source is sampled at each segment's Chebyshev nodes (any source; the
 * reference path).
 */
export type CacheFillMethod = 'bulk' | 'nodes';

/**
 * 'auto' (the default): per body, 'bulk' when the source offers it and the body has more
 * than one run of CACHE_FILL_CHUNK segments in the span, else 'nodes'. The bulk fill has a
 * set-up cost per body (planning which series terms and coefficients to keep: 5–80 ms,
 * measured) that only pays when more than one run is used; the choice depends on the span
 * and layouts alone, never on the order of queries.
 */
export type CacheFillChoice = CacheFillMethod | 'auto';

/**
 * Default bound (au) on what the bulk fill may leave out of the series, summed worst-case
 * over every dropped coefficient: with the layouts' own fit error (≤ 1.3e-11 au) the cache
 * stays within 1e-9 au of the direct series (measured per body in ephemerisCacheFill.test.ts).
 */
export const DEFAULT_FIT_TOLERANCE_AU = 1e-10;

/**
 * A looser bound for dynamics over long spans. 1e-8 au is 1.5 km, i.e. 0.002″ at 1 au and
 * 0.0001″ at Neptune, while VSOP87 itself departs from modern numerical ephemerides by
 * ~0.01–0.1″ near J2000 and up to 1″ at ±2 000–4 000 years (Bretagnon & Francou 1988 give
 * 1″ over 4 000 years for Mercury–Mars and 2 000 years for Jupiter–Saturn; the near-J2000
 * figures from memory). Measured over J2000 ± 1 000 years: worst 5e-10 au (Neptune, 74 m),
 * for about 30% less fill time than the default.
 */
export const DYNAMICS_FIT_TOLERANCE_AU = 1e-8;

/** Segments per bulk-fill run: also the unit of lazy filling with 'bulk'. */
export const CACHE_FILL_CHUNK = 64;

export interface EphemerisCacheOptions {
  startJdTDB: number;
  endJdTDB: number;
  velocity?: CacheVelocityMode;
  /** Per-body layouts indexed like EPHEMERIS_BODIES; defaults to DEFAULT_CHEBYSHEV_LAYOUTS. */
  layouts?: readonly ChebyshevLayout[];
  /** Default 'auto' (see CacheFillChoice). */
  fill?: CacheFillChoice;
  /** Bulk fill only: worst-case bound (au) of left-out series terms; default DEFAULT_FIT_TOLERANCE_AU. */
  fitToleranceAu?: number;
}
