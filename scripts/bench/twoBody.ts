/**
 * Benchmark of two-body motion: universal-variable propagations per second over a mixed
 * population (main-belt-like, comet-like, near-parabolic and hyperbolic states, random time
 * steps up to ±20 years), against elliptic Kepler solves per second and perihelion
 * elements → state conversions per second, with their ratios. Figures only; nothing is
 * asserted. Usage: npx tsx scripts/bench/twoBody.ts
 */
import { seededRandom, uniformArray } from '../../src/core/random.js';
import { pathToFileURL } from 'node:url';
import { performance } from 'node:perf_hooks';
import { propagateTwoBody } from '../../src/core/orbit/universal.js';
import { perihelionElementsToState } from '../../src/core/orbit/twoBody.js';
import { solveKeplerElliptic } from '../../src/core/orbit/kepler.js';
import { GM_SUN_AU3_PER_DAY2 } from '../../src/core/constants.js';

const N_ORBITS = 1000;

/** Deterministic uniform numbers in [0, 1) (seeded, src/core/random.ts). */
function uniforms(seed: number, n: number): Float64Array {
  return uniformArray(seededRandom(seed), n);
}

/** Perihelion elements for N_ORBITS bodies, 6 per row: q, e, i, Ω, ω, T (epoch 0). */
function population(): Float64Array {
  const u = uniforms(7, 6 * N_ORBITS);
  const el = new Float64Array(6 * N_ORBITS);
  for (let k = 0; k < N_ORBITS; k++) {
    const kind = k % 10; // 7 in 10 main-belt-like, 1 comet-like, 1 near-parabolic, 1 hyperbolic
    const o = 6 * k;
    el[o] = kind < 7 ? 1.8 + 2 * u[o] : 0.3 + 3 * u[o];
    el[o + 1] = kind < 7 ? 0.3 * u[o + 1] : kind === 7 ? 0.5 + 0.45 * u[o + 1] : kind === 8 ? 0.9999 + 0.0002 * u[o + 1] : 1.01 + 2 * u[o + 1];
    el[o + 2] = Math.PI * u[o + 2];
    el[o + 3] = 2 * Math.PI * u[o + 3];
    el[o + 4] = 2 * Math.PI * u[o + 4];
    el[o + 5] = -2000 + 4000 * u[o + 5];
  }
  return el;
}

export function benchTwoBody(): { propagationsPerSecond: number; keplerSolvesPerSecond: number; elementsToStatePerSecond: number } {
  const mu = GM_SUN_AU3_PER_DAY2;
  const el = population();
  const states = new Float64Array(6 * N_ORBITS);
  const out = new Float64Array(6);
  const steps = uniforms(11, 4096);
  for (let k = 0; k < steps.length; k++) steps[k] = (steps[k] - 0.5) * 2 * 7305; // ±20 yr

  // Elements → state (also fills the start states); one untimed round to warm up.
  for (let k = 0; k < N_ORBITS; k++) {
    const o = 6 * k;
    perihelionElementsToState(el[o], el[o + 1], el[o + 2], el[o + 3], el[o + 4], el[o + 5], 0, mu, states, o);
  }
  const rounds = 200;
  let t0 = performance.now();
  for (let r = 0; r < rounds; r++) {
    for (let k = 0; k < N_ORBITS; k++) {
      const o = 6 * k;
      perihelionElementsToState(el[o], el[o + 1], el[o + 2], el[o + 3], el[o + 4], el[o + 5], r, mu, states, o);
    }
  }
  const elementsToStatePerSecond = (rounds * N_ORBITS) / ((performance.now() - t0) / 1000);

  // Propagations: each start state by a stepped series of random dt.
  const nProp = 400_000;
  let check = 0;
  t0 = performance.now();
  for (let j = 0; j < nProp; j++) {
    const k = j % N_ORBITS;
    propagateTwoBody(states, steps[j & 4095], mu, out, 6 * k, 0);
    check += out[0];
  }
  const propagationsPerSecond = nProp / ((performance.now() - t0) / 1000);

  // Elliptic Kepler solves, e in [0, 0.99].
  const es = uniforms(13, 4096);
  const ms = uniforms(17, 4096);
  const nKep = 2_000_000;
  t0 = performance.now();
  for (let j = 0; j < nKep; j++) check += solveKeplerElliptic(20 * ms[j & 4095] - 10, 0.99 * es[(j * 7) & 4095]);
  const keplerSolvesPerSecond = nKep / ((performance.now() - t0) / 1000);

  const fmt = (x: number) => Math.round(x).toLocaleString('en-US');
  console.log(`two-body: ${fmt(propagationsPerSecond)} universal propagations/s (mixed conics, |dt| ≤ 20 yr)`);
  console.log(`two-body: ${fmt(keplerSolvesPerSecond)} elliptic Kepler solves/s (${(keplerSolvesPerSecond / propagationsPerSecond).toFixed(1)}× a propagation)`);
  console.log(`two-body: ${fmt(elementsToStatePerSecond)} perihelion elements → state/s (${(elementsToStatePerSecond / propagationsPerSecond).toFixed(2)}× a propagation)`);
  if (!Number.isFinite(check)) console.log('two-body: non-finite checksum');
  return { propagationsPerSecond, keplerSolvesPerSecond, elementsToStatePerSecond };
}

if (import.meta.url === pathToFileURL(process.argv[1] ?? '').href) benchTwoBody();
