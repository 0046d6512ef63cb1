/**
 * Benchmark of the planetary ephemeris: in one run, direct VSOP87B/ELP evaluations per
 * second against Chebyshev-cache evaluations per second (all nine bodies, random dates),
 * their ratio, and the cost of fitting the cache (a 10-year span filled up front, per
 * segment, and extrapolated to 200 years). Figures only; nothing is asserted.
 * Usage: npx tsx scripts/bench/ephemeris.ts
 */
import { pathToFileURL } from 'node:url';
import { performance } from 'node:perf_hooks';
import { Vsop87Ephemeris } from '../../src/core/vsop87Ephemeris.js';
import { createEphemeris } from '../../src/core/ephemeris.js';
import { EPHEMERIS_BODIES } from '../../src/core/ephemerisBody.js';
import type { Ephemeris } from '../../src/core/types.js';

const START_JD = 2_451_545.0; // 2000
const END_JD = START_JD + 3_652.5; // 2010
const YEARS = 10;

/** Deterministic dates (mulberry32, common practice) so runs are comparable. */
function dates(seed: number, n: number): Float64Array {
  let s = seed >>> 0;
  const out = new Float64Array(n);
  for (let k = 0; k < n; k++) {
    s = (s + 0x6d2b79f5) >>> 0;
    let t = s;
    t = Math.imul(t ^ (t >>> 15), t | 1);
    t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
    out[k] = START_JD + (((t ^ (t >>> 14)) >>> 0) / 4294967296) * (END_JD - START_JD);
  }
  return out;
}

/** Evaluations per second of eph over the dates, cycling through the bodies. */
function rate(eph: Ephemeris, jds: Float64Array, out: Float64Array): number {
  const bodies = EPHEMERIS_BODIES;
  const t0 = performance.now();
  for (let k = 0; k < jds.length; k++) eph.helioState(bodies[k % bodies.length], jds[k], out, 0);
  return jds.length / ((performance.now() - t0) / 1000);
}

export async function benchEphemeris(): Promise<Record<string, number>> {
  const out = new Float64Array(6);
  const direct = new Vsop87Ephemeris();
  rate(direct, dates(1, 200), out); // warm-up (and series repacking)
  const directPerS = rate(direct, dates(2, 2_000), out);

  const t0 = performance.now();
  const cache = createEphemeris({ startJdTDB: START_JD, endJdTDB: END_JD, eager: true });
  const fillS = (performance.now() - t0) / 1000;
  const segments = cache.fittedSegmentCount;
  rate(cache, dates(3, 100_000), out); // warm-up
  const cachedPerS = rate(cache, dates(4, 2_000_000), out);

  const fitted = createEphemeris({ startJdTDB: START_JD, endJdTDB: END_JD, velocity: 'fitted' });
  rate(fitted, dates(3, 100_000), out);
  const fittedPerS = rate(fitted, dates(4, 2_000_000), out);

  const figures = {
    directEvalsPerS: directPerS,
    cachedEvalsPerS: cachedPerS,
    cachedFittedVelocityEvalsPerS: fittedPerS,
    cacheSpeedup: cachedPerS / directPerS,
    cacheFill10yS: fillS,
    cacheFill200yEstimateS: (fillS * 200) / YEARS,
    cacheSegments10y: segments,
    cacheFitMsPerSegment: (fillS * 1000) / segments,
  };
  console.log('ephemeris (9 bodies, random dates 2000–2010):');
  console.log(`  direct VSOP87B/ELP series   ${directPerS.toFixed(0).padStart(12)} evaluations/s`);
  console.log(`  Chebyshev cache             ${cachedPerS.toFixed(0).padStart(12)} evaluations/s   ratio ${figures.cacheSpeedup.toFixed(0)}×`);
  console.log(`  cache, fitted velocities    ${fittedPerS.toFixed(0).padStart(12)} evaluations/s`);
  console.log(
    `  fitting all ${segments} segments of ${YEARS} years: ${fillS.toFixed(2)} s ` +
      `(${figures.cacheFitMsPerSegment.toFixed(3)} ms/segment; ≈ ${figures.cacheFill200yEstimateS.toFixed(0)} s for 200 years)`,
  );
  return figures;
}

if (import.meta.url === pathToFileURL(process.argv[1] ?? '').href) {
  await benchEphemeris();
}
