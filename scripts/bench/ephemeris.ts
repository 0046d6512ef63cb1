/**
 * Benchmark of the planetary ephemeris, in one run:
 *  - query speed: direct VSOP87B/ELP evaluations per second against Chebyshev-cache
 *    evaluations per second (all nine bodies, random dates 2000–2010) and their ratio;
 *  - fill cost: the node-sampling fill (every node one direct evaluation) timed on 2 years
 *    and scaled, against the bulk fill (series → Chebyshev coefficients) timed on 200 and
 *    1 000 years, for the eight bodies the dynamics reads (seven planets + Earth–Moon
 *    barycentre) and for all nine, at the default and the dynamics tolerance, and over
 *    worker threads (as many as the machine offers; startup included).
 * Times are wall-clock and process CPU time (the machine may be shared; CPU time is the
 * steadier figure). Figures only; nothing is asserted.
 * Usage: npx tsx scripts/bench/ephemeris.ts
 */
import { seededRandom, uniformArray } from '../../src/core/random.js';
import { pathToFileURL } from 'node:url';
import { performance } from 'node:perf_hooks';
import { Vsop87Ephemeris } from '../../src/core/ephemeris/vsop87Ephemeris.js';
import { createEphemeris } from '../../src/core/ephemeris/ephemeris.js';
import { DEFAULT_FIT_TOLERANCE_AU, DYNAMICS_FIT_TOLERANCE_AU } from '../../src/core/ephemeris/ephemerisCache.js';
import type { CacheFillMethod } from '../../src/core/ephemeris/ephemerisCache.js';
import { EPHEMERIS_BODIES, PLANET_SYSTEM_BODIES } from '../../src/core/ephemeris/ephemerisBody.js';
import { prefillParallel } from '../../src/core/ephemeris/ephemerisParallelFill.js';
import { availableParallelism } from 'node:os';
import { J2000_JD } from '../../src/core/constants.js';
import type { Ephemeris, EphemerisBody } from '../../src/core/types.js';

const J2000 = J2000_JD;
const START_JD = J2000; // 2000
const END_JD = START_JD + 3_652.5; // 2010
const DAYS_PER_YEAR = 365.25;

/** Deterministic dates (seeded, src/core/random.ts) so runs are comparable. */
function dates(seed: number, n: number): Float64Array {
  return uniformArray(seededRandom(seed), n, START_JD, END_JD);
}

/** Evaluations per second of eph over the dates, cycling through the bodies. */
function rate(eph: Ephemeris, jds: Float64Array, out: Float64Array): number {
  const bodies = EPHEMERIS_BODIES;
  const t0 = performance.now();
  for (let k = 0; k < jds.length; k++) eph.helioState(bodies[k % bodies.length], jds[k], out, 0);
  return jds.length / ((performance.now() - t0) / 1000);
}

/** Wall and CPU seconds to fill `years` centred on J2000 for `bodies`. */
function fillSeconds(
  years: number, bodies: readonly EphemerisBody[], fill: CacheFillMethod, fitToleranceAu = DEFAULT_FIT_TOLERANCE_AU,
): { wallS: number; cpuS: number } {
  const start = J2000 - (years * DAYS_PER_YEAR) / 2;
  const end = J2000 + (years * DAYS_PER_YEAR) / 2;
  const cpu0 = process.cpuUsage();
  const t0 = performance.now();
  const cache = createEphemeris({ startJdTDB: start, endJdTDB: end, fill, fitToleranceAu });
  cache.prefill(start, end, bodies);
  const cpu = process.cpuUsage(cpu0);
  return { wallS: (performance.now() - t0) / 1000, cpuS: (cpu.user + cpu.system) / 1e6 };
}

/** Wall seconds to fill 1 000 years of `bodies` over `threads` worker threads. */
async function parallelFillSeconds(years: number, bodies: readonly EphemerisBody[], threads: number): Promise<number> {
  const start = J2000 - (years * DAYS_PER_YEAR) / 2;
  const end = J2000 + (years * DAYS_PER_YEAR) / 2;
  const t0 = performance.now();
  const cache = createEphemeris({ startJdTDB: start, endJdTDB: end });
  await prefillParallel(cache, start, end, bodies, threads);
  return (performance.now() - t0) / 1000;
}

function line(label: string, f: { wallS: number; cpuS: number }, extra = ''): string {
  return `  ${label.padEnd(46)} ${f.wallS.toFixed(2).padStart(7)} s wall ${f.cpuS.toFixed(2).padStart(7)} s CPU${extra}`;
}

export async function benchEphemeris(): Promise<Record<string, number>> {
  const out = new Float64Array(6);
  const direct = new Vsop87Ephemeris();
  rate(direct, dates(1, 200), out); // warm-up (and series repacking)
  const directPerS = rate(direct, dates(2, 2_000), out);

  const cache = createEphemeris({ startJdTDB: START_JD, endJdTDB: END_JD, eager: true });
  rate(cache, dates(3, 100_000), out); // warm-up
  const cachedPerS = rate(cache, dates(4, 2_000_000), out);
  const fitted = createEphemeris({ startJdTDB: START_JD, endJdTDB: END_JD, velocity: 'fitted' });
  rate(fitted, dates(3, 100_000), out);
  const fittedPerS = rate(fitted, dates(4, 2_000_000), out);

  fillSeconds(20, EPHEMERIS_BODIES, 'bulk'); // warm-up of the bulk path and its plans
  const nodes2 = fillSeconds(2, EPHEMERIS_BODIES, 'nodes');
  const nodes2Dyn = fillSeconds(2, PLANET_SYSTEM_BODIES, 'nodes');
  const bulk200 = fillSeconds(200, EPHEMERIS_BODIES, 'bulk');
  const bulk200Dyn = fillSeconds(200, PLANET_SYSTEM_BODIES, 'bulk');
  const bulk1000 = fillSeconds(1000, EPHEMERIS_BODIES, 'bulk');
  const bulk1000Dyn = fillSeconds(1000, PLANET_SYSTEM_BODIES, 'bulk');
  const bulk1000DynLoose = fillSeconds(1000, PLANET_SYSTEM_BODIES, 'bulk', DYNAMICS_FIT_TOLERANCE_AU);
  const threads = availableParallelism();
  const parallel1000DynWallS = await parallelFillSeconds(1000, PLANET_SYSTEM_BODIES, threads);

  const figures = {
    directEvalsPerS: directPerS,
    cachedEvalsPerS: cachedPerS,
    cachedFittedVelocityEvalsPerS: fittedPerS,
    cacheSpeedup: cachedPerS / directPerS,
    nodesFill200yAllCpuEstimateS: nodes2.cpuS * 100,
    nodesFill1000yPlanetSystemsCpuEstimateS: nodes2Dyn.cpuS * 500,
    bulkFill200yAllCpuS: bulk200.cpuS,
    bulkFill200yPlanetSystemsCpuS: bulk200Dyn.cpuS,
    bulkFill1000yAllCpuS: bulk1000.cpuS,
    bulkFill1000yPlanetSystemsCpuS: bulk1000Dyn.cpuS,
    bulkFill1000yPlanetSystemsWallS: bulk1000Dyn.wallS,
    bulkFill1000yPlanetSystemsDynamicsToleranceCpuS: bulk1000DynLoose.cpuS,
    parallelFill1000yPlanetSystemsWallS: parallel1000DynWallS,
    parallelFillThreads: threads,
    bulkOverNodesFillSpeedup1000y: (nodes2Dyn.cpuS * 500) / bulk1000Dyn.cpuS,
  };
  console.log('ephemeris queries (9 bodies, random dates 2000–2010):');
  console.log(`  direct VSOP87B/ELP series   ${directPerS.toFixed(0).padStart(12)} evaluations/s`);
  console.log(`  Chebyshev cache             ${cachedPerS.toFixed(0).padStart(12)} evaluations/s   ratio ${figures.cacheSpeedup.toFixed(0)}×`);
  console.log(`  cache, fitted velocities    ${fittedPerS.toFixed(0).padStart(12)} evaluations/s`);
  console.log('cache fill, one thread ("8 systems" = 7 planets + Earth–Moon barycentre, what the dynamics reads):');
  console.log(line('node sampling, 9 bodies, 2 years', nodes2, `   → ≈ ${figures.nodesFill200yAllCpuEstimateS.toFixed(0)} s CPU for 200 years`));
  console.log(line('node sampling, 8 systems, 2 years', nodes2Dyn, `   → ≈ ${figures.nodesFill1000yPlanetSystemsCpuEstimateS.toFixed(0)} s CPU for 1 000 years`));
  console.log(line('bulk, 9 bodies, 200 years', bulk200));
  console.log(line('bulk, 8 systems, 200 years', bulk200Dyn));
  console.log(line('bulk, 9 bodies, 1 000 years', bulk1000));
  console.log(line('bulk, 8 systems, 1 000 years', bulk1000Dyn, `   ${figures.bulkOverNodesFillSpeedup1000y.toFixed(0)}× less CPU than node sampling`));
  console.log(line(`bulk, 8 systems, 1 000 years, tolerance ${DYNAMICS_FIT_TOLERANCE_AU} au`, bulk1000DynLoose));
  console.log(
    `  bulk, 8 systems, 1 000 years, ${threads} worker threads   ${parallel1000DynWallS.toFixed(2).padStart(7)} s wall` +
      `   ${(bulk1000Dyn.wallS / parallel1000DynWallS).toFixed(2)}× the one-thread wall time`,
  );
  return figures;
}

if (import.meta.url === pathToFileURL(process.argv[1] ?? '').href) {
  await benchEphemeris();
}
