/**
 * Cost and accuracy of the co-orbital prediction stage (src/core/coorbital/predictCoorbital.ts)
 * against its grid: N_φ points in φ and N samples of the planet's longitude. A synthetic
 * population of Earth co-orbital candidates (invented: e in [0, 0.6], i in [0°, 30°], ω and φ0
 * uniform, |x0| ≤ 0.017, the published Earth co-orbital range of a) is predicted on each grid
 * and compared with a fine reference grid (N_φ = 720, N = 2880): the fraction of bodies whose
 * state differs, and the relative period difference among bodies without a close approach.
 * Figures only; nothing is asserted. Usage: npx tsx scripts/bench/coorbitalPrediction.ts
 */
import { pathToFileURL } from 'node:url';
import { performance } from 'node:perf_hooks';
import { seededRandom, uniformArray } from '../../src/core/random.js';
import { sunMassRatio } from '../../src/core/constants.js';
import { createCoorbitalWorkspace, predictCoorbital } from '../../src/core/coorbital/predictCoorbital.js';
import type { AveragedOrbitShape, CoorbitalPrediction } from '../../src/core/coorbital/types.js';

const BODIES = 400;
const EARTH_PERIOD_DAYS = 365.25636; // sidereal year (from memory)
const GRIDS: readonly [number, number][] = [[360, 120], [360, 360], [720, 120], [720, 180], [720, 240], [720, 360], [720, 720], [720, 1440]];
const REFERENCE: [number, number] = [720, 2880];

interface Body { shape: AveragedOrbitShape; x0: number; phi0Rad: number }

function population(): Body[] {
  const u = uniformArray(seededRandom(11), 5 * BODIES);
  const bodies: Body[] = [];
  for (let k = 0; k < BODIES; k++) {
    const o = 5 * k;
    bodies.push({
      shape: { e: 0.6 * u[o], iRad: (30 * u[o + 1] * Math.PI) / 180, periRad: 2 * Math.PI * u[o + 2] },
      x0: 0.017 * (2 * u[o + 3] - 1), phi0Rad: 2 * Math.PI * u[o + 4],
    });
  }
  return bodies;
}

function predictAll(bodies: Body[], grid: [number, number], mu: number): { out: CoorbitalPrediction[]; msPerBody: number } {
  const workspace = createCoorbitalWorkspace(grid[0], grid[1]);
  for (let k = 0; k < 20; k++) predictCoorbital(bodies[k].shape, bodies[k].x0, bodies[k].phi0Rad, mu, EARTH_PERIOD_DAYS, { workspace }); // warm-up
  const t0 = performance.now();
  const out = bodies.map((b) => predictCoorbital(b.shape, b.x0, b.phi0Rad, mu, EARTH_PERIOD_DAYS, { workspace }));
  return { out, msPerBody: (performance.now() - t0) / bodies.length };
}

function compare(out: CoorbitalPrediction[], ref: CoorbitalPrediction[]): string {
  let stateDiff = 0, reliable = 0;
  const periodErr: number[] = [];
  for (let k = 0; k < out.length; k++) {
    if (out[k].state !== ref[k].state) stateDiff++;
    if (ref[k].closeApproach || out[k].state !== ref[k].state) continue;
    reliable++;
    periodErr.push(Math.abs(out[k].periodYears / ref[k].periodYears - 1));
  }
  periodErr.sort((a, b) => a - b);
  const median = periodErr[Math.floor(periodErr.length / 2)], max = periodErr[periodErr.length - 1];
  return `state differs ${stateDiff}/${out.length}; period (${reliable} without close approach): median ${median.toExponential(1)}, max ${max.toExponential(1)}`;
}

export function main(): void {
  const mu = 1 / sunMassRatio('earth');
  const bodies = population();
  const ref = predictAll(bodies, REFERENCE, mu);
  console.log(`reference N_φ=${REFERENCE[0]} N=${REFERENCE[1]}: ${ref.msPerBody.toFixed(2)} ms/body`);
  for (const grid of GRIDS) {
    const r = predictAll(bodies, grid, mu);
    console.log(`N_φ=${grid[0]} N=${grid[1]}: ${r.msPerBody.toFixed(2)} ms/body (${(ref.msPerBody / r.msPerBody).toFixed(1)}× faster); ${compare(r.out, ref.out)}`);
  }
}

if (import.meta.url === pathToFileURL(process.argv[1]).href) main();
