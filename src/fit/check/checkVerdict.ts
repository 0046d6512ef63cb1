/**
 * The verdict of `check`: one plain sentence (two when a caveat follows) from the comparison,
 * the guards and the plausibility, with the numbers they rest on. Screening language: a
 * preferred model is "detected" in these data, never more; a signal that leaves with one
 * station is called a probable data artefact. Caveats: a station whose residuals sit off zero
 * (stationMeans' `biased`), residual signs that run in long stretches (runs test, one-sided
 * tail below RUNS_P_THRESHOLD in either coordinate).
 */
import type { ModelComparison, ModelComparisonRow } from '../models/index.js';
import type { CheckGuards, CheckModelFit, CheckPlausibility } from './types.js';

/** Below this the runs test's tail of too few runs is reported as a caveat: the two-sided Gaussian 3σ level (common practice). */
export const RUNS_P_THRESHOLD = 0.0027;

export interface VerdictInput {
  comparison: ModelComparison;
  fits: readonly CheckModelFit[];
  guards: CheckGuards;
  plausibility: CheckPlausibility;
}

function g3(x: number): string {
  return Number.isFinite(x) ? x.toPrecision(3) : String(x);
}

function snr(p: { value: number; sigma: number }): string {
  return (Math.abs(p.value) / p.sigma).toFixed(1);
}

/** The best alternative to gravity: the smallest p-value among the other models. */
function bestAlternative(c: ModelComparison): ModelComparisonRow | null {
  const rows = c.rows.filter((r) => r.id !== 'gravity');
  return rows.length === 0 ? null : rows.reduce((a, b) => (b.pValue < a.pValue ? b : a));
}

function gravitySentence(input: VerdictInput): string {
  const g = input.fits.find((f) => f.id === 'gravity')!;
  const head = `No non-gravitational acceleration is needed: gravity alone fits ${g.kept} observations at a weighted RMS of ${g.weightedRmsArcsec.toFixed(3)}″`
    + ` (χ² ${g.chi2.toFixed(1)} for ${g.nResiduals} residuals)`;
  const alt = bestAlternative(input.comparison);
  if (alt === null) return `${head}; no other model was fitted.`;
  const why = alt.eligible ? `but BIC rises by ${g3(alt.deltaBic)}` : `not below the threshold`;
  return `${head}; the best alternative, ${alt.id}, lowers χ² by ${g3(alt.deltaChiSquare)} (p = ${g3(alt.pValue)}, ${why}).`;
}

/** The preferred model's parameters in words. */
function signalText(f: CheckModelFit, plaus: CheckPlausibility): string {
  if (f.id === 'srp') {
    const p = f.params[0];
    return `C_R·A/m = ${g3(p.value)} ± ${g3(p.sigma)} m²/kg (C_R = ${plaus.srp?.assumedCR ?? 1} assumed), S/N ${snr(p)}`;
  }
  if (f.id === 'thermal') {
    const p = f.params[0];
    const t = plaus.thermal;
    const drift = t ? `, da/dt = ${g3(t.driftAuPerMyr)} ± ${g3(t.driftSigmaAuPerMyr)} au/Myr` : '';
    return `A2 = ${g3(p.value)} ± ${g3(p.sigma)} au/d²${drift}, S/N ${snr(p)}`;
  }
  return f.params.map((p) => `${p.name} = ${g3(p.value)} ± ${g3(p.sigma)} au/d² (S/N ${snr(p)})`).join(', ');
}

const SRP_WORDS: Record<string, string> = {
  'artificial-like': 'far above natural bodies of this size — the signature of a light, hollow, artificial object',
  'above-natural': 'above natural bodies of this size: only a body smaller or lighter than assumed',
  natural: 'within what a natural body of this size can have',
  'unknown-size': 'no absolute magnitude to judge it against natural bodies',
  negative: 'negative: a push toward the Sun is not radiation pressure',
};

const DRIFT_WORDS: Record<string, string> = {
  plausible: 'plausible for a natural body of this size',
  marginal: 'marginal for a natural body of this size',
  'too-large': 'too large for a natural body of this size',
  'unknown-size': 'no absolute magnitude to judge it against natural bodies',
};

function detectedSentence(f: CheckModelFit, input: VerdictInput): string {
  const signal = signalText(f, input.plausibility);
  const loso = input.guards.leaveOneStationOut;
  const names: Record<string, string> = { srp: 'The radiation-pressure signal', thermal: 'The transverse drift', comet: 'The comet-like acceleration' };
  if (loso !== null && loso.vanishesWithout.length > 0) {
    const who = loso.vanishesWithout.join(', ');
    return `${names[f.id]} (${signal}) vanishes when station ${who} is dropped: a probable data artefact, not thrust.`;
  }
  if (f.id === 'srp') {
    const j = input.plausibility.srp!.judgement;
    return `Radiation pressure detected: ${signal}, ${SRP_WORDS[j.verdict]}.`;
  }
  if (f.id === 'thermal') {
    const j = input.plausibility.thermal?.judgement;
    return `A transverse thermal drift is detected: ${signal}${j ? `, ${DRIFT_WORDS[j.verdict]}` : ''}.`;
  }
  return `Comet-like outgassing accelerations are detected: ${signal}.`;
}

function caveats(g: CheckGuards): string[] {
  const out: string[] = [];
  const biased = g.stationMeans.stations.filter((s) => s.biased);
  if (biased.length > 0) {
    out.push(`The residuals of station ${biased.map((s) => `${s.station} (p = ${g3(s.pValueAllStations)} over all stations)`).join(', ')} sit off zero: check that astrometry.`);
  }
  const runs = [['α cos δ', g.runsRaCosDec], ['δ', g.runsDec]] as const;
  const long = runs.filter(([, r]) => r.pFewRunsNormal < RUNS_P_THRESHOLD);
  if (long.length > 0) {
    out.push(`The ${g.model} residuals still run in long stretches of one sign (runs test, ${long.map(([c, r]) => `${c} p = ${g3(r.pFewRunsNormal)}`).join(', ')}): a signature no model here removes.`);
  }
  return out;
}

/** The verdict (see the file comment). */
export function checkVerdict(input: VerdictInput): string {
  const preferred = input.comparison.preferred;
  const f = input.fits.find((x) => x.id === preferred);
  if (f === undefined) throw new RangeError(`checkVerdict: no fit of the preferred model '${preferred}'`);
  const first = preferred === 'gravity' ? gravitySentence(input) : detectedSentence(f, input);
  return [first, ...caveats(input.guards)].join(' ');
}
