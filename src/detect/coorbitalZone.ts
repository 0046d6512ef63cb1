/**
 * The screen of the co-orbital detector: which bodies sit in a planet's 1:1 zone, and the
 * numbers the averaged problem needs for them (δa/aP, φ = λ − λ_P and the orbit shape
 * relative to the planet's plane), with the planet taken from the ephemeris at the body's
 * own epoch (osculating a and mean longitude), not from mean elements.
 *
 * Zone: |a/aP − 1| ≤ w with, by default, w = max(2·√(8μ/3), 0.017):
 *   - √(8μ/3) is the largest half-width of tadpole orbits about a planet on a circular
 *     orbit (Murray & Dermott 1999, §3.9); twice it admits the wider horseshoes;
 *   - 0.017 because the semimajor axes of all 18 known Earth co-orbitals librate between
 *     0.983 and 1.017 au (Kaplan & Cengiz 2020, MNRAS, abstract): eccentric co-orbitals
 *     reach well past the circular widths. It is the floor for every planet, a choice of the
 *     project from the Earth population; `zoneHalfWidth` overrides it.
 * The zone test uses the planet's mean a (Standish & Williams table, constants.ts): the
 * osculating a of the planet differs by less than 0.002 au (Jupiter; far less for Earth),
 * small against the zone.
 */
import { GM_SUN_AU3_PER_DAY2, PLANET_MEAN_A_AU, SECONDS_PER_DAY, planetGmAu3PerDay2, type PlanetName } from '../core/constants.js';
import { meanLongitudeFromElementsRad, phiFromLongitudesRad, planetOrbitAtEpoch, shapeRelativeToPlane, type PlanetOrbitAtEpoch } from '../core/coorbital/planetPlane.js';
import type { AveragedOrbitShape } from '../core/coorbital/types.js';
import type { Ephemeris } from '../core/types.js';
import { tdbMinusTtSeconds } from '../core/time/timeScales.js';
import type { Catalogue } from '../clean/types.js';

/** Why a body is not screened, by id (keys of summary.json's notScreened). */
export const COORBITAL_NOT_SCREENED = {
  'outside-coorbital-zone': "semimajor axis outside every screened planet's 1:1 zone",
  'unbound': 'unbound orbit (e ≥ 1): no 1:1 resonance',
  'missing-elements': 'a, e, i, node, argument of perihelion or mean anomaly missing',
  'epoch-outside-ephemeris': 'epoch outside the planetary ephemeris span (VSOP87B: 1000–3000)',
} as const;
export type CoorbitalNotScreened = keyof typeof COORBITAL_NOT_SCREENED;

/** μ = m_P/(M_sun + m_P) of the restricted three-body problem (Murray & Dermott 1999, §3.2). */
export function planetMassRatio(planet: PlanetName): number {
  const gm = planetGmAu3PerDay2(planet);
  return gm / (GM_SUN_AU3_PER_DAY2 + gm);
}

/** Largest half-width in a/aP of tadpole orbits, √(8μ/3) (Murray & Dermott 1999, §3.9). */
export function tadpoleHalfWidth(planet: PlanetName): number {
  return Math.sqrt((8 * planetMassRatio(planet)) / 3);
}

/** Default relative half-width of a planet's 1:1 zone (file comment). */
export function defaultZoneHalfWidth(planet: PlanetName): number {
  return Math.max(2 * tadpoleHalfWidth(planet), 0.017);
}

/** One screened body: the planet it is near and the averaged problem's inputs. */
export interface ZoneEntry {
  index: number; // catalogue row
  planet: PlanetName;
  epochJdTDB: number;
  x: number; // (a − aP)/aP with the planet's osculating aP at the epoch
  phiRad: number; // λ − λ_P in (−π, π]
  shape: AveragedOrbitShape; // e, i, ω relative to the planet's orbital plane
  planetAAu: number;
}

/** The planet's orbit at each distinct epoch, computed once (catalogues share few epochs). */
export class PlanetOrbitMemo {
  private readonly memo = new Map<string, PlanetOrbitAtEpoch>();
  private readonly state = new Float64Array(6);
  constructor(private readonly eph: Ephemeris) {}
  at(planet: PlanetName, jdTDB: number): PlanetOrbitAtEpoch {
    const key = `${planet}@${jdTDB}`;
    let o = this.memo.get(key);
    if (!o) {
      this.eph.helioState(planet === 'earth' ? 'emb' : planet, jdTDB, this.state);
      o = planetOrbitAtEpoch(planet, this.state);
      this.memo.set(key, o);
    }
    return o;
  }
}

function elementsMissing(cat: Catalogue, k: number): boolean {
  return !(Number.isFinite(cat.a[k]) && Number.isFinite(cat.i[k]) && Number.isFinite(cat.node[k]) &&
    Number.isFinite(cat.peri[k]) && Number.isFinite(cat.meanAnomaly[k]) && Number.isFinite(cat.epochJdTT[k]));
}

/** The planet whose zone holds a (by mean aP), or null. */
function planetOfZone(a: number, planets: readonly PlanetName[], widths: readonly number[]): number {
  for (let p = 0; p < planets.length; p++) if (Math.abs(a / PLANET_MEAN_A_AU[planets[p]] - 1) <= widths[p]) return p;
  return -1;
}

/** A body not screened for a reason of its own (not merely outside every zone). */
export interface ZoneSkip {
  index: number; // catalogue row
  reason: Exclude<CoorbitalNotScreened, 'outside-coorbital-zone'>;
}

/**
 * Screens every body; counts the others by reason (ids of COORBITAL_NOT_SCREENED) and lists
 * those not screened for a reason of their own (unbound, elements missing, epoch outside the
 * ephemeris), so each can be named in the output.
 */
export function screenCoorbitalZone(
  cat: Catalogue, planets: readonly PlanetName[], widths: readonly number[], eph: Ephemeris,
): { entries: ZoneEntry[]; notScreened: Record<CoorbitalNotScreened, number>; skipped: ZoneSkip[] } {
  const notScreened = Object.fromEntries(Object.keys(COORBITAL_NOT_SCREENED).map((r) => [r, 0])) as Record<CoorbitalNotScreened, number>;
  const memo = new PlanetOrbitMemo(eph);
  const entries: ZoneEntry[] = [];
  const skipped: ZoneSkip[] = [];
  const skip = (index: number, reason: ZoneSkip['reason']): void => { notScreened[reason]++; skipped.push({ index, reason }); };
  for (let k = 0; k < cat.size; k++) {
    if (cat.e[k] >= 1) { skip(k, 'unbound'); continue; }
    if (elementsMissing(cat, k)) { skip(k, 'missing-elements'); continue; }
    const p = planetOfZone(cat.a[k], planets, widths);
    if (p < 0) { notScreened['outside-coorbital-zone']++; continue; }
    const epochJdTDB = cat.epochJdTT[k] + tdbMinusTtSeconds(cat.epochJdTT[k]) / SECONDS_PER_DAY;
    if (epochJdTDB < eph.startJdTDB || epochJdTDB > eph.endJdTDB) { skip(k, 'epoch-outside-ephemeris'); continue; }
    const planet = planets[p];
    const orbit = memo.at(planet, epochJdTDB);
    entries.push({
      index: k, planet, epochJdTDB,
      x: cat.a[k] / orbit.aAu - 1,
      phiRad: phiFromLongitudesRad(meanLongitudeFromElementsRad(cat.node[k], cat.peri[k], cat.meanAnomaly[k]), orbit.meanLongitudeRad),
      shape: shapeRelativeToPlane(cat.e[k], cat.i[k], cat.node[k], cat.peri[k], orbit.normal),
      planetAAu: orbit.aAu,
    });
  }
  return { entries, notScreened, skipped };
}
