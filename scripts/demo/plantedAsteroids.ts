/**
 * The list of bodies planted in the asteroid file, drawn up front (a few dozen): which class,
 * which detector should raise it, which section it sits in, its elements and quality, and a
 * note for truth.csv. Good-quality plants sit among numbered or multi-opposition orbits;
 * poor ones among one-opposition orbits.
 */
import type { CoorbitalPlant } from './coorbitalPlan.js';
import type { OutlierPlant } from './plantedOutliers.js';
import type { CometLikeVariant } from './plantedTisserand.js';
import { sampleBoundaryAsteroid, sampleCometLikeAsteroid } from './plantedTisserand.js';
import { samplePoorQuality, sampleQuality } from './quality.js';
import type { Random } from './random.js';
import type { Section } from './scenario.js';
import type { DemoElements, DemoQuality } from './types.js';
import { emptyElements, emptyQuality } from './types.js';
import { roundAsteroidElements } from './orbitRows.js';

export interface PlantedAsteroid {
  plantedClass: string;
  detector: string;
  section: Section;
  el: DemoElements; // rounded as written
  q: DemoQuality;
  note: string;
  coorbital?: CoorbitalPlant; // a co-orbital plant or control, with its judgement (coorbital-truth.csv)
  outlier?: OutlierPlant; // a planted isolated body in proper elements (families-truth.csv)
}

const COMET_LIKE_PLAN: readonly (readonly [CometLikeVariant, boolean])[] = [
  ...Array.from({ length: 13 }, () => ['ordinary', false] as const),
  ...Array.from({ length: 5 }, () => ['ordinary', true] as const),
  ...Array.from({ length: 5 }, () => ['high-inclination', false] as const),
  ['retrograde', false], ['retrograde', false],
];

function goodSection(random: Random): Section {
  return random() < 0.5 ? 'numbered' : 'multiOpposition';
}

function finish(
  random: Random, plantedClass: string, detector: string, poor: boolean, el: DemoElements, note: string,
): PlantedAsteroid {
  roundAsteroidElements(el);
  const q = emptyQuality();
  const section: Section = poor ? 'oneOpposition' : goodSection(random);
  if (poor) samplePoorQuality(random, q);
  else sampleQuality(random, section, el.H, q);
  const caveat = poor ? `; poor orbit (one opposition, ${q.arcDays} d, ${q.nObs} obs, U ${q.uncertainty}): caveats must show` : '';
  return { plantedClass, detector, section, el, q, note: note + caveat };
}

const fmt = (x: number): string => (Math.round(x * 10) / 10).toFixed(1);

/** truth.csv class of a co-orbital plant: the N-body state now ('not-integrated' without a run). */
function coorbitalClass(c: CoorbitalPlant): string {
  return c.judgement.history ? c.judgement.history.stateAtEpoch : 'not-integrated';
}

function coorbitalNote(c: CoorbitalPlant): string {
  const planet = c.planet[0].toUpperCase() + c.planet.slice(1);
  const j = c.judgement;
  const phi = j.entry ? fmt((j.entry.phiRad * 180) / Math.PI) : '';
  const what = c.plantedAs === 'passing' ? 'passing control in the 1:1 zone' : `co-orbital drawn as ${c.plantedAs}`;
  const h = j.history;
  const truth = h
    ? `N-body (+-500 yr): ${h.stateAtEpoch} now${h.captures.length > 0 ? ', temporary capture' : ''}; predicted ${j.prediction!.state}`
    : 'not integrated: no claim on its state';
  return `${planet} ${what}, lambda - lambda_${planet} = ${phi} deg at epoch; ${truth} (coorbital-truth.csv)`;
}

/** Every planted asteroid-file body, in a fixed order (deterministic for a seed). */
export function planAsteroidPlants(random: Random, coorbitals: readonly CoorbitalPlant[], outliers: readonly OutlierPlant[]): PlantedAsteroid[] {
  const out: PlantedAsteroid[] = [];
  for (const [variant, poor] of COMET_LIKE_PLAN) {
    const el = emptyElements();
    sampleCometLikeAsteroid(random, variant, el);
    out.push(finish(random, 'comet-like-T', 'tisserand', poor, el, `asteroid on a cometary orbit (${variant})`));
  }
  for (let k = 0; k < 3; k++) {
    const el = emptyElements();
    sampleBoundaryAsteroid(random, el);
    out.push(finish(random, 'boundary', 'tisserand', false, el, 'T_J just below 3 (within 0.05): boundary band, not an anomaly'));
  }
  for (const c of coorbitals) {
    const p = finish(random, coorbitalClass(c), 'coorbital', false, { ...c.el }, coorbitalNote(c));
    out.push({ ...p, coorbital: c });
  }
  for (const o of outliers) {
    const note = `main-belt body at the centre of an empty pocket in proper elements (radius ${o.pocket.radiusMPerS} m/s, ${o.expectedInPocket.toFixed(0)} background bodies expected there): nearest drawn body ${o.nearestMPerS.toFixed(0)} m/s, 8th nearest ${o.eighthMPerS.toFixed(0)} m/s (families-truth.csv)`;
    out.push({ ...finish(random, 'family-outlier', 'families', false, { ...o.el }, note), outlier: o });
  }
  return out;
}
