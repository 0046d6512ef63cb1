/**
 * A synthetic near-Earth list for the co-orbital benchmark (invented bodies, seeded): `rows`
 * numbered bodies in the one-line orbit export format, of which `zoneBodies` are placed in the
 * Earth's 1:1 zone (|a − 1 au| < 0.017 au, the zone floor of src/detect/coorbitalZone.ts) with
 * a mix of e and i, and the rest NEO-like orbits (the demo's Apollo, Aten and Amor samplers)
 * drawn again whenever a lands within 0.02 au of 1 au, so that the zone holds exactly the
 * placed bodies. Zone bodies are spread evenly through the file. Every row carries
 * multi-opposition quality (the demo's numbered-body sampler), so none is set aside as too
 * poor to integrate. Epoch: the demo epoch.
 */
import { formatOrbitExportLine } from '../../src/io/index.js';
import { emptyOrbitRow } from '../../src/io/types.js';
import { seededRandom, type Random } from '../../src/core/random.js';
import { sampleAmor, sampleApollo, sampleAten } from '../demo/innerPopulation.js';
import { LineWriter } from '../demo/lineWriter.js';
import { fillAsteroidRow, roundAsteroidElements } from '../demo/orbitRows.js';
import { sampleQuality } from '../demo/quality.js';
import { DEMO_EPOCH_JD_TT } from '../demo/scenario.js';
import { emptyElements, emptyQuality, type DemoElements } from '../demo/types.js';

export const NEAR_EARTH_DEFAULT_SEED = 36_500;

/** Half-width of the Earth's zone the placed bodies fill (au; coorbitalZone.ts floor). */
const ZONE_HALF_WIDTH_AU = 0.017;
/** NEO-like draws closer than this to 1 au are drawn again (keeps them out of the zone). */
const NATURAL_CLEARANCE_AU = 0.02;
/**
 * Shares of Apollos, Amors and Atens (rest): roughly the known NEO population's split
 * (from memory: about 60 %, 33 %, 7 %).
 */
const APOLLO_SHARE = 0.6;
const AMOR_SHARE = 0.33;

export interface NearEarthListOptions { rows: number; zoneBodies: number; seed: number }

/** A body in the Earth's zone: e mostly low but up to 0.5, i Rayleigh-like up to 40°. */
function sampleZoneBody(random: Random, out: DemoElements): void {
  out.aAu = 1 + ZONE_HALF_WIDTH_AU * (2 * random() - 1) * 0.999;
  out.e = random() < 0.5 ? 0.15 * random() : 0.15 + 0.35 * random();
  out.iDeg = random() < 0.5 ? 10 * random() : 10 + 30 * random();
  out.nodeDeg = 360 * random();
  out.periDeg = 360 * random();
  out.meanAnomalyDeg = 360 * random();
}

function sampleNearEarth(random: Random, out: DemoElements): void {
  do {
    const u = random();
    if (u < APOLLO_SHARE) sampleApollo(random, out);
    else if (u < APOLLO_SHARE + AMOR_SHARE) sampleAmor(random, out);
    else sampleAten(random, out);
  } while (Math.abs(out.aAu - 1) < NATURAL_CLEARANCE_AU);
}

/** Writes the list to `path`; returns the number of rows written. */
export function writeNearEarthList(path: string, o: NearEarthListOptions): number {
  if (!Number.isInteger(o.rows) || o.rows < 1) throw new RangeError(`writeNearEarthList: rows must be a positive integer, got ${o.rows}`);
  if (!Number.isInteger(o.zoneBodies) || o.zoneBodies < 0 || o.zoneBodies > o.rows) {
    throw new RangeError(`writeNearEarthList: zoneBodies must be an integer in [0, rows], got ${o.zoneBodies}`);
  }
  const random = seededRandom(o.seed);
  const w = new LineWriter(path);
  const row = emptyOrbitRow();
  const el = emptyElements();
  const q = emptyQuality();
  let placed = 0;
  for (let k = 0; k < o.rows; k++) {
    // Zone body where the running share falls behind zoneBodies/rows (evenly spread).
    const inZone = placed < o.zoneBodies && (k + 1) * o.zoneBodies >= (placed + 1) * o.rows;
    if (inZone) { sampleZoneBody(random, el); placed++; } else sampleNearEarth(random, el);
    el.H = 18 + 10 * random();
    roundAsteroidElements(el);
    sampleQuality(random, 'numbered', el.H, q);
    fillAsteroidRow(row, el, q, `(${k + 1})`, k + 1, DEMO_EPOCH_JD_TT);
    w.write(formatOrbitExportLine(row));
  }
  w.close();
  return o.rows;
}
