/**
 * Micro benchmark of the input path: writes a generated 200 000-line file of the one-line
 * orbit export format (invented bodies, via formatOrbitExportLine) to a temporary directory,
 * then prints lines/s for
 *   1. the line source (forEachLine, utf8 and latin1 decoding; plain and gzip),
 *   2. node:readline over the same file, for comparison,
 *   3. the fixed-width parser (parseOrbitExportLine) on lines already in memory,
 *   4. parseFloat on substrings vs the hand-written fixed-field parser, for the 11 numeric fields,
 *   5. the whole reader (readOrbitFile): export lines plain and gzip, and the same rows as CSV.
 * Each figure is the best of 5 runs (shared machine). Usage: npx tsx scripts/bench/parse.ts
 * [lines]. Figures only; nothing is asserted.
 */
import { seededRandom } from '../../src/core/random.js';
import { createReadStream, mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { createInterface } from 'node:readline';
import { gzipSync } from 'node:zlib';
import * as io from '../../src/io/index.js';

const N = Number(process.argv[2] ?? 200_000);


function makeLines(n: number): string[] {
  const random = seededRandom(12345);
  const row = io.emptyOrbitRow();
  const lines: string[] = [];
  for (let k = 0; k < n; k++) {
    const a = 1.5 + 4 * random();
    Object.assign(row, {
      number: 700_000 + k, designation: '', packedDesignation: '', name: '',
      H: 10 + 10 * random(), G: 0.15, epochJdTT: 2_462_940.5,
      meanAnomalyDeg: 360 * random(), periDeg: 360 * random(), nodeDeg: 360 * random(), iDeg: 30 * random(),
      e: 0.3 * random(), aAu: a, meanMotionDegPerDay: 0.9856076686 / a ** 1.5,
      uncertainty: Math.floor(10 * random()), reference: 'invented', nObs: 10 + Math.floor(1000 * random()),
      nOpp: 1 + Math.floor(20 * random()), firstObsYear: 1990, lastObsYear: 2030, rmsArcsec: 0.5,
      lastObsJdTT: 2_462_900.5,
    });
    lines.push(io.formatOrbitExportLine(row));
  }
  return lines;
}

/** The same rows as a CSV table with a header (read back through the export parser). */
function toCsv(lines: string[]): string {
  const row = io.emptyOrbitRow();
  const out = ['designation,epoch,e,a,i,om,w,ma,H,G,n_obs,condition_code,rms'];
  for (const [k, line] of lines.entries()) {
    io.parseOrbitExportLine(line, row, 'bench', k + 1);
    out.push([row.designation, row.epochJdTT, row.e, row.aAu, row.iDeg, row.nodeDeg, row.periDeg, row.meanAnomalyDeg,
      row.H, row.G, row.nObs, row.uncertainty, row.rmsArcsec].join(','));
  }
  return out.join('\n') + '\n';
}

function rate(label: string, lines: number, ms: number, base?: number): number {
  const perS = (lines / ms) * 1000;
  console.log(`${label.padEnd(46)} ${(perS / 1e6).toFixed(2).padStart(6)} M lines/s${base ? `  (×${(perS / base).toFixed(2)})` : ''}`);
  return perS;
}

/** Best of REPEATS runs, ms: the machine is shared, so the best run is the least disturbed. */
const REPEATS = 5;
async function timeIt(fn: () => Promise<unknown> | unknown): Promise<number> {
  let best = Infinity;
  for (let r = 0; r < REPEATS; r++) {
    const t0 = performance.now();
    await fn();
    best = Math.min(best, performance.now() - t0);
  }
  return best;
}

async function main(): Promise<void> {
  const dir = mkdtempSync(join(tmpdir(), 'wayward-bench-'));
  try {
    const lines = makeLines(N);
    const text = lines.join('\n') + '\n';
    const plain = join(dir, 'orbits.txt');
    const gz = join(dir, 'orbits.txt.gz');
    const csv = join(dir, 'orbits.csv');
    writeFileSync(plain, text);
    writeFileSync(csv, toCsv(lines));
    writeFileSync(gz, gzipSync(text));
    console.log(`${N} lines, ${(text.length / 1e6).toFixed(1)} MB, mean ${(text.length / N - 1).toFixed(0)} characters per line`);

    let count = 0;
    await forEachWarm(plain);
    const rl = rate('readline (node:readline)', N, await timeIt(async () => {
      const r = createInterface({ input: createReadStream(plain), crlfDelay: Infinity });
      for await (const _ of r) count++;
    }));
    rate('forEachLine utf8', N, await timeIt(() => io.forEachLine(plain, () => { count++; })), rl);
    rate('forEachLine latin1', N, await timeIt(() => io.forEachLine(plain, () => { count++; }, { encoding: 'latin1' })), rl);
    rate('forEachLine utf8, gzip', N, await timeIt(() => io.forEachLine(gz, () => { count++; })), rl);

    const row = io.emptyOrbitRow();
    const parseMs = await timeIt(() => {
      for (let k = 0; k < N; k++) io.parseOrbitExportLine(lines[k], row, 'bench', k + 1);
    });
    rate('parseOrbitExportLine (lines in memory)', N, parseMs);

    const fields = Object.values(io.ORBIT_COLUMNS).slice(1, 12).filter((f) => f[0] !== 20);
    let sink = 0;
    const pf = rate('parseFloat(substring) x10 fields', N, await timeIt(() => {
      for (let k = 0; k < N; k++) for (const f of fields) sink += parseFloat(lines[k].slice(f[0], f[1]));
    }));
    rate('parseFixedNumber x10 fields', N, await timeIt(() => {
      for (let k = 0; k < N; k++) for (const f of fields) sink += io.parseFixedNumber(lines[k], f[0], f[1]);
    }), pf);

    rate('readOrbitFile (read + split + parse)', N, await timeIt(() => io.readOrbitFile(plain, {}, () => {}, () => {})));
    rate('readOrbitFile, gzip', N, await timeIt(() => io.readOrbitFile(gz, {}, () => {}, () => {})));
    rate('readOrbitFile, CSV (csv-parse)', N, await timeIt(() => io.readOrbitFile(csv, {}, () => {}, () => {})));
    if (count < 0 || sink === 0.5) console.log('');
  } finally {
    rmSync(dir, { recursive: true, force: true });
  }
}

async function forEachWarm(path: string): Promise<void> {
  await io.forEachLine(path, () => {}); // warm the page cache and the JIT
}

await main();
