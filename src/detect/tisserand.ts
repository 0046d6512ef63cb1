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
 * raise a candidate, since a body on its catalogue's expected side is not one). Default
 * margin 0.05: T_J < 3.05 is the limit used to admit asteroids on
 * cometary orbits allowing for such variation (Tancredi 2014, Icarus 234, 66; from memory).
 *
 * Not screened, each counted under its reason:
 *   - the planet's co-orbital zone, |a/aP − 1| < sqrt(8μ/3), the largest half-width of
 *     tadpole orbits (Murray & Dermott 1999, §3.9; for Jupiter 4.94–5.46 au, holding the
 *     Trojans), with e < 0.3 (Trojan eccentricities stay below ~0.2; from memory), so a
 *     planet-crossing comet-like orbit with a near aP is still screened; the co-orbital
 *     detector looks at those;
 *   - for Jupiter, the 3:2 resonance of the Hildas (3.7 ≤ a ≤ 4.2 au, e < 0.3, i < 20°;
 *     common practice), whose T_J sits near 3 by dynamics;
 *   - bodies whose perihelion lies beyond the planet (q > aP: Centaurs and transneptunian
 *     bodies for Jupiter), unless includeExterior is set;
 *   - unbound orbits (e ≥ 1): the classes of T above are those of bound orbits, and an
 *     unbound orbit in a catalogue is a matter for its own flag ('hyperbolic');
 *   - rows whose T cannot be computed (q, e or i missing).
 * Every body not screened is counted under its reason (DetectorResult.notScreened).
 *
 * Score: the distance in T beyond the edge of the boundary band, |T − boundary| − margin,
 * so anomalies score above 0 and boundary cases at or below it (down to −margin).
 * tailFraction: the fraction of the same-catalogue screened population at least as far to
 * that side, the body itself included (empiricalTail.ts): a rank within this catalogue. No
 * false-alarm probability: the screen states no null model of natural bodies' T.
 */
import { PLANET_MEAN_A_AU, PLANETS, DEG_PER_RAD } from '../core/constants.js';
import { tadpoleHalfWidth } from './coorbitalZone.js';
import type { PlanetName } from '../core/constants.js';
import { tisserandParameter } from '../core/orbit/tisserand.js';
import { KIND_COMET, qualityNames, type Catalogue } from '../clean/types.js';
import { memberLowerTailFraction, memberUpperTailFraction } from './empiricalTail.js';
import type { Candidate, Detector, DetectorOptions, DetectorResult, TisserandOptions } from './types.js';

export const TISSERAND_DEFAULTS: Readonly<TisserandOptions> = {
  planet: 'jupiter',
  boundary: 3.0,
  margin: 0.05,
  includeExterior: false,
};

export type TisserandZone = 'interior' | 'crossing' | 'unbound' | 'coorbital' | 'hilda' | 'exterior';

/** Why a body is not screened, by id (the ids are the keys of summary.json's notScreened). */
export const TISSERAND_NOT_SCREENED = {
  'unbound': 'unbound orbit (e ≥ 1): outside the bound-orbit classes of T',
  'coorbital-zone': "in the planet's co-orbital zone (|a/aP − 1| < √(8μ/3), e < 0.3), where T near 3 is expected",
  'hilda-zone': 'in the Hilda zone of the 3:2 resonance with Jupiter (3.7–4.2 au, e < 0.3, i < 20°)',
  'perihelion-beyond-planet': 'perihelion beyond the planet (q > aP); --include-exterior screens them',
  'missing-elements': 'T cannot be computed: q, e or i missing',
} as const;
type NotScreenedReason = keyof typeof TISSERAND_NOT_SCREENED;

/** Half-width in a/aP of the planet's co-orbital zone, sqrt(8μ/3) (Murray & Dermott §3.9). */
export function coorbitalHalfWidth(planet: PlanetName): number {
  return tadpoleHalfWidth(planet);
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

/** The reason a body of this zone and T is not screened, or null when it is screened. */
function notScreenedReason(zone: TisserandZone, tValue: number, opts: TisserandOptions): NotScreenedReason | null {
  if (!Number.isFinite(tValue)) return 'missing-elements';
  if (zone === 'unbound') return 'unbound';
  if (zone === 'coorbital') return 'coorbital-zone';
  if (zone === 'hilda') return 'hilda-zone';
  if (zone === 'exterior' && !opts.includeExterior) return 'perihelion-beyond-planet';
  return null;
}

/** T of a row, NaN where the elements do not allow it (tisserandParameter refuses them). */
function tisserandOrNaN(aP: number, q: number, e: number, iRad: number): number {
  return q > 0 && e >= 0 && Number.isFinite(iRad) ? tisserandParameter(aP, q, e, iRad) : NaN;
}

function round(x: number, digits: number): number {
  return Number(x.toFixed(digits));
}

export const tisserandDetector: Detector = {
  id: 'tisserand',
  description: 'comet-like Tisserand parameter on asteroid-catalogue orbits, asteroid-like on comet-catalogue orbits',
  scoreMeaning: 'distance in T beyond the edge of the boundary band, |T − boundary| − margin (≤ 0 inside the band)',
  tailMeaning: 'screened bodies of the same catalogue (asteroid or comet) at least as far beyond the boundary, the body itself included',
  falseAlarmModel: null,
  notScreenedReasons: TISSERAND_NOT_SCREENED,
  async run(cat: Catalogue, all: DetectorOptions, ctx): Promise<DetectorResult> {
    const opts = all.tisserand;
    const progress = ctx?.progress;
    const aP = PLANET_MEAN_A_AU[opts.planet];
    const n = cat.size;
    const t = new Float64Array(n).fill(NaN);
    const zones: TisserandZone[] = new Array(n);
    const isScreened = new Uint8Array(n);
    const notScreened = Object.fromEntries(Object.keys(TISSERAND_NOT_SCREENED).map((r) => [r, 0])) as Record<NotScreenedReason, number>;
    // Screened T values of each catalogue, collected in place, then sorted for calibration.
    const refAsteroid = new Float64Array(n);
    const refComet = new Float64Array(n);
    let nAsteroid = 0;
    let nComet = 0;
    progress?.start('tisserand', n);
    for (let k = 0; k < n; k++) {
      zones[k] = tisserandZone(opts.planet, cat.a[k], cat.q[k], cat.e[k], cat.i[k]);
      t[k] = tisserandOrNaN(aP, cat.q[k], cat.e[k], cat.i[k]);
      const reason = notScreenedReason(zones[k], t[k], opts);
      if (reason !== null) notScreened[reason]++;
      else {
        isScreened[k] = 1;
        if (cat.kind[k] === KIND_COMET) refComet[nComet++] = t[k];
        else refAsteroid[nAsteroid++] = t[k];
      }
      if ((k & 0xffff) === 0) progress?.update(k);
    }
    const sortedAsteroid = refAsteroid.subarray(0, nAsteroid).sort();
    const sortedComet = refComet.subarray(0, nComet).sort();
    const candidates: Candidate[] = [];
    for (let k = 0; k < n; k++) {
      if (!isScreened[k]) continue;
      const comet = cat.kind[k] === KIND_COMET;
      const beyond = comet ? t[k] - opts.boundary : opts.boundary - t[k];
      if (!(beyond > 0)) continue;
      // The body is a member of its own reference sample (it is screened and its T finite).
      const sorted = comet ? sortedComet : sortedAsteroid;
      const tail = comet ? memberUpperTailFraction(sorted, t[k]) : memberLowerTailFraction(sorted, t[k]);
      candidates.push(candidateFor(cat, k, t[k], beyond, zones[k], tail, sorted.length, comet, opts));
    }
    progress?.end();
    return { candidates, screened: nAsteroid + nComet, notScreened };
  },
};

/** The sentence of one candidate; its numbers are those of the candidate's fields. */
function whyFor(
  sym: string, tValue: number, orbit: string, comet: boolean, beyond: number, score: number,
  tail: number, population: number, opts: TisserandOptions,
): string {
  const side = comet ? 'above' : 'below';
  const what = comet ? 'comet-catalogue' : 'asteroid-catalogue';
  const start = `${sym} = ${tValue.toFixed(3)} on ${comet ? 'a' : 'an'} ${what} orbit (${orbit}) is ${beyond.toFixed(3)} ${side} the ${opts.boundary} boundary`;
  if (score <= 0) {
    return `${start}, inside the ±${opts.margin} boundary band (score ${score.toFixed(3)}): a boundary case, not ranked as an anomaly.`;
  }
  const count = Math.round(tail * population);
  return `${start}, ${score.toFixed(3)} beyond the ±${opts.margin} boundary band (the score); ` +
    `${count} of the ${population} screened ${what} bodies ${count === 1 ? 'is' : 'are'} as far, itself included (tail fraction ${tail.toExponential(2)}).`;
}

function candidateFor(
  cat: Catalogue, k: number, tValue: number, beyond: number, zone: TisserandZone,
  tail: number, population: number, comet: boolean, opts: TisserandOptions,
): Candidate {
  const score = round(beyond - opts.margin, 6);
  const boundary = score <= 0;
  const flags: string[] = qualityNames(cat.quality[k]);
  if (boundary) flags.push('tisserand-boundary');
  const sym = `T_${opts.planet[0].toUpperCase()}`;
  const iDeg = cat.i[k] * DEG_PER_RAD;
  const orbit = `a = ${cat.a[k].toFixed(3)} au, e = ${cat.e[k].toFixed(3)}, i = ${iDeg.toFixed(1)}°`;
  return {
    designation: cat.designation[k],
    index: k,
    detector: 'tisserand',
    class: boundary ? 'boundary' : comet ? 'asteroid-like-T' : 'comet-like-T',
    boundary,
    score,
    tailFraction: tail,
    tailPopulation: population,
    falseAlarmProb: NaN,
    flags,
    why: whyFor(sym, tValue, orbit, comet, beyond, score, tail, population, opts),
    details: {
      planet: opts.planet,
      T: round(tValue, 6),
      beyond_boundary: round(beyond, 6),
      a_au: round(cat.a[k], 6),
      q_au: round(cat.q[k], 6),
      e: round(cat.e[k], 7),
      i_deg: round(iDeg, 5),
      H: Number.isFinite(cat.H[k]) ? round(cat.H[k], 2) : 'unknown',
      zone,
      catalogue: comet ? 'comet' : 'asteroid',
    },
  };
}
