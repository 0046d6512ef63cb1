/**
 * The resonant angle of the 1:1 mean-motion resonance, φ = λ − λ_P, from heliocentric states:
 * λ = M + ω + Ω, the osculating mean longitude (Murray & Dermott 1999, §2.9 — section from
 * memory; the definition itself is common practice). Mean rather than true longitudes: in
 * two-body motion λ runs linearly in time, so φ carries no yearly epicycle of amplitude ~2e
 * rad (design note on the co-orbital detector, §6 [design]).
 *
 * Kepler constants [design; common practice for osculating elements]: the massless body moves
 * about the Sun alone, so its elements use GM_sun; the planet's heliocentric two-body problem
 * has the constant GM_sun + GM_planet (Murray & Dermott 1999, §2.2 — from memory), which
 * keeps its elements constant along the unperturbed Sun–planet orbit; with GM_sun alone they
 * would wobble over each orbit (1/a by 2μe/a) [derived from vis-viva].
 * 'earth' is the Earth–Moon barycentre with the Earth + Moon GM (constants.ts, DE430).
 *
 * φ is wrapped to (−π, π]; L4 (leading the planet) is φ = +60°, L5 is −60° (Morais 2001,
 * A&A 369, 677, footnote [seen in the design note]).
 */
import { GM_SUN_AU3_PER_DAY2, planetGmAu3PerDay2, type PlanetName } from '../constants.js';
import { TWO_PI, wrapPi, wrapTwoPi } from '../math.js';
import { stateToSemimajorElements } from '../orbit/stateToElements.js';

const ELEMENTS = new Float64Array(6); // scratch: a, e, i, Ω, ω, M

/** Heliocentric Kepler constant of a planet system, GM_sun + GM_planet (au³/day²). */
export function planetKeplerGmAu3PerDay2(planet: PlanetName): number {
  return GM_SUN_AU3_PER_DAY2 + planetGmAu3PerDay2(planet);
}

/**
 * Osculating mean longitude λ = M + ω + Ω in [0, 2π) of the state at state[offset..offset+5]
 * (heliocentric J2000 ecliptic, au, au/day) about a centre of GM `muAu3PerDay2`. NaN when the
 * osculating orbit is not elliptic (e ≥ 1: no mean longitude).
 */
export function meanLongitudeRad(state: Float64Array, muAu3PerDay2: number, offset = 0): number {
  const r2 = state[offset] ** 2 + state[offset + 1] ** 2 + state[offset + 2] ** 2;
  const v2 = state[offset + 3] ** 2 + state[offset + 4] ** 2 + state[offset + 5] ** 2;
  // Vis-viva (common practice): bound exactly when v² < 2μ/r; checked first so that
  // unbound states (and e = 1, refused by stateToSemimajorElements) give NaN.
  if (!(v2 < (2 * muAu3PerDay2) / Math.sqrt(r2))) return NaN;
  stateToSemimajorElements(state, muAu3PerDay2, ELEMENTS, 0, offset);
  if (!(ELEMENTS[1] < 1)) return NaN;
  return wrapTwoPi(ELEMENTS[5] + ELEMENTS[4] + ELEMENTS[3]);
}

/**
 * φ = λ − λ_P in (−π, π] of a massless body and a planet, both heliocentric states (6 numbers
 * from the offsets). NaN when either osculating orbit is not elliptic.
 */
export function resonantAngleRad(
  bodyState: Float64Array, planetState: Float64Array, planet: PlanetName, bodyOffset = 0, planetOffset = 0,
): number {
  const lambda = meanLongitudeRad(bodyState, GM_SUN_AU3_PER_DAY2, bodyOffset);
  const lambdaP = meanLongitudeRad(planetState, planetKeplerGmAu3PerDay2(planet), planetOffset);
  return -wrapPi(lambdaP - lambda); // wrapPi gives [−π, π); negated twice: (−π, π]
}

/**
 * Unwrap a sampled angle series in place: add multiples of 2π so that every step between
 * neighbours lies in (−π, π] (common practice; the samples must be dense enough that the true
 * change between neighbours is below π). NaN samples stay NaN and the unwrapping resumes
 * from the last finite sample.
 */
export function unwrapAnglesInPlace(anglesRad: Float64Array): void {
  let last = NaN; // last finite unwrapped value
  for (let k = 0; k < anglesRad.length; k++) {
    const a = anglesRad[k];
    if (!Number.isFinite(a)) continue;
    if (Number.isFinite(last)) {
      const step = a - last;
      anglesRad[k] = last + step - TWO_PI * Math.ceil((step - Math.PI) / TWO_PI);
    }
    last = anglesRad[k];
  }
}
