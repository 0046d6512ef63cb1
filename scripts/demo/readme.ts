/**
 * README.md of a generated demo directory: the scenario in a few paragraphs, what was
 * planted, the seed and the exact command that regenerates the files.
 */
import { writeFileSync } from 'node:fs';
import { ASTEROID_CLASSES } from './population.js';
import { COMET_CLASSES } from './cometPopulation.js';
import { DEFAULT_BODIES, DEFAULT_COMETS } from './scenario.js';
import type { DemoOptions, DemoResult } from './generate.js';

/** The command line that regenerates a demo directory with these options. */
export function regenerateCommand(opts: DemoOptions): string {
  const parts = ['npx tsx scripts/make-demo.ts', `--seed ${opts.seed}`, `--out ${opts.outDir}`];
  if ((opts.bodies ?? DEFAULT_BODIES) !== DEFAULT_BODIES) parts.push(`--bodies ${opts.bodies}`);
  if ((opts.comets ?? DEFAULT_COMETS) !== DEFAULT_COMETS) parts.push(`--comets ${opts.comets}`);
  return parts.join(' ');
}

function countTable(counts: Record<string, number>, order: readonly string[]): string {
  return order.filter((k) => counts[k]).map((k) => `| ${k} | ${counts[k]} |`).join('\n');
}

function plantedTable(result: DemoResult): string {
  const counts = new Map<string, number>();
  for (const t of result.truth) {
    const key = `| ${t.file} | ${t.plantedClass} | ${t.detector} |`;
    counts.set(key, (counts.get(key) ?? 0) + 1);
  }
  return [...counts].map(([k, n]) => `${k} ${n} |`).join('\n');
}

export function writeDemoReadme(path: string, opts: DemoOptions, result: DemoResult): void {
  const lon = result.planetLongitudesDeg;
  const text = `# wayward demo catalogue

Invented data for trying out \`wayward scan\`: every designation, number and orbit in this
directory is made up by \`scripts/make-demo.ts\`; none is a real body. Numbered bodies carry
permanent numbers from 9 000 001 up (the tilde-packed range, far above any real number);
unnumbered ones carry provisional designations of the years 2030-2032; comets carry invented
provisional comet designations and invented names.

**Scenario.** A catalogue cut on 2032 May 28, all orbits osculating at 2032 May 10.0 TT
(J2000 ecliptic). \`orbits.txt\` (one-line orbit export format) holds a natural population -
main belt with six tight families (centres and ranges of Nesvorny 2015, PDS families V3.0),
Hungarias, Hildas (3:2 with Jupiter), Jupiter Trojans about L4/L5, near-Earth objects
(Apollo, Aten, Amor), Mars-crossers, Centaurs and trans-Neptunian objects - with
power-law absolute magnitudes and quality fields (observations, oppositions, arc, U, rms,
last observation) in three blocks: numbered, multi-opposition, one-opposition.
\`comets.txt\` (one-line comet orbit export format) holds Jupiter-family, Halley-type and
long-period comets. Into both, bodies were planted for the detectors; \`truth.csv\` lists each
with its file and line, class, the detector (or layer) expected to raise it, a, e, i, T_J
(from the written, rounded elements) and a note.

**Honest truth.** Every natural asteroid-file body with a < 4.8 au outside the Jupiter
Trojan (a 5.05-5.35 au) and Hilda (a 3.7-4.2 au, e < 0.3) zones has T_J >= 3.10, and every
natural comet has T_J <= 2.95, so the Tisserand detector's comet-like and asteroid-like lists
should be exactly the planted ones. T_J = a_J/a + 2 cos i sqrt((a/a_J)(1 - e^2)) with
a_J = 5.2028870 au (Murray & Dermott 1999, section 3.4).

**Approximations.** Planet positions are mean longitudes from the Standish table of
approximate planetary elements (JPL), not an ephemeris: Earth ${lon.earth.toFixed(3)} deg,
Mars ${lon.mars.toFixed(3)} deg, Jupiter ${lon.jupiter.toFixed(3)} deg, Neptune
${lon.neptune.toFixed(3)} deg at the epoch; true longitudes differ by up to about 2e rad (2 deg
for Earth, 5.5 deg for Jupiter). Co-orbitals, Trojans and Hildas are plausible initial
conditions only. Family members have osculating elements equal to proper elements plus small
noise (real osculating elements scatter more).

**Accounting.** \`orbits.txt\` has ${result.orbitLines} lines: a header block ending in a dashed
line, blank lines between blocks, 8 malformed lines (class \`bad-row\`, expected rejects)
and ${result.truth.filter((t) => t.plantedClass === 'duplicate').length} older re-submitted orbits of
designations that appear earlier (class \`duplicate\`; the newer epoch should be kept).
\`comets.txt\` has ${result.cometLines} lines.

## Regenerate

Seed ${opts.seed}. From the repository root:

    ${regenerateCommand(opts)}

The output is byte-identical on every run with the same seed and options.

## Natural population (asteroid file)

| class | rows |
|---|---|
${countTable(result.asteroidClassCounts, ASTEROID_CLASSES)}

## Natural comets

| class | rows |
|---|---|
${countTable(result.cometClassCounts, COMET_CLASSES)}

## Planted (truth.csv)

| file | class | detector | rows |
|---|---|---|---|
${plantedTable(result)}
`;
  writeFileSync(path, text);
}
