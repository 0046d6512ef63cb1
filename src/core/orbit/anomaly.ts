/**
 * Conversions between mean, eccentric (hyperbolic) and true anomalies, and between time
 * from perihelion and true anomaly, for every conic. Formulas: Danby 1988 ch. 6 (sections from memory) and
 * Meeus 1998 ch. 30, 34, 35, written in half-angle form (tan(ν/2) relations), which keeps
 * precision near e = 1.
 * Conventions: angles in rad, times in days, q in au, mu in au³/day² (any consistent units
 * work). Mean motion n = √(μ / |a|³).
 */
import { GM_SUN_AU3_PER_DAY2 } from '../constants.js';
import { sinhXMinusX, solveBarker, solveKeplerElliptic, solveKeplerHyperbolic, xMinusSinX } from './kepler.js';

/** M = E − e sin E (elliptic), evaluated without cancellation near e = 1. Kepler's equation. */
export function meanFromEccentric(eccentricAnomalyRad: number, e: number): number {
  return (1 - e) * eccentricAnomalyRad + e * xMinusSinX(eccentricAnomalyRad);
}

/** M = e sinh H − H (hyperbolic). */
export function meanFromHyperbolic(hyperbolicAnomaly: number, e: number): number {
  return (e - 1) * hyperbolicAnomaly + e * sinhXMinusX(hyperbolicAnomaly);
}

// Misuse guards: outside its conic the square roots below give NaN (or, at e = 1, a wrong
// finite angle) that would otherwise flow on silently.
function checkElliptic(name: string, e: number): void {
  if (!(e >= 0 && e < 1)) throw new RangeError(`${name}: eccentricity ${e} outside [0, 1)`);
}
function checkHyperbolic(name: string, e: number): void {
  if (!(e > 1)) throw new RangeError(`${name}: eccentricity ${e} outside (1, ∞)`);
}

/** ν from E: tan(ν/2) = √((1+e)/(1−e)) tan(E/2). Danby 1988 ch. 6. */
export function trueFromEccentric(eccentricAnomalyRad: number, e: number): number {
  checkElliptic('trueFromEccentric', e);
  const turns = Math.round(eccentricAnomalyRad / (2 * Math.PI)) * 2 * Math.PI;
  const h = 0.5 * (eccentricAnomalyRad - turns);
  return 2 * Math.atan2(Math.sqrt(1 + e) * Math.sin(h), Math.sqrt(1 - e) * Math.cos(h)) + turns;
}

/** E from ν (elliptic), same revolution. */
export function eccentricFromTrue(trueAnomalyRad: number, e: number): number {
  checkElliptic('eccentricFromTrue', e);
  const turns = Math.round(trueAnomalyRad / (2 * Math.PI)) * 2 * Math.PI;
  const h = 0.5 * (trueAnomalyRad - turns);
  return 2 * Math.atan2(Math.sqrt(1 - e) * Math.sin(h), Math.sqrt(1 + e) * Math.cos(h)) + turns;
}

/** ν from H: tan(ν/2) = √((e+1)/(e−1)) tanh(H/2). Danby 1988 ch. 6. */
export function trueFromHyperbolic(hyperbolicAnomaly: number, e: number): number {
  checkHyperbolic('trueFromHyperbolic', e);
  return 2 * Math.atan(Math.sqrt((e + 1) / (e - 1)) * Math.tanh(0.5 * hyperbolicAnomaly));
}

/** H from ν (|ν| below the asymptote angle acos(−1/e), else RangeError). */
export function hyperbolicFromTrue(trueAnomalyRad: number, e: number): number {
  checkHyperbolic('hyperbolicFromTrue', e);
  const h = 0.5 * trueAnomalyRad;
  const t = (Math.sqrt(e - 1) * Math.sin(h)) / (Math.sqrt(e + 1) * Math.cos(h));
  if (!(Math.abs(t) < 1)) {
    throw new RangeError(`hyperbolicFromTrue: ν=${trueAnomalyRad} rad is beyond the asymptote of e=${e}`);
  }
  return 2 * Math.atanh(t);
}

/** ν from M for e < 1 (Kepler) or e > 1 (hyperbolic Kepler). Not for e = 1: use time. */
export function trueFromMean(meanAnomalyRad: number, e: number): number {
  if (e < 1) return trueFromEccentric(solveKeplerElliptic(meanAnomalyRad, e), e);
  if (e > 1) return trueFromHyperbolic(solveKeplerHyperbolic(meanAnomalyRad, e), e);
  throw new RangeError(`trueFromMean: e=${e} has no mean anomaly (e = 1: use trueAnomalyFromPerihelionTime)`);
}

/** M from ν for e < 1 or e > 1. */
export function meanFromTrue(trueAnomalyRad: number, e: number): number {
  if (e < 1) return meanFromEccentric(eccentricFromTrue(trueAnomalyRad, e), e);
  if (e > 1) return meanFromHyperbolic(hyperbolicFromTrue(trueAnomalyRad, e), e);
  throw new RangeError(`meanFromTrue: e=${e} has no mean anomaly (e = 1: use perihelionTimeOffsetDays)`);
}

function checkConic(name: string, qAu: number, e: number, mu: number): void {
  if (!Number.isFinite(qAu) || !Number.isFinite(e) || !Number.isFinite(mu)) {
    throw new RangeError(`${name}: non-finite q=${qAu}, e=${e}, mu=${mu}`);
  }
  if (!(qAu > 0)) throw new RangeError(`${name}: perihelion distance q=${qAu} must be > 0`);
  if (!(e >= 0)) throw new RangeError(`${name}: eccentricity e=${e} must be ≥ 0`);
  if (!(mu > 0)) throw new RangeError(`${name}: mu=${mu} must be > 0`);
}

/**
 * Time from perihelion to true anomaly ν (days; negative before perihelion), any e.
 * Elliptic: t − T = M/n with a = q/(1−e); hyperbolic likewise with |a| = q/(e−1);
 * parabolic: Barker, t − T = √(2q³/μ)(D + D³/3), D = tan(ν/2) (Meeus 1998 ch. 34).
 */
export function perihelionTimeOffsetDays(trueAnomalyRad: number, qAu: number, e: number, mu = GM_SUN_AU3_PER_DAY2): number {
  checkConic('perihelionTimeOffsetDays', qAu, e, mu);
  if (e === 1) {
    const d = Math.tan(0.5 * trueAnomalyRad);
    return Math.sqrt((2 * qAu * qAu * qAu) / mu) * (d + (d * d * d) / 3);
  }
  const aAbs = qAu / Math.abs(1 - e);
  return meanFromTrue(trueAnomalyRad, e) * Math.sqrt((aAbs * aAbs * aAbs) / mu);
}

/** True anomaly (rad) at `dtDays` after perihelion, any e, by Kepler's or Barker's equation. */
export function trueAnomalyFromPerihelionTime(dtDays: number, qAu: number, e: number, mu = GM_SUN_AU3_PER_DAY2): number {
  checkConic('trueAnomalyFromPerihelionTime', qAu, e, mu);
  if (!Number.isFinite(dtDays)) throw new RangeError(`trueAnomalyFromPerihelionTime: non-finite dt=${dtDays}`);
  if (e === 1) return 2 * Math.atan(solveBarker(Math.sqrt(mu / (2 * qAu * qAu * qAu)) * dtDays));
  const aAbs = qAu / Math.abs(1 - e);
  return trueFromMean(dtDays * Math.sqrt(mu / (aAbs * aAbs * aAbs)), e);
}

/** Mean motion n = √(μ/|a|³), rad/day. Kepler's third law. */
export function meanMotionRadPerDay(aAu: number, mu = GM_SUN_AU3_PER_DAY2): number {
  const aa = Math.abs(aAu);
  return Math.sqrt(mu / (aa * aa * aa));
}

/** Mean anomaly at `epochJd` from the perihelion time: M = n (t − T). */
export function meanAnomalyFromPerihelionTime(tpJd: number, epochJd: number, aAu: number, mu = GM_SUN_AU3_PER_DAY2): number {
  return meanMotionRadPerDay(aAu, mu) * (epochJd - tpJd);
}

/** Perihelion time from the mean anomaly at `epochJd`: T = t − M/n. */
export function perihelionTimeFromMeanAnomaly(meanAnomalyRad: number, epochJd: number, aAu: number, mu = GM_SUN_AU3_PER_DAY2): number {
  return epochJd - meanAnomalyRad / meanMotionRadPerDay(aAu, mu);
}
