/**
 * README.md of a generated demo directory: the scenario in a few paragraphs, what was
 * planted, the seed and the exact command that regenerates the files.
 */
import { writeFileSync } from 'node:fs';
import { ASTEROID_CLASSES } from './population.js';
import { COMET_CLASSES } from './cometPopulation.js';
import { DEFAULT_BODIES, DEFAULT_COMETS } from './scenario.js';
import type { DemoOptions, DemoResult } from './generate.js';
import { COORBITAL_PLAN } from './coorbitalPlan.js';
import type { CoorbitalTruthRow } from './coorbitalTruthTable.js';

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

/** Planted co-orbitals: counts of state now (N-body) by planet and the kind each was drawn as. */
function coorbitalTable(result: DemoResult): string {
  const counts = new Map<string, number>();
  const order = (c: CoorbitalTruthRow): number => COORBITAL_PLAN.findIndex(([p, k]) => p === c.plant.planet && k === c.plant.plantedAs);
  for (const c of [...result.coorbitals].sort((x, y) => order(x) - order(y))) {
    const h = c.plant.judgement.history;
    const now = h ? h.stateAtEpoch : 'not integrated';
    const key = `| ${c.plant.planet} | ${c.plant.plantedAs} | ${now} | ${h ? (h.captures.length > 0 ? 'yes' : 'no') : ''} |`;
    counts.set(key, (counts.get(key) ?? 0) + 1);
  }
  return [...counts].map(([k, n]) => `${k} ${n} |`).join('\n');
}

function coorbitalSection(result: DemoResult): string {
  const integrated = result.coorbitals.some((c) => c.plant.judgement.history);
  return `**Co-orbitals.** ${result.coorbitals.length} bodies are planted in the 1:1 zones of the Earth, Mars,
Jupiter and Neptune (src/detect/coorbitalZone.ts): Earth quasi-satellites, horseshoes, L4 and L5
tadpoles, a compound orbit and a temporary capture (a body put at the epoch within 2 Hill radii
of the Earth with negative geocentric two-body energy), Mars and Neptune Trojans, a group of
Jupiter Trojans at L4 and L5 with small e, and passing controls (in a zone, circulating). Each
is placed with the ephemeris: a = a_P (1 + x) and lambda = lambda_P + phi with the osculating
a_P and lambda_P above, phi = lambda - lambda_P as the detector computes it.
${integrated
    ? `**Their truth is what the dynamics does**, not what they were drawn for: the generator runs the
detector's own stages on the written (rounded) elements - the screen, the averaged prediction and
the N-body confirmation over the epoch +-500 years (eight planets and the Sun's 1PN term, the
detector's default window and force model) - and \`truth.csv\` gives as class the N-body state at the
epoch (\`passing\` for a control). A draw that did not come out as the kind it was drawn for was drawn
again from the seeded stream (column \`draws\`). \`coorbital-truth.csv\` has one row per body:
planet, kind drawn for, state now, the prediction and whether it agrees (with the reason where
it does not), phi and delta a / a_P at the epoch, years spent in each state over the window,
the number of transitions and the sequence of states, temporary capture (geocentric energy < 0
within 3 Hill radii, src/core/coorbital/capture.ts) yes/no with the number of episodes and the
first one's start, and the least distance to the planet and when (years from the epoch).
Prediction and N-body disagree now for ${result.coorbitals.filter((c) => c.plant.judgement.history && c.plant.judgement.prediction!.state !== c.plant.judgement.history.stateAtEpoch).length} of them (column \`disagreement_reason\`). There is
no passing control for Neptune: in its zone the synodic period is at least ~4 800 years, so
nothing there circulates once in +-500 years.`
    : 'Generated without the N-body judge (--no-integrate): truth.csv names their class `not-integrated` and claims nothing about their dynamics.'}

| planet | drawn as | N-body now | temporary capture | bodies |
|---|---|---|---|---|
${coorbitalTable(result)}`;
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

**Planets.** Planet positions are the co-orbital detector's own: the osculating orbit of
each planet (Earth-Moon barycentre, Mars, Jupiter, Neptune) from the project's VSOP87B
ephemeris state at the epoch, with the planet's heliocentric Kepler constant GM_sun + GM_planet.
Osculating mean longitudes at the epoch: Earth ${lon.earth.toFixed(4)} deg, Mars ${lon.mars.toFixed(4)} deg,
Jupiter ${lon.jupiter.toFixed(4)} deg, Neptune ${lon.neptune.toFixed(4)} deg (J2000 ecliptic). Hildas and the
natural Jupiter Trojans are plausible initial conditions only. Family members have osculating
elements equal to proper elements plus small noise (real osculating elements scatter more).

${coorbitalSection(result)}

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
