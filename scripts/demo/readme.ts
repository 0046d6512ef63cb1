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
import { DEMO_FAMILIES } from './families.js';
import { BACKGROUND_E_SCALE, BACKGROUND_SIN_I_SCALE } from './mainBeltBackground.js';
import { MIN_NEAREST_FRACTION } from './plantedOutliers.js';
import { SHORT_PERIOD_MPS } from './properToOsculating.js';
import { YARKOVSKY_AU_PER_MYR_1KM } from './yarkovsky.js';

/** The command line that regenerates a demo directory with these options. */
export function regenerateCommand(opts: DemoOptions): string {
  const parts = ['npx tsx scripts/make-demo.ts', `--seed ${opts.seed}`, `--out ${opts.outDir}`];
  if ((opts.bodies ?? DEFAULT_BODIES) !== DEFAULT_BODIES) parts.push(`--bodies ${opts.bodies}`);
  if ((opts.comets ?? DEFAULT_COMETS) !== DEFAULT_COMETS) parts.push(`--comets ${opts.comets}`);
  return parts.join(' ');
}

/** The last block of orbits.txt: the demo body for check, when the demo has it. */
function checkBodyText(result: DemoResult): string {
  const t = result.truth.find((r) => r.detector === 'nongrav');
  if (t === undefined) return '';
  return `, then, alone in the last block (line ${t.line}), ${t.designation}, the demo body for \`check\`
(class \`${t.plantedClass}\`, detector \`nongrav\`): its astrometry is in \`check/\` and its stations in
\`observatory-codes.txt\`, so that \`wayward scan --obs data/demo/check --obscodes
data/demo/observatory-codes.txt --not-after 2033-01-01\` fits it as \`check\` does`;
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

function familyTable(result: DemoResult): string {
  return DEMO_FAMILIES.map((f) => `| ${f.id} | ${f.name} | ${f.aAu.toFixed(3)} | ${f.e.toFixed(3)} | ${f.sinI.toFixed(3)} | ${f.sigmaMPerS} | ` +
    `${f.trueAnomalyDeg} | ${f.argLatitudeDeg} | ${f.albedo} | ${f.ageMyr} | ${result.familiesTruthCounts[`family member ${f.id}`] ?? 0} |`).join('\n');
}

function pocketTable(result: DemoResult): string {
  return result.outliers.map((o, k) => `| ${k + 1} | ${o.proper.aAu.toFixed(3)} | ${o.proper.e.toFixed(3)} | ${o.proper.sinI.toFixed(3)} | ${o.pocket.radiusMPerS} | ` +
    `${o.expectedInPocket.toFixed(0)} | ${o.carvedFromPocket} | ${o.nearestMPerS.toFixed(0)} |`).join('\n');
}

function familiesSection(result: DemoResult): string {
  const o = result.outliers;
  const carved = o.reduce((s, x) => s + x.carvedFromPocket, 0);
  return `**Families, background and isolated bodies** (the families detector; \`families-truth.csv\`, one row per
body planted in proper elements, ${result.familiesTruthRows} rows: role, planted family, the proper a, e, sin i as
planted, H, and for members the diameter, ejection speed and Yarkovsky drift, for isolated bodies the
distances to the nearest and 8th-nearest drawn body and their pocket's radius, expected and carved counts).
Everything here is invented: the families, their names and places are the demo's own. The main-belt
background is one smooth density in proper elements (a from three overlapping normal laws about 2.36, 2.76
and 3.08 au, e and sin i from Rayleigh laws of scale ${BACKGROUND_E_SCALE} and ${BACKGROUND_SIN_I_SCALE}), with ${o.length} empty pockets
carved in it (below); no Kirkwood gap is carved. Bodies that fall in a mean-motion band, near a secular
resonance, across Mars's orbit or beyond the theory's e and sin i limits are drawn like the others and
set apart by the families stage itself (\`unreliable.csv\`): the holes they leave are the stage's, with hard
edges, and the sparse side of such an edge is where the background's false alarms gather.

Each family is a break-up: every member gets an isotropic ejection velocity (each component normal with
the family's sigma) turned into changes of a, e and i by Gauss's equations at the break-up's true anomaly
f and argument of latitude omega + f (Zappala et al. 1996; Morbidelli et al. 1995), plus a Yarkovsky drift
in a of up to ${YARKOVSKY_AU_PER_MYR_1KM} au/Myr x (1 km / D) x age, D from H and the family's albedo. The
places are in zones where the secular theory is trusted, and no published family's ranges hold them.

| id | name | a (au) | e | sin i | sigma (m/s) | f (deg) | omega + f (deg) | albedo | age (Myr) | members |
|---|---|---|---|---|---|---|---|---|---|---|
${familyTable(result)}

**Osculating elements** of background bodies, members and isolated bodies are their proper elements put
back through the project's own linear secular theory at the epoch (src/core/secular, the model the
families stage uses): the free vectors (proper e and sin i at a random phase) plus the planets' forced
vectors at the body's a, and a small scatter standing in for the short-period terms (normal in a, e and
sin i, each ${SHORT_PERIOD_MPS} m/s in the families metric, about ${(SHORT_PERIOD_MPS * Math.sqrt(3)).toFixed(0)} m/s in all). Real short-period terms are larger
(up to ~0.01 au in a and ~0.01 in e in the outer belt), so real families are looser than these.

**${o.length} isolated bodies** (class \`family-outlier\` in truth.csv, role \`outlier\` in families-truth.csv) sit
each at the centre of an empty pocket: a ball in the families metric inside the populated belt where a
drawn background body is drawn again (${carved} background draws were turned away in all, against
${result.familiesTruthCounts.background ?? 0} background bodies kept: the pockets are a large part of the belt's core). The smooth law
would put the expected count of background bodies in each; the detector sees an empty ball where its
smooth background predicts hundreds, which is what makes a body stand out against the whole catalogue
(in a sparse region the null model makes such gaps by itself). The centres are where the theory is
trusted, away from the planted families; the balls are wide (the detector's coarse background reads
the belt's core at a quarter to a third of its density, and the null's upper tail needs a score near
3.5 for a false-alarm probability near 2e-5), so they reach across mean-motion bands. The nearest drawn
body must be at least ${MIN_NEAREST_FRACTION} of the radius away (families and other classes are not carved).

| pocket | a (au) | e | sin i | radius (m/s) | expected | carved | nearest body (m/s) |
|---|---|---|---|---|---|---|---|
${pocketTable(result)}`;
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
main belt with ${DEMO_FAMILIES.length} invented asteroid families (below), Hungarias, Hildas (3:2 with Jupiter), Jupiter Trojans about L4/L5, near-Earth objects
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
natural Jupiter Trojans are plausible initial conditions only.

${familiesSection(result)}

${coorbitalSection(result)}

**Accounting.** \`orbits.txt\` has ${result.orbitLines} lines: a header block ending in a dashed
line, blank lines between blocks, 8 malformed lines (class \`bad-row\`, expected rejects)
and ${result.truth.filter((t) => t.plantedClass === 'duplicate').length} older re-submitted orbits of
designations that appear earlier (class \`duplicate\`; the newer epoch should be kept)${checkBodyText(result)}.
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
