/**
 * Benchmark piece: the Gauss–Radau integrator with all eight planets over a long span.
 *  - a main-belt orbit (a = 2.7 au) for `years` years;
 *  - an Earth co-orbital (a ≈ 1 au, e ≈ 0.1, i ≈ 0.6°, starting 0.02 au ahead of the Earth),
 *    which meets the Earth again and again, for the same span (from 1500 to 2500 by default).
 * Prints steps, force evaluations and seconds for each, and the one-off cost of filling the
 * planetary Chebyshev cache (series evaluations) separately, since the cache is built once
 * per span and shared by every body integrated over it.
 * Usage: npx tsx scripts/bench/integrator.ts [years]   (default 1000)
 */
import { createEphemeris } from '../../src/core/ephemeris/ephemeris.js';
import { PLANET_SYSTEM_BODIES } from '../../src/core/ephemeris/ephemerisBody.js';
import { createTestBodyIntegrator } from '../../src/core/propagate/propagateTestBodies.js';
import { semimajorElementsToState, stateToSemimajorElements } from '../../src/core/orbit/twoBody.js';
import { GM_SUN_AU3_PER_DAY2, J2000_JD, KM_PER_AU, PLANETS } from '../../src/core/constants.js';
import type { Ephemeris } from '../../src/core/types.js';

const MU = GM_SUN_AU3_PER_DAY2;
/** Start 500 years before J2000 so that a 1 000-year span stays inside the series' ±1 000 years. */
const EPOCH = J2000_JD - 182_625;
const DEG = Math.PI / 180;

function seconds(t0: bigint): number {
  return Number(process.hrtime.bigint() - t0) / 1e9;
}

interface RunFigures {
  steps: number;
  forceEvaluations: number;
  seconds: number;
  closestEarthAu: number;
}

function run(eph: Ephemeris, s0: Float64Array, years: number): RunFigures {
  const span = 365.25 * years;
  const { integrator } = createTestBodyIntegrator(
    { epochJdTDB: EPOCH, states: s0, forces: { planets: PLANETS, ephemeris: eph, relativity: true } }, EPOCH + span);
  // Sample the Earth distance every 2 days from the step polynomials (dense output, no extra
  // force evaluations) to show the encounters really happen.
  const n = Math.floor(span / 2);
  const times = new Float64Array(n);
  for (let k = 0; k < n; k++) times[k] = EPOCH + 2 * (k + 1);
  const samples = new Float64Array(6 * n);
  const t0 = process.hrtime.bigint();
  integrator.integrateTo(EPOCH + span, times, samples);
  const secs = seconds(t0);
  const earth = new Float64Array(6);
  let closest = Infinity;
  for (let k = 0; k < n; k++) {
    eph.helioState('emb', times[k], earth, 0);
    const d = Math.hypot(samples[6 * k] - earth[0], samples[6 * k + 1] - earth[1], samples[6 * k + 2] - earth[2]);
    if (d < closest) closest = d;
  }
  return { steps: integrator.steps, forceEvaluations: integrator.forceEvaluations, seconds: secs, closestEarthAu: closest };
}

export async function benchIntegrator(years = 1000): Promise<Record<string, number>> {
  const span = 365.25 * years;
  let t0 = process.hrtime.bigint();
  const eph = createEphemeris({ startJdTDB: EPOCH - 1, endJdTDB: EPOCH + span + 1, eager: PLANET_SYSTEM_BODIES });
  const fillSeconds = seconds(t0);
  console.log(`integrator: planetary cache over ${years} yr filled in ${fillSeconds.toFixed(1)} s (one-off, shared)`);

  const belt = new Float64Array(6);
  semimajorElementsToState(2.7, 0.1, 8 * DEG, 80 * DEG, 70 * DEG, 1.0, MU, belt);
  const mb = run(eph, belt, years);
  console.log(`integrator: main belt, ${years} yr, 8 planets + 1PN: ${mb.steps} steps, `
    + `${mb.forceEvaluations} force evaluations, ${mb.seconds.toFixed(2)} s `
    + `(${(mb.forceEvaluations / mb.seconds / 1e6).toFixed(2)} M evaluations/s)`);

  // Co-orbital: start 0.02 au ahead of the Earth–Moon barycentre along its velocity, with the
  // same speed turned by a radial 0.1 |v| and a normal 0.01 |v| (a ≈ 1 au, e ≈ 0.1, i ≈ 0.6°).
  const emb = new Float64Array(6);
  eph.helioState('emb', EPOCH, emb, 0);
  const r = Math.hypot(emb[0], emb[1], emb[2]);
  const v = Math.hypot(emb[3], emb[4], emb[5]);
  const co = new Float64Array(6);
  const hx = emb[1] * emb[5] - emb[2] * emb[4], hy = emb[2] * emb[3] - emb[0] * emb[5], hz = emb[0] * emb[4] - emb[1] * emb[3];
  const h = Math.hypot(hx, hy, hz);
  const scale = 1 / Math.sqrt(1 + 0.1 ** 2 + 0.01 ** 2);
  for (let k = 0; k < 3; k++) {
    co[k] = emb[k] + (0.02 * emb[3 + k]) / v;
    const normal = k === 0 ? hx : k === 1 ? hy : hz;
    co[3 + k] = scale * (emb[3 + k] + (0.1 * v * emb[k]) / r + (0.01 * v * normal) / h);
  }
  const el = new Float64Array(6);
  stateToSemimajorElements(co, MU, el);
  console.log(`integrator: co-orbital start a = ${el[0].toFixed(4)} au, e = ${el[1].toFixed(3)}, i = ${(el[2] / DEG).toFixed(2)}°`);
  const cr = run(eph, co, years);
  console.log(`integrator: Earth co-orbital, ${years} yr, 8 planets + 1PN: ${cr.steps} steps, `
    + `${cr.forceEvaluations} force evaluations, ${cr.seconds.toFixed(2)} s; closest approach to the Earth `
    + `${cr.closestEarthAu.toFixed(4)} au (${(cr.closestEarthAu * KM_PER_AU).toFixed(0)} km) in 2-day samples`);
  console.log(`integrator: co-orbital time / 2 s target = ${(cr.seconds / 2).toFixed(2)}`);
  return {
    years,
    cacheFillSeconds: fillSeconds,
    mainBeltSteps: mb.steps, mainBeltForceEvaluations: mb.forceEvaluations, mainBeltSeconds: mb.seconds,
    coorbitalSteps: cr.steps, coorbitalForceEvaluations: cr.forceEvaluations, coorbitalSeconds: cr.seconds,
    coorbitalClosestEarthAu: cr.closestEarthAu,
  };
}

if (import.meta.url === `file://${process.argv[1]}`) {
  const years = process.argv[2] ? Number(process.argv[2]) : 1000;
  await benchIntegrator(years);
}
