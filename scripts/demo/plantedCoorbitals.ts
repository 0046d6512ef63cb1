/**
 * Draws of planted co-orbitals (1:1 mean-motion resonance), placed relative to the planet's
 * osculating orbit at the demo epoch from the ephemeris (planets.ts), as the co-orbital
 * detector sees it: a = a_P (1 + x) and λ = λ_P + φ with λ = Ω + ω + M. A draw is only a
 * starting point: the N-body integration (coorbitalTruth.ts) says what it is, and a draw that
 * does not come out as the kind it was drawn for is drawn again (coorbitalPlan.ts).
 * Libration types of the co-orbital problem: Murray & Dermott 1999 §3.9 (tadpoles about ±60°
 * within |x| ≲ √(8μ/3), horseshoes spanning 180°, quasi-satellites with φ near 0 and e
 * larger than the a-offset); the ranges below are the project's choices, from memory.
 */
import { DEG_PER_RAD, GM_SUN_AU3_PER_DAY2, planetGmAu3PerDay2 } from '../../src/core/constants.js';
import { hillRadiusAu } from '../../src/core/coorbital/capture.js';
import { Vsop87Ephemeris } from '../../src/core/ephemeris/vsop87Ephemeris.js';
import { wrapDeg360 } from '../../src/core/math.js';
import { stateToSemimajorElements } from '../../src/core/orbit/stateToElements.js';
import { placeLongitudes } from './outerPopulation.js';
import { demoEpochJdTDB, planetLongitudeDeg, type PlanetOrbits, type ScenarioPlanet } from './planets.js';
import type { Random } from './random.js';
import { normal, uniform, uniformAngleDeg } from './random.js';
import type { DemoElements } from './types.js';

/** What a co-orbital plant is drawn for: a state of φ, a temporary capture, or a passing control. */
export type CoorbitalDraw =
  | 'quasi-satellite' | 'horseshoe' | 'tadpole-L4' | 'tadpole-L5' | 'compound' | 'temporary-capture' | 'passing';

const sign = (random: Random): number => (random() < 0.5 ? -1 : 1);

/** Places a body at offset x from the planet's osculating a and at φ (deg) from λ_P. */
function placeRelative(random: Random, orbits: PlanetOrbits, planet: ScenarioPlanet, x: number, phiDeg: number, out: DemoElements): void {
  out.aAu = orbits[planet].aAu * (1 + x);
  out.nodeDeg = uniformAngleDeg(random);
  placeLongitudes(out, wrapDeg360(planetLongitudeDeg(orbits, planet) + phiDeg), uniformAngleDeg(random));
}

/** Relative offset x, e, i (deg), φ (deg) of one draw for a planet's resonant kinds. */
interface Shape { x: number; e: number; iDeg: number; phiDeg: number }

function earthShape(random: Random, kind: CoorbitalDraw): Shape {
  switch (kind) {
    case 'quasi-satellite':
      return { x: normal(random, 0, 0.0004), e: uniform(random, 0.05, 0.2), iDeg: uniform(random, 0.5, 8), phiDeg: uniform(random, -3, 3) };
    case 'horseshoe':
      return { x: sign(random) * uniform(random, 0.002, 0.008), e: uniform(random, 0.02, 0.15), iDeg: uniform(random, 0.5, 10), phiDeg: sign(random) * uniform(random, 120, 175) };
    case 'compound': // eccentric, near φ = 0 and just outside the quasi-satellite well: φ sweeps over 0 and ±60° or 180°
      return { x: sign(random) * uniform(random, 0.003, 0.005), e: uniform(random, 0.15, 0.3), iDeg: uniform(random, 0.5, 5), phiDeg: uniform(random, -10, 10) };
    case 'passing': // inside the 1:1 zone (|x| ≤ 0.017) but beyond the horseshoe widths
      return { x: sign(random) * uniform(random, 0.011, 0.016), e: uniform(random, 0.02, 0.15), iDeg: uniform(random, 0.5, 10), phiDeg: uniform(random, -180, 180) };
    default: // tadpoles: |x| within √(8μ/3) ≈ 0.0029 for the Earth–Moon system
      return { x: uniform(random, -0.0025, 0.0025), e: uniform(random, 0.05, 0.2), iDeg: uniform(random, 1, 20), phiDeg: (kind === 'tadpole-L4' ? 60 : -60) + uniform(random, -5, 5) };
  }
}

/** Trojans (about ±60°) and passing controls of Mars, Jupiter and Neptune. */
function outerShape(random: Random, planet: Exclude<ScenarioPlanet, 'earth'>, kind: CoorbitalDraw): Shape {
  const side = kind === 'tadpole-L4' ? 60 : -60;
  if (planet === 'mars') {
    return kind === 'passing'
      ? { x: sign(random) * uniform(random, 0.011, 0.016), e: uniform(random, 0.01, 0.1), iDeg: uniform(random, 1, 20), phiDeg: uniform(random, -180, 180) }
      : { x: uniform(random, -0.0013, 0.0013), e: uniform(random, 0.01, 0.1), iDeg: uniform(random, 10, 30), phiDeg: side + uniform(random, -5, 5) };
  }
  if (planet === 'jupiter') {
    // zone |x| ≤ 2√(8μ/3) ≈ 0.10; tadpoles within √(8μ/3) ≈ 0.05. A control outside the
    // Trojan band of the Tisserand screen keeps e ≤ 0.04 and i ≤ 2° so that its
    // T_J = 1/(1+x) + 2 cos i √((1+x)(1−e²)) stays above 3 (at |x| ≥ 0.085 that needs
    // cos i √(1−e²) > 0.9979; here ≥ 0.9986) and the Tisserand screen does not call it a boundary case.
    return kind === 'passing'
      ? { x: sign(random) * uniform(random, 0.085, 0.095), e: uniform(random, 0.01, 0.04), iDeg: uniform(random, 0.5, 2), phiDeg: uniform(random, -180, 180) }
      : { x: uniform(random, -0.004, 0.004), e: uniform(random, 0.02, 0.1), iDeg: uniform(random, 1, 15), phiDeg: side + uniform(random, -8, 8) };
  }
  // Neptune: tadpoles within √(8μ/3) ≈ 0.012 (no passing control: coorbitalPlan.ts)
  if (kind === 'passing') throw new RangeError('drawCoorbital: no passing control is drawn for Neptune (coorbitalPlan.ts)');
  return { x: uniform(random, -0.0017, 0.0017), e: uniform(random, 0.01, 0.1), iDeg: uniform(random, 1, 30), phiDeg: side + uniform(random, -10, 10) };
}

/** Absolute magnitude range by planet (plausible sizes; project choice). */
const H_RANGE: Readonly<Record<ScenarioPlanet, readonly [number, number]>> = {
  earth: [20, 26], mars: [16, 20], jupiter: [11, 14], neptune: [7, 9.5],
};

/**
 * A temporary capture: a body put at epoch within 1.2–2 Hill radii of the Earth–Moon
 * barycentre with a planetocentric speed of 0.3–0.6 of the escape speed √(2GM/r) (common
 * practice), so its geocentric two-body energy is negative there (capture.ts definition);
 * its heliocentric osculating elements (GM_sun, as the catalogue's are) are written.
 */
function sampleCapture(random: Random, out: DemoElements): void {
  const eph = new Vsop87Ephemeris();
  const s = new Float64Array(6);
  eph.helioState('emb', demoEpochJdTDB(), s);
  const r = uniform(random, 1.2, 2) * hillRadiusAu('earth');
  const v = uniform(random, 0.3, 0.6) * Math.sqrt((2 * planetGmAu3PerDay2('earth')) / r);
  const unit = (): number[] => {
    const lon = uniform(random, 0, 2 * Math.PI), z = uniform(random, -0.3, 0.3), c = Math.sqrt(1 - z * z);
    return [c * Math.cos(lon), c * Math.sin(lon), z];
  };
  const p = unit(), w = unit();
  for (let k = 0; k < 3; k++) {
    s[k] += r * p[k];
    s[k + 3] += v * w[k];
  }
  const el = new Float64Array(6);
  stateToSemimajorElements(s, GM_SUN_AU3_PER_DAY2, el);
  out.aAu = el[0];
  out.e = el[1];
  out.iDeg = el[2] * DEG_PER_RAD;
  out.nodeDeg = wrapDeg360(el[3] * DEG_PER_RAD);
  out.periDeg = wrapDeg360(el[4] * DEG_PER_RAD);
  out.meanAnomalyDeg = wrapDeg360(el[5] * DEG_PER_RAD);
}

/** One draw for `kind` about `planet` into `out` (elements not yet rounded). */
export function drawCoorbital(random: Random, orbits: PlanetOrbits, planet: ScenarioPlanet, kind: CoorbitalDraw, out: DemoElements): void {
  if (kind === 'temporary-capture') {
    if (planet !== 'earth') throw new RangeError(`drawCoorbital: temporary captures are drawn for the Earth only, not ${planet}`);
    sampleCapture(random, out);
  } else {
    const s = planet === 'earth' ? earthShape(random, kind) : outerShape(random, planet, kind);
    out.e = s.e;
    out.iDeg = s.iDeg;
    placeRelative(random, orbits, planet, s.x, s.phiDeg, out);
  }
  const [hLo, hHi] = H_RANGE[planet];
  out.H = uniform(random, hLo, hHi);
}
