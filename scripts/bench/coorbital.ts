/**
 * Benchmark of the co-orbital N-body confirmation (src/core/coorbital/confirm.ts), on one
 * core, per body per 1 000 years:
 *  - the one-off fill of the planetary Chebyshev cache over the window (eight planet
 *    systems), timed separately since it is shared by every body confirmed over that window;
 *  - the bare integration (8 planets + 1PN, no sampling) of one body, and the whole
 *    confirmation (integration, sampling, segmentation, captures);
 *  - a batch of 8 independent bodies in one force model against 8 single runs;
 *  - integrator tolerance 1e-9 (the integrator's default) against looser ones, with the
 *    states found, so the cost of a looser tolerance can be weighed against the labels.
 * Bodies (invented): an Earth Trojan planted 12° behind L5, an Earth co-orbital that meets
 * the Earth again and again (a ≈ 1 au, e ≈ 0.1, start 0.02 au ahead of it), a Jupiter
 * Trojan 12° beyond L4, and for the batch eight states of the Earth–Moon barycentre turned
 * by −72°, −64°, …, −16° (all at J2000). Bare integration: the forward half, timed and
 * doubled. Wall and process-CPU seconds; figures only, nothing asserted.
 * Usage: npx tsx scripts/bench/coorbital.ts [years]   (default 1000, centred on J2000)
 */
import { performance } from 'node:perf_hooks';
import { J2000_JD, PLANETS, type PlanetName } from '../../src/core/constants.js';
import { confirmCoorbital, confirmCoorbitalBatch } from '../../src/core/coorbital/confirm.js';
import { createWindowEphemeris, planetEphemerisBody } from '../../src/core/coorbital/sampleCoorbital.js';
import { turnedAboutOrbitNormal } from '../../src/core/coorbital/triangularPoint.js';
import type { CoorbitalHistory } from '../../src/core/coorbital/types.js';
import { createTestBodyIntegrator } from '../../src/core/propagate/propagateTestBodies.js';
import type { Ephemeris } from '../../src/core/types.js';

const DAYS_PER_YEAR = 365.25;
const DEG = Math.PI / 180;

export function timed<T>(f: () => T): { value: T; wallS: number; cpuS: number } {
  const cpu0 = process.cpuUsage();
  const t0 = performance.now();
  const value = f();
  const cpu = process.cpuUsage(cpu0);
  return { value, wallS: (performance.now() - t0) / 1000, cpuS: (cpu.user + cpu.system) / 1e6 };
}

export function turned(eph: Ephemeris, planet: PlanetName, angleDeg: number): Float64Array {
  const p = new Float64Array(6);
  eph.helioState(planetEphemerisBody(planet), J2000_JD, p, 0);
  const out = new Float64Array(6);
  turnedAboutOrbitNormal(p, angleDeg * DEG, out);
  return out;
}

/** 0.02 au ahead of the EMB, velocity turned by 0.1 |v| radially and 0.01 |v| normally. */
export function encounterBody(eph: Ephemeris): Float64Array {
  const e = new Float64Array(6);
  eph.helioState('emb', J2000_JD, e, 0);
  const r = Math.hypot(e[0], e[1], e[2]), v = Math.hypot(e[3], e[4], e[5]);
  const n = [e[1] * e[5] - e[2] * e[4], e[2] * e[3] - e[0] * e[5], e[0] * e[4] - e[1] * e[3]];
  const h = Math.hypot(n[0], n[1], n[2]);
  const scale = 1 / Math.sqrt(1 + 0.1 ** 2 + 0.01 ** 2);
  const s = new Float64Array(6);
  for (let k = 0; k < 3; k++) {
    s[k] = e[k] + (0.02 * e[3 + k]) / v;
    s[3 + k] = scale * (e[3 + k] + (0.1 * v * e[k]) / r + (0.01 * v * n[k]) / h);
  }
  return s;
}

function states(h: CoorbitalHistory): string {
  return h.segments.map((s) => s.state).join(' → ') + ` (${h.segments.length} segments, ${h.captures.length} captures)`;
}

/** Forward half of the window without sampling; the end position (au). */
function bareIntegration(eph: Ephemeris, s: Float64Array, years: number, epsilon: number): Float64Array {
  const end = J2000_JD + (years * DAYS_PER_YEAR) / 2;
  const { integrator } = createTestBodyIntegrator(
    { epochJdTDB: J2000_JD, states: s, forces: { planets: PLANETS, ephemeris: eph, relativity: true }, integrator: { epsilon } }, end);
  integrator.integrateTo(end);
  return Float64Array.from(integrator.x.subarray(0, 3));
}

export async function benchCoorbital(years = 1000): Promise<Record<string, number>> {
  const half = (years * DAYS_PER_YEAR) / 2;
  const per1000 = 1000 / years;
  const fill = timed(() => createWindowEphemeris(J2000_JD - half, J2000_JD + half));
  const eph = fill.value;
  console.log(`coorbital: planetary cache over ${years} yr filled in ${fill.wallS.toFixed(2)} s wall, ${fill.cpuS.toFixed(2)} s CPU (one-off, shared)`);
  const figures: Record<string, number> = { years, cacheFillCpuSeconds: fill.cpuS };
  // Warm-up (compilation of the hot paths), not counted.
  confirmCoorbital(turned(eph, 'earth', 72), J2000_JD, 'earth', { windowYears: Math.min(50, years / 2), ephemeris: eph });
  const bodies: Array<[string, PlanetName, Float64Array]> = [
    ['earth-trojan', 'earth', turned(eph, 'earth', -72)],
    ['earth-encounters', 'earth', encounterBody(eph)],
    ['jupiter-trojan', 'jupiter', turned(eph, 'jupiter', 72)],
  ];
  for (const [name, planet, s] of bodies) {
    let reference: Float64Array | null = null;
    for (const epsilon of [1e-9, 1e-8, 1e-7]) {
      const bare = timed(() => bareIntegration(eph, s, years, epsilon));
      reference ??= bare.value;
      const movedAu = Math.hypot(bare.value[0] - reference[0], bare.value[1] - reference[1], bare.value[2] - reference[2]);
      const full = timed(() => confirmCoorbital(s, J2000_JD, planet, { windowYears: years / 2, ephemeris: eph, integrator: { epsilon } }));
      const cpuPer1000 = full.cpuS * per1000;
      console.log(`coorbital: ${name} ε=${epsilon}: bare integration ${(bare.cpuS * 2 * per1000).toFixed(2)} s, `
        + `end position moved ${movedAu.toExponential(1)} au from ε=1e-9 after ${years / 2} yr, `
        + `confirmation ${cpuPer1000.toFixed(2)} s CPU per 1000 yr; min distance ${full.value.minDistanceAu.toFixed(4)} au; ${states(full.value)}`);
      figures[`${name}-eps${epsilon}-cpuSecondsPer1000yr`] = cpuPer1000;
    }
  }
  const batch = new Float64Array(48);
  for (let i = 0; i < 8; i++) batch.set(turned(eph, 'earth', -72 + 8 * i), 6 * i);
  for (const epsilon of [1e-9, 1e-7]) {
    const opts = { windowYears: years / 2, ephemeris: eph, integrator: { epsilon } };
    const one = timed(() => {
      for (let i = 0; i < 8; i++) confirmCoorbital(batch.subarray(6 * i, 6 * i + 6), J2000_JD, 'earth', opts);
    });
    const all = timed(() => confirmCoorbitalBatch(batch, J2000_JD, 'earth', opts));
    console.log(`coorbital: 8 Earth co-orbitals ε=${epsilon}: one by one ${(one.cpuS / 8 * per1000).toFixed(2)} s, `
      + `batch ${(all.cpuS / 8 * per1000).toFixed(2)} s CPU per body per 1000 yr (batch/single ${(all.cpuS / one.cpuS).toFixed(2)})`);
    figures[`batch8-eps${epsilon}-cpuSecondsPerBodyPer1000yr`] = (all.cpuS / 8) * per1000;
    figures[`single-eps${epsilon}-cpuSecondsPerBodyPer1000yr`] = (one.cpuS / 8) * per1000;
  }
  return figures;
}

if (import.meta.url === `file://${process.argv[1]}`) {
  const years = process.argv[2] ? Number(process.argv[2]) : 1000;
  console.log(JSON.stringify(await benchCoorbital(years), null, 2));
}
