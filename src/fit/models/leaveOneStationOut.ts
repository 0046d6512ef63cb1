/**
 * Leave-one-station-out: refit with each station's observations dropped in turn and watch one
 * non-gravitational parameter (A2, A/m, ...). A signal that one station's astrometry carries
 * (a bias, a timing error) vanishes when that station is dropped.
 *
 * The refit itself is the caller's (a callback); this driver asks for the refits in the order
 * the stations are given, one at a time, and judges each by a stated rule:
 *   vanishes when station X is dropped  ⇔  the full fit's S/N ≥ minSignalToNoise and either the
 *   refit's S/N < minSignalToNoise, or the value moves by more than maxShiftSigma × σ_full
 *   (σ_full the full fit's 1σ). Defaults 3 and 3 (common practice: S/N ≥ 3 counts as a detection,
 *   e.g. Farnocchia et al. 2013, Icarus 224, 1).
 */

/** The watched parameter of one fit. */
export interface ParameterEstimate {
  value: number;
  /** 1σ. */
  sigma: number;
}

/** Refit without one station's observations; null (or a throw) when the refit failed. */
export type StationRefit = (droppedStation: string) => ParameterEstimate | null | Promise<ParameterEstimate | null>;

export interface LeaveOneStationOutOptions {
  /** Default 3. */
  minSignalToNoise?: number;
  /** Default 3. */
  maxShiftSigma?: number;
}

export type StationDropVerdict = 'vanishes' | 'persists' | 'refit-failed' | 'no-signal-to-test';

export interface StationDropResult {
  station: string;
  value: number;
  sigma: number;
  signalToNoise: number;
  /** (value − value_full)/σ_full. */
  shiftSigma: number;
  verdict: StationDropVerdict;
  /** One sentence with the numbers. */
  why: string;
  /** The refit's error message when it threw; '' otherwise. */
  error: string;
}

export interface LeaveOneStationOutResult {
  full: ParameterEstimate & { signalToNoise: number };
  drops: StationDropResult[];
  /** Stations whose removal makes the signal vanish, in the order given. */
  vanishesWithout: string[];
  rule: string;
}

function snr(e: ParameterEstimate): number {
  return e.sigma > 0 && Number.isFinite(e.sigma) ? Math.abs(e.value) / e.sigma : NaN;
}

function g3(x: number): string {
  return Number.isFinite(x) ? x.toPrecision(3) : String(x);
}

function judge(station: string, full: ParameterEstimate, fullSnr: number, fit: ParameterEstimate,
  minSnr: number, maxShift: number): StationDropResult {
  const s = snr(fit);
  const shiftSigma = (fit.value - full.value) / full.sigma;
  const base = { station, value: fit.value, sigma: fit.sigma, signalToNoise: s, shiftSigma, error: '' };
  if (!(fullSnr >= minSnr)) {
    return { ...base, verdict: 'no-signal-to-test', why: `the full fit's S/N ${g3(fullSnr)} is below ${minSnr}: nothing to lose` };
  }
  if (!(s >= minSnr)) {
    return { ...base, verdict: 'vanishes', why: `vanishes when station ${station} is dropped: S/N ${g3(fullSnr)} → ${g3(s)} (< ${minSnr})` };
  }
  if (Math.abs(shiftSigma) > maxShift) {
    return { ...base, verdict: 'vanishes', why: `vanishes when station ${station} is dropped: the value moves by ${g3(shiftSigma)} σ (> ${maxShift} σ)` };
  }
  return { ...base, verdict: 'persists', why: `persists without station ${station}: S/N ${g3(s)}, moved ${g3(shiftSigma)} σ` };
}

/** Runs the refits, one station at a time in the order given, and judges each. */
export async function leaveOneStationOut(stations: readonly string[], full: ParameterEstimate, refit: StationRefit,
  options: LeaveOneStationOutOptions = {}): Promise<LeaveOneStationOutResult> {
  const minSnr = options.minSignalToNoise ?? 3;
  const maxShift = options.maxShiftSigma ?? 3;
  if (!(minSnr > 0) || !(maxShift > 0)) throw new RangeError(`leaveOneStationOut: bad thresholds ${minSnr}, ${maxShift}`);
  if (!Number.isFinite(full.value) || !(full.sigma > 0) || !Number.isFinite(full.sigma)) {
    throw new RangeError(`leaveOneStationOut: the full fit needs a finite value and σ > 0, got ${full.value} ± ${full.sigma}`);
  }
  if (new Set(stations).size !== stations.length) throw new RangeError('leaveOneStationOut: a station is listed twice');
  const fullSnr = snr(full);
  const drops: StationDropResult[] = [];
  for (const station of stations) {
    let fit: ParameterEstimate | null = null;
    let error = '';
    try {
      fit = await refit(station);
    } catch (e) {
      error = e instanceof Error ? e.message : String(e);
    }
    if (fit === null || !Number.isFinite(fit.value) || !(fit.sigma > 0)) {
      drops.push({
        station, value: NaN, sigma: NaN, signalToNoise: NaN, shiftSigma: NaN, verdict: 'refit-failed', error,
        why: `the refit without station ${station} failed${error ? `: ${error}` : ''}`,
      });
      continue;
    }
    drops.push(judge(station, full, fullSnr, fit, minSnr, maxShift));
  }
  return {
    full: { ...full, signalToNoise: fullSnr },
    drops,
    vanishesWithout: drops.filter((d) => d.verdict === 'vanishes').map((d) => d.station),
    rule: `vanishes when a station is dropped: full S/N ≥ ${minSnr} and, without it, S/N < ${minSnr} or a shift > ${maxShift} σ_full`,
  };
}
