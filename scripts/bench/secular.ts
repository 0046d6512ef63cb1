/**
 * Benchmark of the proper-element computation (src/core/secular): building the eight-planet
 * model once, then the columnar fill over a synthetic main-belt population (a uniform in
 * 1.8–4.0 au, e in 0–0.3, i in 0–25°, angles uniform; seeded). Figures only; nothing is
 * asserted. Figures on this 2-core machine: see DEVELOPERS.md. Usage: npx tsx scripts/bench/secular.ts [--bodies N]
 */
import { performance } from 'node:perf_hooks';
import { seededRandom, uniformArray } from '../../src/core/random.js';
import { newProperColumns, particleTable, planetarySecularModel, properElementsColumns } from '../../src/core/secular/index.js';

const argIndex = process.argv.indexOf('--bodies');
const N = argIndex > 0 ? Number(process.argv[argIndex + 1]) : 1_000_000;
const random = seededRandom(2026);
const cols = {
  a: uniformArray(random, N, 1.8, 4.0), e: uniformArray(random, N, 0, 0.3), i: uniformArray(random, N, 0, (25 * Math.PI) / 180),
  node: uniformArray(random, N, 0, 2 * Math.PI), peri: uniformArray(random, N, 0, 2 * Math.PI),
};

let t0 = performance.now();
const model = planetarySecularModel(2_461_200.5);
const modelMs = performance.now() - t0;
t0 = performance.now();
for (let k = 0; k < 100; k++) planetarySecularModel(2_461_200.5);
const modelRepeatMs = (performance.now() - t0) / 100;

t0 = performance.now();
particleTable(model);
const tableMs = performance.now() - t0;
const out = newProperColumns(N);
properElementsColumns(model, cols, out, 0, Math.min(N, 10_000)); // warm-up
t0 = performance.now();
properElementsColumns(model, cols, out);
const fillMs = performance.now() - t0;
let flagged = 0;
for (let k = 0; k < N; k++) if (out.reliability[k] !== 0) flagged++;

console.log(`model (VSOP87B states, 8×8 matrices, eigenmodes): first ${modelMs.toFixed(1)} ms, then ${modelRepeatMs.toFixed(2)} ms each`);
console.log(`particle table (A, ν_i, μ_i on a 0.0005 au grid, built once per model): ${tableMs.toFixed(1)} ms`);
console.log(`columnar fill: ${N} bodies in ${(fillMs / 1000).toFixed(2)} s = ${((fillMs * 1000) / N).toFixed(2)} µs per body`);
console.log(`flagged proper-unreliable: ${flagged} (${((100 * flagged) / N).toFixed(1)} %)`);
