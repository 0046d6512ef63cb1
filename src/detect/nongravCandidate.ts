/**
 * The candidate row of one body whose preferred model is not gravity only (nongravCheck.ts):
 * class = the model id ('thermal', 'comet', 'srp'), or 'probable-artefact' when the signal
 * vanishes without one station (leave-one-station-out: reported apart as a boundary case,
 * score 0, flagged); score = Δχ² against gravity only; falseAlarmProb = the likelihood-ratio
 * p-value; the why sentence quotes the fields' own numbers.
 */
import type { Catalogue } from '../clean/types.js';
import { qualityNames } from '../clean/types.js';
import type { NongravChecked, NongravParam } from './nongravCheck.js';
import type { Candidate } from './types.js';

export const ARTEFACT_CLASS = 'probable-artefact';

/** Plausibility verdicts that put a flag on the row: the parameter is beyond what a natural body of its size can have. */
const BEYOND_NATURAL = new Set(['artificial-like', 'above-natural', 'too-large']);

const PLAUSIBILITY_WORDS: Record<string, string> = {
  'artificial-like': 'far above natural bodies of this size (a light, hollow, artificial object)',
  'above-natural': 'above natural bodies of this size',
  'too-large': 'too large for a natural body of this size',
  natural: 'within what a natural body of this size can have',
  plausible: 'plausible for a natural body of this size',
  marginal: 'marginal for a natural body of this size',
  'unknown-size': 'no absolute magnitude to judge it by',
  negative: 'negative (a push toward the Sun is not radiation pressure)',
};

const MODEL_WORDS: Record<string, string> = {
  srp: 'radiation pressure', thermal: 'a transverse thermal drift', comet: 'comet-like outgassing accelerations',
};

/** Three significant figures, as check's verdict writes them. */
export function g3(x: number): string {
  return Number.isFinite(x) ? x.toPrecision(3) : String(x);
}

function round(x: number, decimals: number): number {
  const f = 10 ** decimals;
  return Math.round(x * f) / f;
}

function significant(x: number, digits: number): number {
  return Number.isFinite(x) && x !== 0 ? Number(x.toPrecision(digits)) : x;
}

/** 'p = 1.2e-5', or 'p < 1e-300' for a p-value that underflows to 0 (below the smallest double, 5e-324). */
export function pText(p: number): string {
  return p === 0 ? 'p < 1e-300' : `p = ${g3(p)}`;
}

function snr(p: NongravParam): number {
  return p.sigma > 0 ? Math.abs(p.value) / p.sigma : NaN;
}

function paramsText(params: readonly NongravParam[]): string {
  return params.map((p) => `${p.name} = ${g3(p.value)} ± ${g3(p.sigma)} ${p.unit} (S/N ${snr(p).toFixed(1)})`).join(', ');
}

/** The sentence (see the file comment); `tail` and `population` are the candidate's own fields. */
function whyFor(c: NongravChecked, deltaChi2: number, artefact: boolean, tail: number, population: number): string {
  const stats = `Δχ² ${deltaChi2.toFixed(1)} against gravity only, ${pText(c.pValue)}`;
  if (artefact) {
    return `The ${c.preferred} signal (${paramsText(c.params)}; ${stats}) vanishes when station ${c.vanishesWithout.join(', ')} is dropped: `
      + 'a probable data artefact, not thrust.';
  }
  const plaus = c.plausibility === '' ? '' : `, ${PLAUSIBILITY_WORDS[c.plausibility] ?? c.plausibility}`;
  const drift = Number.isFinite(c.driftAuPerMyr) ? ` (da/dt = ${g3(c.driftAuPerMyr)} au/Myr)` : '';
  const count = Math.round(tail * population);
  const loso = c.stationsRefitted.length === 0 ? 'no station held enough observations to be left out'
    : `it persists without each of ${c.stationsRefitted.length} station${c.stationsRefitted.length === 1 ? '' : 's'}`;
  return `${MODEL_WORDS[c.preferred] ?? c.preferred} fits ${c.kept} observations at a weighted RMS of ${c.weightedRmsArcsec.toFixed(3)}″ `
    + `(gravity only ${c.gravityWeightedRmsArcsec.toFixed(3)}″; ${stats}): ${paramsText(c.params)}${drift}${plaus}; ${loso}; `
    + `${count} of the ${population} bodies checked ${count === 1 ? 'has' : 'have'} a Δχ² this large, itself included.`;
}

/** The candidate of catalogue row `k`; `tail` over `population` bodies checked. */
export function nongravCandidate(cat: Catalogue, k: number, c: NongravChecked, tail: number, population: number): Candidate {
  const artefact = c.vanishesWithout.length > 0;
  const deltaChi2 = round(c.deltaChi2, 3);
  const flags: string[] = qualityNames(cat.quality[k]);
  if (artefact) flags.push('nongrav-station-artefact');
  if (BEYOND_NATURAL.has(c.plausibility)) flags.push('nongrav-beyond-natural');
  const details: Record<string, number | string> = {
    model: c.preferred,
    observations: c.observations,
    kept: c.kept,
    rejected: c.rejected,
    delta_chi2: deltaChi2,
    p_value: significant(c.pValue, 6),
    delta_bic: round(c.deltaBic, 3),
    rms_arcsec: round(c.rmsArcsec, 4),
    weighted_rms_arcsec: round(c.weightedRmsArcsec, 4),
    gravity_weighted_rms_arcsec: round(c.gravityWeightedRmsArcsec, 4),
  };
  for (const p of c.params) {
    details[p.name] = significant(p.value, 6);
    details[`${p.name}_sigma`] = significant(p.sigma, 6);
    details[`${p.name}_unit`] = p.unit;
    details[`${p.name}_snr`] = round(snr(p), 2);
  }
  if (Number.isFinite(c.driftAuPerMyr)) details.drift_au_per_myr = significant(c.driftAuPerMyr, 6);
  details.plausibility = c.plausibility === '' ? 'none' : c.plausibility;
  details.stations_left_out = c.stationsRefitted.join(' ');
  details.vanishes_without = c.vanishesWithout.join(' ');
  return {
    designation: cat.designation[k],
    index: k,
    detector: 'nongrav',
    class: artefact ? ARTEFACT_CLASS : c.preferred,
    boundary: artefact,
    score: artefact ? 0 : deltaChi2,
    tailFraction: tail,
    tailPopulation: population,
    falseAlarmProb: c.pValue,
    flags,
    why: whyFor(c, deltaChi2, artefact, tail, population),
    details,
  };
}
