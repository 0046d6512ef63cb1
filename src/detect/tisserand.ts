/**
 * The Tisserand screen. T with respect to a planet (Jupiter by default) separates
 * asteroidal orbits (T > 3) from Jupiter-family comets (2 < T < 3) and nearly isotropic
 * comets (T < 2) (Levison 1996, ASP Conf. Ser. 107, 173). Anomalies are bodies on the
 * "wrong" side for the catalogue they come from:
 *   - comet-like T (below the boundary) on a body from an asteroid catalogue (asteroids on
 *     cometary orbits: dormant comets, or an object that is not what its catalogue says);
 *   - asteroid-like T (above the boundary) on a body from a comet catalogue (activity on
 *     a main-belt-like orbit).
 * T is not exactly conserved (the planet's orbit is eccentric and inclined, other planets
 * perturb), so a body on the anomalous side but within `margin` of the boundary is flagged
 * 'boundary' rather than ranked high (the band is ±margin wide; only its anomalous half can
 * raise a candidate, since a body on its catalogue's expected side is not one). Default margin 0.05: T_J < 3.05 is the limit used to admit asteroids on
 * cometary orbits allowing for such variation (Tancredi 2014, Icarus 234, 66; from memory).
 *
 * Zones where a low T is expected and says nothing about origin are not screened:
 *   - the planet's co-orbital zone, |a/aP − 1| < sqrt(8μ/3), the largest half-width of
 *     tadpole orbits (Murray & Dermott 1999, §3.9; for Jupiter 4.94–5.46 au, holding the
 *     Trojans), with e < 0.3 (Trojan eccentricities stay below ~0.2; from memory), so a
 *     planet-crossing comet-like orbit with a near aP is still screened; the co-orbital
 *     detector looks at those;
 *   - for Jupiter, the 3:2 resonance of the Hildas (3.7 ≤ a ≤ 4.2 au, e < 0.3, i < 20°;
 *     common practice), whose T_J sits near 3 by dynamics;
 *   - bodies whose perihelion lies beyond the planet (q > aP: Centaurs and transneptunian
 *     bodies for Jupiter), unless includeExterior is set.
 * Score: |T − boundary| − margin, so anomalies score above 0 and boundary cases below.
 * falseAlarm: the empirical tail fraction of the same-catalogue screened population that
 * is at least as far to that side, the body itself included (empiricalTail.ts).
 */
import { PLANET_MEAN_A_AU, PLANETS, planetGmAu3PerDay2, GM_SUN_AU3_PER_DAY2, DEG_PER_RAD } from '../core/constants.js';
import type { PlanetName } from '../core/constants.js';
import { tisserandParameter } from '../core/tisserand.js';
import { KIND_COMET, qualityNames, type Catalogue } from '../clean/types.js';
import { memberLowerTailFraction, memberUpperTailFraction } from './empiricalTail.js';
import type { Candidate, Detector, DetectorOptions, TisserandOptions } from './types.js';

export const TISSERAND_DEFAULTS: Readonly<TisserandOptions> = {
  planet: 'jupiter',
  boundary: 3.0,
  margin: 0.05,
  includeExterior: false,
};

export type TisserandZone = 'interior' | 'crossing' | 'unbound' | 'coorbital' | 'hilda' | 'exterior';

/** Half-width in a/aP of the planet's co-orbital zone, sqrt(8μ/3) (Murray & Dermott §3.9). */
export function coorbitalHalfWidth(planet: PlanetName): number {
  const mu = planetGmAu3PerDay2(planet) / (GM_SUN_AU3_PER_DAY2 + planetGmAu3PerDay2(planet));
  return Math.sqrt((8 * mu) / 3);
}

/** coorbitalHalfWidth of every planet, computed once (tisserandZone runs once a row). */
const HALF_WIDTH = Object.fromEntries(PLANETS.map((p) => [p, coorbitalHalfWidth(p)])) as Record<PlanetName, number>;

/** Dynamical zone of a body relative to the planet (see the file comment). */
export function tisserandZone(planet: PlanetName, a: number, q: number, e: number, iRad: number): TisserandZone {
  const aP = PLANET_MEAN_A_AU[planet];
  if (e >= 1) return 'unbound';
  if (e < 0.3 && Math.abs(a / aP - 1) < HALF_WIDTH[planet]) return 'coorbital';
  if (planet === 'jupiter' && a >= 3.7 && a <= 4.2 && e < 0.3 && iRad * DEG_PER_RAD < 20) return 'hilda';
  if (q > aP) return 'exterior';
  return a * (1 + e) > aP ? 'crossing' : 'interior';
}

function screened(zone: TisserandZone, opts: TisserandOptions): boolean {
  return zone === 'interior' || zone === 'crossing' || zone === 'unbound' || (zone === 'exterior' && opts.includeExterior);
}

function round(x: number, digits: number): number {
  return Number(x.toFixed(digits));
}

export const tisserandDetector: Detector = {
  id: 'tisserand',
  description: 'comet-like Tisserand parameter on asteroid-catalogue orbits, asteroid-like on comet-catalogue orbits',
  run(cat: Catalogue, all: DetectorOptions, progress) {
    const opts = all.tisserand;
    const aP = PLANET_MEAN_A_AU[opts.planet];
    const n = cat.size;
    const t = new Float64Array(n).fill(NaN);
    const zones: TisserandZone[] = new Array(n);
    // Screened T values of each catalogue, collected in place, then sorted for calibration.
    const refAsteroid = new Float64Array(n);
    const refComet = new Float64Array(n);
    let nAsteroid = 0;
    let nComet = 0;
    progress?.start('tisserand', n);
    for (let k = 0; k < n; k++) {
      zones[k] = tisserandZone(opts.planet, cat.a[k], cat.q[k], cat.e[k], cat.i[k]);
      t[k] = tisserandParameter(aP, cat.q[k], cat.e[k], cat.i[k]);
      if (screened(zones[k], opts) && Number.isFinite(t[k])) {
        if (cat.kind[k] === KIND_COMET) refComet[nComet++] = t[k];
        else refAsteroid[nAsteroid++] = t[k];
      }
      if ((k & 0xffff) === 0) progress?.update(k);
    }
    const sortedAsteroid = refAsteroid.subarray(0, nAsteroid).sort();
    const sortedComet = refComet.subarray(0, nComet).sort();
    const out: Candidate[] = [];
    for (let k = 0; k < n; k++) {
      if (!screened(zones[k], opts)) continue;
      const comet = cat.kind[k] === KIND_COMET;
      const beyond = comet ? t[k] - opts.boundary : opts.boundary - t[k];
      if (!(beyond > 0)) continue;
      // The body is a member of its own reference sample (it is screened and its T finite).
      const falseAlarm = comet ? memberUpperTailFraction(sortedComet, t[k]) : memberLowerTailFraction(sortedAsteroid, t[k]);
      out.push(candidateFor(cat, k, t[k], beyond, zones[k], falseAlarm, comet, opts, comet ? sortedComet.length : sortedAsteroid.length));
    }
    progress?.end();
    return out;
  },
};

function candidateFor(
  cat: Catalogue, k: number, tValue: number, beyond: number, zone: TisserandZone,
  falseAlarm: number, comet: boolean, opts: TisserandOptions, refSize: number,
): Candidate {
  const boundaryCase = beyond <= opts.margin;
  const cls = boundaryCase ? 'boundary' : comet ? 'asteroid-like-T' : 'comet-like-T';
  const flags: string[] = qualityNames(cat.quality[k]);
  if (boundaryCase) flags.push('tisserand-boundary');
  const sym = `T_${opts.planet[0].toUpperCase()}`;
  const side = comet ? 'above' : 'below';
  const catalogueWord = comet ? 'comet-catalogue' : 'asteroid-catalogue';
  const article = comet ? 'a' : 'an';
  const pct = (100 * falseAlarm).toPrecision(2);
  const iDeg = cat.i[k] * DEG_PER_RAD;
  const orbit = Number.isFinite(cat.a[k]) && cat.a[k] > 0
    ? `a = ${cat.a[k].toFixed(3)} au, e = ${cat.e[k].toFixed(3)}, i = ${iDeg.toFixed(1)}°`
    : `q = ${cat.q[k].toFixed(3)} au, e = ${cat.e[k].toFixed(3)}, i = ${iDeg.toFixed(1)}°`;
  const why = boundaryCase
    ? `${sym} = ${tValue.toFixed(3)} on ${article} ${catalogueWord} orbit (${orbit}) is ${side} ${opts.boundary} but within the ±${opts.margin} boundary band.`
    : `${sym} = ${tValue.toFixed(3)} on ${article} ${catalogueWord} orbit (${orbit}) is ${beyond.toFixed(3)} ${side} the ${opts.boundary} boundary; ${pct}% of ${refSize} screened ${catalogueWord} bodies are as far.`;
  return {
    designation: cat.designation[k],
    index: k,
    detector: 'tisserand',
    class: cls,
    score: round(beyond - opts.margin, 6),
    falseAlarm: round(falseAlarm, 8),
    flags,
    why,
    details: {
      planet: opts.planet,
      T: round(tValue, 6),
      a_au: Number.isFinite(cat.a[k]) ? round(cat.a[k], 6) : 'parabolic', // JSON has no Infinity
      q_au: round(cat.q[k], 6),
      e: round(cat.e[k], 7),
      i_deg: round(iDeg, 5),
      H: Number.isFinite(cat.H[k]) ? round(cat.H[k], 2) : 'unknown',
      zone,
      catalogue: comet ? 'comet' : 'asteroid',
    },
  };
}
