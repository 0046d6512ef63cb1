/**
 * Types of the linear secular theory (Laplace–Lagrange) and the proper elements it gives.
 * Frequencies in arcsec/yr; angles in radians; distances in au. Reference plane: the J2000
 * ecliptic throughout (planets from VSOP87B, bodies as the Catalogue stores them); the
 * invariable plane enters as the zero-frequency inclination mode (s_5 = 0), so the forced
 * inclination of a body includes the tilt of the invariable plane to the ecliptic.
 * Vectors: h = e sin ϖ, k = e cos ϖ, p = sin i sin Ω, q = sin i cos Ω (ϖ = Ω + ω); the
 * theory is linear in these, so sin i and i (rad) are the same to its order; sin i is kept
 * because proper inclinations are published as sin i (common practice).
 */
import type { SecularModes } from './secularModes.js';

/** One planet as the secular theory takes it. */
export interface SecularPlanet {
  name: string;
  massRatio: number; // m / M_sun (planet system)
  aAu: number; // semimajor axis the matrices are built with
  h: number; k: number; p: number; q: number; // at the model epoch
}

/** A secular model: planets, matrices, modes; built once per epoch, then read by many bodies. */
export interface SecularModel {
  epochJdTDB: number; // NaN when built from given elements without an epoch
  planets: readonly SecularPlanet[];
  A: Float64Array; // row-major N×N, arcsec/yr
  B: Float64Array;
  eModes: SecularModes; // g_i
  iModes: SecularModes; // s_i
}
