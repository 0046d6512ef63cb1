/**
 * VSOP87 "B" series repacked into flat typed arrays, once per planet, at first use.
 *
 * Theory: Bretagnon & Francou 1988, "Planetary theories in rectangular and spherical
 * variables: VSOP87 solutions", A&A 202, 309. Version B: heliocentric spherical variables
 * L (rad), B (rad), R (au) on the dynamical ecliptic and equinox J2000; each variable is
 *   V(τ) = Σ_α τ^α Σ_k A_k cos(B_k + C_k τ),  τ in Julian millennia (TDB) from J2000.
 * The coefficients are the complete series shipped by the astronomia package (4.2.0).
 */
import mercury from 'astronomia/data/vsop87Bmercury';
import venus from 'astronomia/data/vsop87Bvenus';
import earth from 'astronomia/data/vsop87Bearth';
import mars from 'astronomia/data/vsop87Bmars';
import jupiter from 'astronomia/data/vsop87Bjupiter';
import saturn from 'astronomia/data/vsop87Bsaturn';
import uranus from 'astronomia/data/vsop87Buranus';
import neptune from 'astronomia/data/vsop87Bneptune';
import type { PlanetName } from '../constants.js';

/** Highest power of τ in any VSOP87 series (Bretagnon & Francou 1988: α = 0..5). */
export const VSOP87_MAX_POWER = 5;
/** Blocks per variable: one per power α = 0..VSOP87_MAX_POWER. */
const BLOCKS_PER_VARIABLE = VSOP87_MAX_POWER + 1;

/**
 * One planet's series. Terms are A, B, C triplets in `abc`; the terms of variable v
 * (0 = L, 1 = B, 2 = R) and power α occupy term indices
 * [blockStart[v*6 + α], blockStart[v*6 + α + 1]) (half-open).
 */
export interface Vsop87Series {
  readonly planet: PlanetName;
  readonly abc: Float64Array;
  readonly blockStart: Int32Array; // length 3*6 + 1
  readonly termCount: number;
}

const RAW: Readonly<Record<PlanetName, AstronomiaVsop87Data>> = {
  mercury, venus, earth, mars, jupiter, saturn, uranus, neptune,
};

const packed = new Map<PlanetName, Vsop87Series>();

/** Repack one planet's nested arrays into a flat Float64Array. */
function pack(planet: PlanetName, raw: AstronomiaVsop87Data): Vsop87Series {
  const variables = [raw.L, raw.B, raw.R];
  const blockStart = new Int32Array(3 * BLOCKS_PER_VARIABLE + 1);
  let count = 0;
  for (let v = 0; v < 3; v++) {
    for (let alpha = 0; alpha < BLOCKS_PER_VARIABLE; alpha++) {
      blockStart[v * BLOCKS_PER_VARIABLE + alpha] = count;
      count += variables[v][String(alpha)]?.length ?? 0;
    }
  }
  blockStart[3 * BLOCKS_PER_VARIABLE] = count;
  const abc = new Float64Array(3 * count);
  let k = 0;
  for (let v = 0; v < 3; v++) {
    for (let alpha = 0; alpha < BLOCKS_PER_VARIABLE; alpha++) {
      for (const term of variables[v][String(alpha)] ?? []) {
        abc[k++] = term[0];
        abc[k++] = term[1];
        abc[k++] = term[2];
      }
    }
  }
  return { planet, abc, blockStart, termCount: count };
}

/** The packed series of `planet`, built on first request and kept. */
export function vsop87Series(planet: PlanetName): Vsop87Series {
  let s = packed.get(planet);
  if (s === undefined) {
    const raw = RAW[planet];
    if (raw === undefined) throw new TypeError(`vsop87Series: unknown planet '${String(planet)}'`);
    s = pack(planet, raw);
    packed.set(planet, s);
  }
  return s;
}
