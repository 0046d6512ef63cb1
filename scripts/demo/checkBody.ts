/**
 * The demo body for `check`: an invented light artificial object, a spent upper stage in a
 * heliocentric near-Earth orbit, with ten years of synthetic astrometry that carries a planted
 * radiation-pressure signal. Everything here is our own choice and invented (synthetic data,
 * not an outside truth): the orbit, a stage left on an Earth–Mars transfer orbit (a = 1.262 au,
 * e = 0.205: a Hohmann transfer between the mean orbital radii 1 and 1.524 au has
 * a = 1.262 au, e = 0.208, common practice; i = 1.4°), apparitions every 3.3 years and an
 * approach to the Earth at about 0.12 au in 2031, A/m = 0.03 m²/kg and C_R = 1.3 (a hollow metal stage, the
 * middle of the 0.01–0.05 m²/kg asked for), H = 28.4 (about 10 m across at albedo 0.1, from
 * memory). Stations: four real codes with their published sites (the observatory-code table,
 * lines copied below) and per-station noise of modern CCD astrometry (0.2–0.6″, from memory).
 * Brightness is not modelled: the cadence follows the visibility rules alone, so the body is
 * "seen" far from the Earth, where a real 10-m object would be far too faint.
 * Writes data/demo/check/ through scripts/synthetic/syntheticFiles.ts and a README with the truth.
 */
import { join } from 'node:path';
import { calendarToJd, jdToCalendar } from '../../src/core/time/julian.js';
import { generateSyntheticAstrometry } from '../../src/fit/synthetic/index.js';
import type { SyntheticRequest, SyntheticResult, SyntheticStation } from '../../src/fit/synthetic/types.js';
import { parseObservatoryCodeLine } from '../../src/io/astrometry/observatoryCodes.js';
import { elementsRow, type ElementsInput } from '../synthetic/elementsRow.js';
import { writeFileAtomic, writeSyntheticFiles } from '../synthetic/syntheticFiles.js';
import { halfMonthIndex, provisionalText } from './designations.js';
import { DEMO_EPOCH_JD_TT } from './scenario.js';
import { tisserandJupiter } from './tisserand.js';
import type { TrailingRow } from './types.js';

/** Seed of the check body's stream: the demo seed moved by a fourth odd constant (a hash multiplier, common practice). */
export function checkBodySeed(seed: number): number {
  return (seed + 0x27d4eb2f) >>> 0;
}

/**
 * Its designation: a provisional designation of 2030 second half of August far past the
 * catalogue's own (orbits.txt uses fewer than 140 a half month of 2030), with letters that
 * spell no common abbreviation.
 */
export const CHECK_BODY_DESIGNATION = provisionalText(2030, halfMonthIndex(8, 20), 12 * 25 + 21); // '2030 QW12'

/** Sites as the published observatory-code table gives them (lines copied unchanged). */
const STATION_LINES: readonly [string, number][] = [
  ['F51 203.744090.936241+0.351543Pan-STARRS 1, Haleakala', 0.2],
  ['G96 249.211280.845107+0.533611Mt. Lemmon Survey', 0.3],
  ['703 249.267360.845311+0.533211Catalina Sky Survey', 0.6],
  ['W84 289.193580.865572-0.499793Cerro Tololo-DECam', 0.25],
];

export function checkBodyStations(): SyntheticStation[] {
  return STATION_LINES.map(([line, sigmaArcsec]) => {
    const site = parseObservatoryCodeLine(line, 'checkBody.ts', 0);
    if (site === 'skip') throw new Error(`checkBody: station line is not a site: ${line}`);
    return { site, sigmaArcsec, note2: 'C', fromJdUtc: -Infinity, toJdUtc: Infinity };
  });
}

export const CHECK_BODY_ORBIT: ElementsInput = {
  designation: CHECK_BODY_DESIGNATION, aAu: 1.262, e: 0.205, iDeg: 1.4, nodeDeg: 47.2, periDeg: 212.4, meanAnomalyDeg: 225,
  epochJdTT: DEMO_EPOCH_JD_TT, H: 28.4, reference: 'WWDEMO-CK',
};
export const CHECK_BODY_AREA_TO_MASS_M2_PER_KG = 0.03;
export const CHECK_BODY_CR = 1.3;
export const CHECK_BODY_COUNT = 480;
export const CHECK_BODY_OUTLIER_RATE = 0.01;
/** Ten years of astrometry up to the epoch: 2022 May 10.0 – 2032 May 10.0 UTC. */
export const CHECK_BODY_START_JD_UTC = calendarToJd(2022, 5, 10);
export const CHECK_BODY_END_JD_UTC = calendarToJd(2032, 5, 10);

export interface CheckBodyDemo {
  files: string[];
  request: SyntheticRequest;
  result: SyntheticResult;
  elementsLine: string;
  catalogueRow: TrailingRow; // its row in the demo catalogue (orbits.txt) and truth.csv
}

/** The observatory-code table of the demo's stations (the published lines above), for `scan --obs` and `check`. */
export const DEMO_OBSCODES_FILE = 'observatory-codes.txt';

/** Writes the four stations' lines of the observatory-code table into `dir`; returns the path. */
export function writeDemoObservatoryCodes(dir: string): string {
  const path = join(dir, DEMO_OBSCODES_FILE);
  writeFileAtomic(path, ['Code  Long.   cos      sin    Name', ...STATION_LINES.map(([line]) => line)].join('\n') + '\n');
  return path;
}

/**
 * The body's row in the demo catalogue: the same elements as check-body-elements.txt (the
 * exact truth), with the quality columns of its astrometry (observations, apparitions as
 * oppositions, first and last year, last observation date; no U: no orbit computer gave one).
 */
export function checkBodyCatalogueRow(result: SyntheticResult): TrailingRow {
  const obs = result.observations.map((o) => o.observation);
  const first = jdToCalendar(obs[0].timeJdUtc), last = jdToCalendar(obs[obs.length - 1].timeJdUtc);
  const lastDay = calendarToJd(last.year, last.month, Math.floor(last.day));
  const el = elementsRow(CHECK_BODY_ORBIT, {
    nObs: obs.length, nOpp: result.apparitions, firstObsYear: first.year, lastObsYear: last.year, lastObsJdTT: lastDay,
  });
  const o = CHECK_BODY_ORBIT;
  const crAm = CHECK_BODY_AREA_TO_MASS_M2_PER_KG * CHECK_BODY_CR;
  return {
    line: el.line,
    truth: {
      designation: CHECK_BODY_DESIGNATION, file: 'orbits.txt', plantedClass: 'srp', detector: 'nongrav',
      aAu: o.aAu, e: o.e, iDeg: o.iDeg, tisserandJ: tisserandJupiter(o.aAu, o.e, o.iDeg),
      note: `light artificial object pushed by radiation pressure, C_R·A/m = ${crAm.toFixed(3)} m²/kg planted; its astrometry in check/ (scan --obs data/demo/check)`,
    },
  };
}

/** The request for `seed` (the demo seed) and the elements row it is made from. */
export function checkBodyRequest(seed: number): { request: SyntheticRequest; elementsLine: string } {
  const el = elementsRow(CHECK_BODY_ORBIT);
  return {
    elementsLine: el.line,
    request: {
      truth: {
        elements: el.elements, nonGravAuPerDay2: null, nonGravLaw: 'inverse-square',
        areaToMassM2PerKg: CHECK_BODY_AREA_TO_MASS_M2_PER_KG, radiationPressureCoefficient: CHECK_BODY_CR, relativity: true,
      },
      stations: checkBodyStations(), startJdUtc: CHECK_BODY_START_JD_UTC, endJdUtc: CHECK_BODY_END_JD_UTC,
      count: CHECK_BODY_COUNT, seed: checkBodySeed(seed), outlierRate: CHECK_BODY_OUTLIER_RATE, outlierArcsec: [3, 20],
    },
  };
}

/** Generates the check body of the demo `seed` and writes its files into `outDir`. */
export function writeCheckBodyDemo(outDir: string, seed: number): CheckBodyDemo {
  const { request, elementsLine } = checkBodyRequest(seed);
  const result = generateSyntheticAstrometry(CHECK_BODY_DESIGNATION, request);
  if (result.shortBy > 0) throw new Error(`checkBody: ${result.shortBy} observations could not be placed`);
  const files = writeSyntheticFiles({
    dir: outDir, name: 'check-body', format: 'both', elementsLine, observations: result.observations,
    adesHeader: [{ keyword: 'submitter', entries: [['name', 'wayward demo (synthetic data)']] }],
  });
  const readme = join(outDir, 'README.md');
  writeFileAtomic(readme, checkBodyReadme(seed, request, result, elementsLine));
  return { files: [...files, readme], request, result, elementsLine, catalogueRow: checkBodyCatalogueRow(result) };
}

function isoDay(jd: number): string {
  const c = jdToCalendar(jd);
  return `${c.year}-${String(c.month).padStart(2, '0')}-${String(Math.floor(c.day)).padStart(2, '0')}`;
}

function checkBodyReadme(seed: number, r: SyntheticRequest, res: SyntheticResult, elementsLine: string): string {
  const perStation = r.stations.map((s) => `| ${s.site.code} | ${s.site.name} | ${s.sigmaArcsec} | ${res.observations.filter((o) => o.observation.station === s.site.code).length} |`);
  const outliers = res.observations.filter((o) => o.outlier).length;
  const closest = res.observations.reduce((m, o) => Math.min(m, o.distanceAu), Infinity);
  return `# The demo body for \`wayward check\`

Invented data: the body, its orbit and its astrometry are made up by the project's own
generator (\`scripts/demo/checkBody.ts\`, \`src/fit/synthetic/\`); none of it is a real
observation of a real object. The station codes are real, with their published sites; the
observations attributed to them are not theirs.

**The body.** ${CHECK_BODY_DESIGNATION}, a light artificial object: a spent upper stage left in a
heliocentric near-Earth orbit, an Earth–Mars transfer orbit (a = 1.262 au, e = 0.205; our
choice of scenario). Elements (\`check-body-elements.txt\`,
one-line orbit export format, osculating at 2032 May 10.0 TT, J2000 ecliptic):

    ${elementsLine}

**The truth planted** (what \`check\` should find):

| quantity | value |
|---|---|
| area-to-mass A/m | ${r.truth.areaToMassM2PerKg} m²/kg |
| radiation pressure coefficient C_R | ${r.truth.radiationPressureCoefficient} |
| C_R · A/m (what the data constrain) | ${(r.truth.areaToMassM2PerKg * r.truth.radiationPressureCoefficient).toFixed(3)} m²/kg |
| A1, A2, A3 | none |
| dynamics | Sun, eight planet systems (project ephemeris), Sun's 1PN term, radiation pressure (src/core/forces) |

The elements row is the exact truth: the astrometry was made from the elements as read back
from that line. A gravity-only orbit from the same elements drifts away from the planted
places by many arcseconds over the ten years (tested in test/fit/synthetic/checkBodyDemo.test.ts).

**Astrometry.** ${res.observations.length} observations, ${isoDay(r.startJdUtc)} – ${isoDay(r.endJdUtc)} UTC,
in ${res.tracklets} tracklets (2–5 a night, 20–30 min apart) on ${res.apparitions} apparitions, from
${res.candidateNights} station-nights on which the body was observable (solar elongation > 70°,
Sun below −12°, body above 20° altitude). Closest observed distance ${closest.toFixed(4)} au.
Noise normal in RA·cos Dec and Dec with each station's σ (stated as rmsRA/rmsDec in the ADES
file); ${outliers} observations (rate ${r.outlierRate}) are outliers displaced by 3–20″ in a random
direction. Brightness is not modelled (no magnitudes written).

| station | site | σ (″) | observations |
|---|---|---|---|
${perStation.join('\n')}

Files: \`check-body.obs80.txt\` (80-column records, times to 1e-6 day, RA to 0.001 s, Dec to
0.01″), \`check-body.psv\` (the same observations in ADES PSV with rmsRA/rmsDec), the
elements row, and \`check-body-observations.csv\` (per observation: true place, noise added,
outlier flag, Sun and body altitude, elongation, distance).

## Regenerate

Demo seed ${seed} (the body's own stream: seed + 0x27d4eb2f). Part of the demo build:

    npx tsx scripts/make-demo.ts --seed ${seed} --out data/demo

or alone:

    npx tsx scripts/make-demo.ts --seed ${seed} --out data/demo --check-body-only

The files are byte-identical on every run with the same seed.
`;
}
