/**
 * An invented main-belt catalogue for the families tests (synthetic data; no outside source):
 * bodies placed in PROPER elements and turned into osculating ones with the secular model's
 * forced vectors at the epoch (src/core/secular), so their places in proper-element space are
 * known exactly. Middle belt (2.56–2.79 au, clear of the listed mean-motion resonances):
 *   - a uniform background of BACKGROUND bodies with an empty ellipsoidal hole around HOLE
 *     (radius HOLE_MPS in the velocity metric), and one body, ISOLATED, at the hole's centre
 *     (8 000 bodies: dense enough that the hole stands out against testing them all at once);
 *   - a dense group of GROUP_SIZE bodies within GROUP_MPS of GROUP_CENTRE, labelled 'Planted'
 *     in the membership list the test writes;
 *   - UNRELIABLE: two bodies at sin i 0.36 (beyond the theory's 0.3), one of them alone;
 *   - one row each not screened: a comet, a distant body, a body at e 0.95.
 */
import { writeFileSync } from 'node:fs';
import { join } from 'node:path';
import { seededRandom } from '../../src/core/random.js';
import { planetarySecularModel } from '../../src/core/secular/planetarySecularModel.js';
import { newTestParticleScratch, newTestParticleSecular, testParticleSecular } from '../../src/core/secular/testParticle.js';
import { orbitalSpeedMPerS } from '../../src/detect/families/metricVelocity.js';

export const EPOCH_JD = 2460400.5;
export const HOLE = { a: 2.675, e: 0.15, sinI: 0.14 };
export const HOLE_MPS = 800;
export const GROUP_CENTRE = { a: 2.6, e: 0.22, sinI: 0.06 };
export const GROUP_MPS = 25;
export const GROUP_SIZE = 40;
export const ISOLATED = 'SYN-ISOLATED';
export const UNRELIABLE = ['SYN-TILT-1', 'SYN-TILT-2'];
export const BACKGROUND = 8000;

const model = planetarySecularModel(EPOCH_JD);
const scratch = newTestParticleScratch(model);
const sec = newTestParticleSecular();

/** Osculating a, e, i°, node°, peri° of a body with the given proper elements and free phases. */
function osculating(a: number, eP: number, sinIP: number, varpiFree: number, nodeFree: number): number[] {
  testParticleSecular(model, a, scratch, sec);
  const h = eP * Math.sin(varpiFree) + sec.hForced, k = eP * Math.cos(varpiFree) + sec.kForced;
  const p = sinIP * Math.sin(nodeFree) + sec.pForced, q = sinIP * Math.cos(nodeFree) + sec.qForced;
  const e = Math.hypot(h, k), varpi = Math.atan2(h, k);
  const iDeg = (Math.asin(Math.hypot(p, q)) * 180) / Math.PI, node = Math.atan2(p, q);
  const deg = (x: number) => ((((x * 180) / Math.PI) % 360) + 360) % 360;
  return [a, e, iDeg, deg(node), deg(varpi - node)];
}

/** Velocity-metric distance in m/s (Zappalà et al. 1990 weights 5/4, 2, 2). */
export function metricMps(a1: number, e1: number, s1: number, a2: number, e2: number, s2: number): number {
  const da = (a1 - a2) / a2;
  return orbitalSpeedMPerS(a2) * Math.sqrt(1.25 * da * da + 2 * (e1 - e2) ** 2 + 2 * (s1 - s2) ** 2);
}

/** Writes the catalogue (CSV) into dir; returns its path and the planted group's designations. */
export function writeSyntheticCatalogue(dir: string): { file: string; group: string[] } {
  const random = seededRandom(7);
  const lines = ['pdes,name,epoch,a,e,i,om,w,ma,H'];
  const row = (d: string, el: number[]) => lines.push([d, '', EPOCH_JD, ...el.map((x) => x.toFixed(7)), (360 * random()).toFixed(4), '16.0'].join(','));
  const phases = () => [2 * Math.PI * random(), 2 * Math.PI * random()] as const;
  let n = 0;
  while (n < BACKGROUND) {
    const a = 2.56 + 0.23 * random(), e = 0.05 + 0.2 * random(), s = 0.03 + 0.22 * random();
    if (metricMps(a, e, s, HOLE.a, HOLE.e, HOLE.sinI) < HOLE_MPS) continue;
    row(`SYN-BG-${++n}`, osculating(a, e, s, ...phases()));
  }
  row(ISOLATED, osculating(HOLE.a, HOLE.e, HOLE.sinI, ...phases()));
  const group: string[] = [];
  const v = orbitalSpeedMPerS(GROUP_CENTRE.a);
  for (let g = 1; g <= GROUP_SIZE; g++) {
    // a point in the cube of half-width GROUP_MPS/√3 per axis: within GROUP_MPS of the centre
    const u = () => (2 * random() - 1) * GROUP_MPS / Math.sqrt(3) / v;
    const a = GROUP_CENTRE.a * (1 + u() / Math.sqrt(1.25)), e = GROUP_CENTRE.e + u() / Math.SQRT2, s = GROUP_CENTRE.sinI + u() / Math.SQRT2;
    group.push(`SYN-GROUP-${g}`);
    row(`SYN-GROUP-${g}`, osculating(a, e, s, ...phases()));
  }
  row(UNRELIABLE[0], osculating(2.7, 0.1, 0.36, ...phases()));
  row(UNRELIABLE[1], osculating(2.62, 0.12, 0.37, ...phases()));
  lines.push(`C/2031 A1,,${EPOCH_JD},5.2,0.6,40,10,20,30,`); // comet designation: the comet catalogue
  lines.push(`SYN-FAR,,${EPOCH_JD},44.0,0.05,3,10,20,30,7.0`); // beyond the secular theory's range
  lines.push(`SYN-ECC,,${EPOCH_JD},3.0,0.95,10,10,20,30,18.0`); // e ≥ 0.9
  const file = join(dir, 'synthetic-belt.csv');
  writeFileSync(file, lines.join('\n') + '\n');
  return { file, group };
}
