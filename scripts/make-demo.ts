/**
 * Writes the demo catalogue: `npx tsx scripts/make-demo.ts [--seed N] [--out DIR]
 * [--bodies N] [--comets N] [--population-only] [--no-integrate] [--check-body-only]`. Also writes the demo body for
 * `check` into OUT/check/ (scripts/demo/checkBody.ts), its row at the end of OUT/orbits.txt and in truth.csv, and its
 * stations' observatory codes into OUT/observatory-codes.txt, unless --population-only. Deterministic: a seed gives the same bytes.
 */
import { Command, InvalidArgumentError } from 'commander';
import { join } from 'node:path';
import { writeCheckBodyDemo, writeDemoObservatoryCodes, type CheckBodyDemo } from './demo/checkBody.js';
import { generateDemo } from './demo/generate.js';
import { DEFAULT_BODIES, DEFAULT_COMETS, DEFAULT_SEED } from './demo/scenario.js';

function integer(value: string): number {
  const n = Number(value);
  if (!Number.isInteger(n) || n < 0) throw new InvalidArgumentError(`not a non-negative integer: ${value}`);
  return n;
}

const program = new Command('make-demo')
  .description('write the invented demo catalogue (orbits, comets, truth table, README)')
  .option('--seed <n>', 'PRNG seed', integer, DEFAULT_SEED)
  .option('--out <dir>', 'output directory', 'data/demo')
  .option('--bodies <n>', 'natural rows in the asteroid file', integer, DEFAULT_BODIES)
  .option('--comets <n>', 'natural comets', integer, DEFAULT_COMETS)
  .option('--population-only', 'asteroid file only, nothing planted', false)
  .option('--check-body-only', 'write only the demo body for check (data/demo/check/)', false)
  .option('--no-integrate', 'do not judge the co-orbital plants by N-body (fast; truth.csv then makes no claim on their state)')
  .parse();

const o = program.opts<{ seed: number; out: string; bodies: number; comets: number; populationOnly: boolean; integrate: boolean; checkBodyOnly: boolean }>();
let check: CheckBodyDemo | null = null;
if (!o.populationOnly) {
  check = writeCheckBodyDemo(join(o.out, 'check'), o.seed);
  for (const f of check.files) console.log(`wrote ${f}`);
  console.log(`wrote ${writeDemoObservatoryCodes(o.out)}`);
  if (o.checkBodyOnly) process.exit(0);
}
const result = await generateDemo({
  seed: o.seed, outDir: o.out, bodies: o.bodies, comets: o.comets, populationOnly: o.populationOnly, integrate: o.integrate,
  checkBody: check?.catalogueRow ?? null,
});
for (const f of result.files) console.log(`wrote ${f}`);
console.log(`orbits: ${result.orbitLines} lines, comets: ${result.cometLines} lines, truth rows: ${result.truth.length}`);
