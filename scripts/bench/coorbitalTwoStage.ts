/**
 * Accuracy and cost of the two-stage co-orbital prediction (src/core/coorbital/predictTwoStage.ts)
 * against the fine grid alone (predictCoorbital.ts defaults), on the bodies the co-orbital
 * benchmark screens: a population-only demo dump (invented; default 1 500 000 rows, as
 * scripts/bench-coorbital.ts part 1) screened for all eight planets, every `--every`-th body
 * kept. Prints, per planet, the bodies and how many were predicted again on the fine grid;
 * then, over the bodies the coarse grid decided, the state and close-approach differences and
 * the largest differences of period (relative), separatrix margin, angles, largest offset and
 * least distance (relative), for all of them and for those with e ≤ 0.6 and i ≤ 30°; and the
 * CPU time per body of each path (one thread).
 * Figures only; nothing is asserted.
 * Usage: npx tsx scripts/bench/coorbitalTwoStage.ts [--rows N] [--every K]
 */
import { mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { Command, InvalidArgumentError } from 'commander';
import { PLANETS } from '../../src/core/constants.js';
import { createCoorbitalWorkspace, predictCoorbital } from '../../src/core/coorbital/predictCoorbital.js';
import { createTwoStageWorkspace, predictCoorbitalTwoStage } from '../../src/core/coorbital/predictTwoStage.js';
import type { CoorbitalPrediction } from '../../src/core/coorbital/types.js';
import { Vsop87Ephemeris } from '../../src/core/ephemeris/vsop87Ephemeris.js';
import { loadCatalogue } from '../../src/cli/loadCatalogue.js';
import { planetKeplerGmAu3PerDay2 } from '../../src/core/coorbital/resonantAngle.js';
import { defaultZoneHalfWidth, planetMassRatio, screenCoorbitalZone } from '../../src/detect/coorbitalZone.js';
import { generateDemo } from '../demo/generate.js';
import { DEFAULT_SEED } from '../demo/scenario.js';

function positiveInteger(value: string): number {
  const n = Number(value.replace(/_/g, ''));
  if (!Number.isInteger(n) || n < 1) throw new InvalidArgumentError(`not a positive integer: ${value}`);
  return n;
}

function cpuMs(f: () => void): number {
  const c0 = process.cpuUsage();
  f();
  const c = process.cpuUsage(c0);
  return (c.user + c.system) / 1000;
}

/** Largest differences between the kept coarse predictions and the fine ones. */
function compare(fast: CoorbitalPrediction[], fine: CoorbitalPrediction[], kept: boolean[]): string {
  const n = kept.filter(Boolean).length;
  let states = 0, close = 0, period = 0, margin = 0, angle = 0, offset = 0, distance = 0, leastFineMarginOfStateDiff = Infinity;
  fast.forEach((c, k) => {
    const f = fine[k];
    if (!kept[k]) return;
    if (c.state !== f.state) {
      states++;
      leastFineMarginOfStateDiff = Math.min(leastFineMarginOfStateDiff, f.separatrixMargin);
      return;
    }
    if (c.closeApproach !== f.closeApproach) close++;
    period = Math.max(period, Math.abs(c.periodYears / f.periodYears - 1));
    margin = Math.max(margin, Math.abs(c.separatrixMargin - f.separatrixMargin));
    offset = Math.max(offset, Math.abs(c.maxOffsetRel / f.maxOffsetRel - 1));
    distance = Math.max(distance, Math.abs(c.minDistanceHill / f.minDistanceHill - 1));
    if (c.state !== 'passing') angle = Math.max(angle, Math.abs(c.phiMinDeg - f.phiMinDeg), Math.abs(c.phiMaxDeg - f.phiMaxDeg), Math.abs(c.centreDeg - f.centreDeg));
  });
  return `${n} bodies: state differs ${states}${states > 0 ? ` (least fine margin among them ${leastFineMarginOfStateDiff.toFixed(3)})` : ''}, closeApproach differs ${close}; `
    + `largest differences: period ${period.toExponential(1)} (relative), separatrix margin ${margin.toExponential(1)}, `
    + `angles ${angle.toExponential(1)}°, largest offset ${offset.toExponential(1)} (relative), least distance ${distance.toExponential(1)} (relative)`;
}

async function main(): Promise<void> {
  const o = new Command('coorbital-two-stage')
    .option('--rows <n>', 'rows in the generated dump', positiveInteger, 1_500_000)
    .option('--every <k>', 'keep every k-th screened body', positiveInteger, 1)
    .parse().opts<{ rows: number; every: number }>();
  const dir = mkdtempSync(join(tmpdir(), 'wayward-two-stage-'));
  try {
    const gen = await generateDemo({ seed: DEFAULT_SEED, outDir: join(dir, 'dump'), bodies: o.rows, populationOnly: true });
    const { catalogue } = await loadCatalogue([gen.files[0]]);
    const { entries: all } = screenCoorbitalZone(catalogue, PLANETS, PLANETS.map(defaultZoneHalfWidth), new Vsop87Ephemeris());
    const entries = all.filter((_, k) => k % o.every === 0);
    const inputs = entries.map((e) => ({
      e, mu: planetMassRatio(e.planet), periodDays: 2 * Math.PI * Math.sqrt(e.planetAAu ** 3 / planetKeplerGmAu3PerDay2(e.planet)),
    }));
    const ws = createTwoStageWorkspace();
    const kept: boolean[] = [];
    let fast: CoorbitalPrediction[] = [];
    const fastMs = cpuMs(() => {
      fast = inputs.map((b) => {
        const before = ws.refined;
        const p = predictCoorbitalTwoStage(b.e.shape, b.e.x, b.e.phiRad, b.mu, b.periodDays, ws);
        kept.push(ws.refined === before);
        return p;
      });
    });
    const fineWs = createCoorbitalWorkspace();
    let fine: CoorbitalPrediction[] = [];
    const fineMs = cpuMs(() => {
      fine = inputs.map((b) => predictCoorbital(b.e.shape, b.e.x, b.e.phiRad, b.mu, b.periodDays, { workspace: fineWs }));
    });
    console.log(`${entries.length} of ${all.length} screened bodies (${o.rows}-row dump, every ${o.every}); one thread`);
    for (const planet of PLANETS) {
      const idx = inputs.flatMap((b, k) => (b.e.planet === planet ? [k] : []));
      if (idx.length === 0) continue;
      const refined = idx.filter((k) => !kept[k]).length;
      console.log(`  ${planet}: ${idx.length} bodies, ${refined} predicted again on the fine grid`);
    }
    console.log(`two-stage ${(fastMs / entries.length).toFixed(3)} ms CPU a body (${ws.refined} of ${ws.predicted} refined); `
      + `fine grid alone ${(fineMs / entries.length).toFixed(3)} ms; ratio ${(fineMs / fastMs).toFixed(1)}`);
    console.log(`kept on the coarse grid, ${compare(fast, fine, kept)}`);
    const lowE = kept.map((k, j) => k && inputs[j].e.shape.e <= 0.6 && inputs[j].e.shape.iRad <= Math.PI / 6);
    console.log(`the same, e ≤ 0.6 and i ≤ 30° only, ${compare(fast, fine, lowE)}`);
    const refinedEqual = fast.every((p, k) => kept[k] || JSON.stringify(p) === JSON.stringify(fine[k]));
    console.log(`refined bodies identical to the fine grid: ${refinedEqual ? 'yes' : 'NO'}`);
  } finally {
    rmSync(dir, { recursive: true, force: true });
  }
}

await main();
