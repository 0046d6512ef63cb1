/**
 * Types of the cleaning layer: the columnar Catalogue every detector reads, quality flags,
 * and reject accounting. Columns, not objects, so millions of rows stay small and fast.
 * Missing-value policy: NaN in a Float64Array, never undefined.
 */

/** Body kind codes stored in Catalogue.kind. */
export const KIND_ASTEROID = 0;
export const KIND_COMET = 1;

/**
 * Quality flags (bit positions in Catalogue.quality). Not rejections: they travel with
 * every candidate so that a poor orbit never passes as a discovery.
 */
export const QUALITY_FLAGS = [
  'single-opposition', // observed at one opposition only
  'short-arc', // observed arc shorter than the short-arc threshold
  'few-observations', // fewer observations than the threshold
  'poor-uncertainty', // uncertainty parameter U at or above the threshold, or a letter code
  'epoch-far-from-last-obs', // osculation epoch far from the last observation
  'hyperbolic', // e ≥ 1
  'no-quality-info', // the input gives none of U, arc, observation count
  'duplicate-kept', // other rows with this designation were set aside (newest epoch kept)
] as const;
export type QualityFlag = (typeof QUALITY_FLAGS)[number];

/** Bit mask of a named quality flag. */
export function qualityBit(flag: QualityFlag): number {
  return 1 << QUALITY_FLAGS.indexOf(flag);
}

/** Names of the flags set in a quality word, in QUALITY_FLAGS order. */
export function qualityNames(word: number): QualityFlag[] {
  const out: QualityFlag[] = [];
  for (let b = 0; b < QUALITY_FLAGS.length; b++) if (word & (1 << b)) out.push(QUALITY_FLAGS[b]);
  return out;
}

/** A cleaned catalogue. Every column has `size` entries; row k is one accepted body. */
export interface Catalogue {
  size: number;
  designation: string[]; // readable form
  names: ReadonlyMap<number, string>; // row → proper name, only rows whose input gives one (read with bodyName); may repeat in designation
  kind: Uint8Array; // KIND_ASTEROID | KIND_COMET (which catalogue format it came from)
  epochJdTT: Float64Array; // osculation epoch, JD TT
  a: Float64Array; // semimajor axis, au (negative for hyperbolic orbits)
  q: Float64Array; // perihelion distance, au
  e: Float64Array; // eccentricity
  i: Float64Array; // inclination, rad, J2000 ecliptic
  node: Float64Array; // longitude of ascending node, rad
  peri: Float64Array; // argument of perihelion, rad
  meanAnomaly: Float64Array; // rad at epoch; NaN for parabolic orbits
  tpJdTT: Float64Array; // perihelion time, JD TT (derived when not given; NaN if undefined)
  H: Float64Array; // absolute magnitude; NaN where unknown
  uncertainty: Float64Array; // U 0..9; NaN where unknown
  uncertaintyCode: Uint8Array; // char code of a letter written in place of U ('E', 'D', 'F'…); 0 when none
  nObs: Float64Array; // NaN where unknown
  nOpp: Float64Array; // oppositions; NaN where unknown
  arcDays: Float64Array; // NaN where unknown
  quality: Uint32Array; // bit flags, see QUALITY_FLAGS
  fileIndex: Uint16Array; // index into `files`
  source: Uint32Array; // 1-based line number in its input file
  files: string[]; // input file names, one per input in the order given (a name may repeat)
}

/**
 * Proper name of row k, '' when the input gave none. Names are kept sparse (a map over the
 * few rows that have one), not as a column: a column of 1.5 M mostly empty strings cost
 * 15–30 MB of peak memory in the ingestion benchmark.
 */
export function bodyName(cat: Pick<Catalogue, 'names'>, k: number): string {
  return cat.names.get(k) ?? '';
}

/** Why a row was set aside: unreadable, breaking a validity rule, or a superseded duplicate. */
export type RejectKind = 'parse' | 'invalid' | 'duplicate';

/** One input row set aside: why, where, and the raw text. */
export interface Reject {
  kind: RejectKind;
  file: string;
  line: number; // 1-based
  reason: string;
  text: string;
}
