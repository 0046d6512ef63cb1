/**
 * Chebyshev coefficients of a Poisson series (poissonSeries.ts) on many consecutive equal
 * segments at once, without evaluating a cosine per term per sample.
 *
 * On a segment with midpoint t_m and half-length h, write t = t_m + h x (x in [−1, 1]) and
 * linearise each phase at t_m: φ(t) ≈ φ_m + ω x, ω = φ'(t_m) h (exact for linear phases).
 * The Jacobi–Anger expansions (Abramowitz & Stegun 1964, eqs. 9.1.44 and 9.1.45)
 *   cos(ω x) = J_0(ω) + 2 Σ_{i≥1} (−1)^i J_{2i}(ω) T_{2i}(x),
 *   sin(ω x) = 2 Σ_{i≥0} (−1)^i J_{2i+1}(ω) T_{2i+1}(x)
 * give cos(φ_m + ω x) = cos φ_m cos(ω x) − sin φ_m sin(ω x) as a Chebyshev series whose
 * coefficients are g_j · cos φ_m (j even) or g_j · sin φ_m (j odd), with g_j fixed by A, ω and
 * the Bessel values J_j(ω) (besselJ.ts). From one segment to the next only φ_m moves, so
 * cos φ_m and sin φ_m advance by a rotation (the angle-addition recurrence, e.g. Numerical
 * Recipes 3rd ed. §5.4, eq. 5.4.6), restarted from Math.cos/Math.sin at every chunk so the
 * rounding drift stays at a few ulps per step. For quartic phases (ELP/MPP02) the rotation
 * angle itself rotates by the second difference of the phase (exact for a quadratic; the
 * cubic remainder is bounded below in `PhaseNotes`). Loop order: terms outer, segments and
 * coefficients inner, so one term's constants stay in registers.
 *
 * PhaseNotes (quartic phases; ELP/MPP02 has |φ2| ≤ 1e-3 rad/cy², |φ3| ≤ 1.5e-6 rad/cy³,
 * measured from the packed series): the neglected curvature inside a 16-day segment is
 * ≤ |φ''| h² / 2 ≈ 5e-11 rad, the use of one ω per chunk ≤ |φ''| (chunk/2) h ≈ 1e-8 rad, and
 * the cubic drift of the recurrence over 64 segments ≈ |φ'''| Δ³ 64³/6 ≈ 4e-11 rad; times
 * the Moon's largest term (0.11 rad of longitude ≈ 4e4 km) divided by 82.3 for the
 * Earth–Moon barycentre that is ≤ 1e-8 km.
 */
import { besselJSequence, besselMillerStart } from './besselJ.js';
import type { PoissonSeries } from './poissonSeries.js';

/** What a plan keeps of a series: per-term coefficient counts and fixed factors. */
export interface PoissonChebyshevPlan {
  readonly series: PoissonSeries;
  /** Coefficient slots per segment and block (even). */
  readonly slots: number;
  /** Segment half-length in the series' time unit. */
  readonly halfSegment: number;
  /** Coefficients kept for term k (even, 0 = term dropped), ≤ slots. */
  readonly kept: Int32Array;
  /** Start order of Miller's recurrence for term k. */
  readonly millerStart: Int32Array;
  /** Linear phases only: g_j of term k at gOffset[k] (ω is the same on every segment). */
  readonly g: Float64Array | null;
  readonly gOffset: Int32Array;
  /** Worst-case bound of the dropped coefficients, per variable (series units × weight). */
  readonly droppedBound: Float64Array;
  readonly termsKept: number;
}

export interface PoissonPlanOptions {
  /** Coefficient slots per segment (rounded up to even). */
  slots: number;
  /** Segment length in days. */
  segmentDays: number;
  /** Span covered, series time units (for ω of quartic phases and |t|^α bounds). */
  tMin: number;
  tMax: number;
  /** Per variable: size in the output unit (au) of one unit of that variable. */
  variableWeight: ArrayLike<number>;
  /** Budget for the sum of all dropped coefficient bounds, in the output unit (au). */
  budget: number;
}

/** |φ'(t)| of term k at t. */
function phaseRate(s: PoissonSeries, k: number, t: number): number {
  const d = s.phaseDegree;
  const base = k * (d + 1);
  let r = 0;
  for (let i = d; i >= 1; i--) r = r * t + i * s.phase[base + i];
  return r;
}

/**
 * Decide, once per series and segment length, how many Chebyshev coefficients each term
 * keeps. Bound of coefficient j of term k in a variable of weight W at power α:
 * b_kj = W |t|max^α |A_k| (2 − δ_j0) |J_j(ω_k)|; each term keeps the shortest prefix whose
 * dropped tail is ≤ δ, with δ the largest value (bisection in log δ) for which the sum of
 * all dropped tails stays within `budget`. Terms whose whole bound is ≤ δ are dropped.
 * Coefficients past `slots` are the segment's truncation, not counted here.
 */
export function planPoissonChebyshev(series: PoissonSeries, opts: PoissonPlanOptions): PoissonChebyshevPlan {
  const slots = opts.slots + (opts.slots & 1);
  const halfSegment = (0.5 * opts.segmentDays) / series.daysPerUnit;
  const count = series.amplitude.length;
  const tAbs = Math.max(Math.abs(opts.tMin), Math.abs(opts.tMax), 1e-12);
  const tMid = 0.5 * (opts.tMin + opts.tMax);
  const tails = new Float64Array(count * (slots + 1)); // tails[k*(slots+1)+m] = Σ_{j≥m} b_kj
  const omega = new Float64Array(count);
  const bessel = new Float64Array(slots);
  const variableOf = new Int32Array(count);
  for (let v = 0; v < series.variables; v++) {
    for (let alpha = 0; alpha < series.powers; alpha++) {
      const w = opts.variableWeight[v] * tAbs ** alpha;
      const first = series.blockStart[v * series.powers + alpha];
      const last = series.blockStart[v * series.powers + alpha + 1];
      for (let k = first; k < last; k++) {
        variableOf[k] = v;
        omega[k] = halfSegment * Math.max(
          phaseRate(series, k, opts.tMin), phaseRate(series, k, tMid), phaseRate(series, k, opts.tMax),
          -phaseRate(series, k, opts.tMin), -phaseRate(series, k, tMid), -phaseRate(series, k, opts.tMax),
        );
        besselJSequence(omega[k], slots, bessel);
        const scale = w * Math.abs(series.amplitude[k]);
        const row = k * (slots + 1);
        for (let j = slots - 1; j >= 0; j--) {
          tails[row + j] = tails[row + j + 1] + scale * (j === 0 ? 1 : 2) * Math.abs(bessel[j]);
        }
      }
    }
  }
  const delta = chooseThreshold(tails, count, slots, opts.budget);
  const kept = new Int32Array(count);
  const droppedBound = new Float64Array(series.variables);
  let termsKept = 0;
  for (let k = 0; k < count; k++) {
    const row = k * (slots + 1);
    let m = 0;
    while (tails[row + m] > delta) m++;
    m += m & 1;
    kept[k] = m;
    droppedBound[variableOf[k]] += tails[row + m];
    if (m > 0) termsKept++;
  }
  const millerStart = new Int32Array(count);
  for (let k = 0; k < count; k++) millerStart[k] = besselMillerStart(omega[k], Math.max(kept[k], 1));
  const plan = { series, slots, halfSegment, kept, millerStart, droppedBound, termsKept };
  return series.phaseDegree === 1 ? { ...plan, ...linearFactors(series, kept, millerStart, halfSegment, slots) }
    : { ...plan, g: null, gOffset: new Int32Array(0) };
}

/** Largest δ (bisection in log δ, 60 steps) with Σ_k tail_k(m_k(δ)) ≤ budget. */
function chooseThreshold(tails: Float64Array, count: number, slots: number, budget: number): number {
  if (!(budget > 0)) return 0;
  const dropped = (delta: number): number => {
    let sum = 0;
    for (let k = 0; k < count; k++) {
      const row = k * (slots + 1);
      let m = 0;
      while (tails[row + m] > delta) m++;
      m += m & 1; // slots are kept in pairs
      sum += tails[row + m];
    }
    return sum;
  };
  let lo = Math.log(budget * 1e-12);
  let hi = Math.log(budget);
  if (dropped(Math.exp(hi)) <= budget) return Math.exp(hi);
  for (let it = 0; it < 60; it++) {
    const mid = 0.5 * (lo + hi);
    if (dropped(Math.exp(mid)) <= budget) lo = mid;
    else hi = mid;
  }
  return Math.exp(lo);
}

/** g_j = A (2 − δ_j0) s_j J_j(ω), s_j = (−1)^i for j = 2i and −(−1)^i for j = 2i + 1. */
function fillFactors(amplitude: number, omega: number, m: number, start: number, bessel: Float64Array, g: Float64Array, at: number): void {
  besselJSequence(omega, m, bessel, start);
  for (let j = 0; j < m; j++) {
    const i = j >> 1;
    const sign = (j & 1) === 0 ? ((i & 1) === 0 ? 1 : -1) : ((i & 1) === 0 ? -1 : 1);
    g[at + j] = amplitude * (j === 0 ? 1 : 2) * sign * bessel[j];
  }
}

function linearFactors(s: PoissonSeries, kept: Int32Array, millerStart: Int32Array, halfSegment: number, slots: number) {
  const gOffset = new Int32Array(kept.length);
  let total = 0;
  for (let k = 0; k < kept.length; k++) {
    gOffset[k] = total;
    total += kept[k];
  }
  const g = new Float64Array(total);
  const bessel = new Float64Array(Math.max(2, slots));
  for (let k = 0; k < kept.length; k++) {
    if (kept[k] > 0) fillFactors(s.amplitude[k], s.phase[2 * k + 1] * halfSegment, kept[k], millerStart[k], bessel, g, gOffset[k]);
  }
  return { g, gOffset };
}

/** Scratch for quartic-phase factors; the functions here are synchronous, not recursive. */
let gScratch = new Float64Array(64);
let besselScratch = new Float64Array(64);
const taylor = new Float64Array(8);

/** Taylor coefficients q_r = φ^(r)(t)/r! of term k's phase at t into `taylor`. */
function phaseTaylor(s: PoissonSeries, k: number, t: number): void {
  const d = s.phaseDegree;
  const base = k * (d + 1);
  for (let i = 0; i <= d; i++) taylor[i] = s.phase[base + i];
  // Repeated synthetic division (Horner's scheme for the Taylor shift; common practice).
  for (let r = 0; r <= d; r++) {
    for (let i = d - 1; i >= r; i--) taylor[i] += t * taylor[i + 1];
  }
}

/**
 * Chebyshev coefficients, on `count` consecutive segments whose first midpoint is t0 (series
 * units) and whose spacing is 2·halfSegment, of every block (variable v, power α) of the
 * series without its t^α factor: acc[((v*powers+α)*count + s)*slots + j].
 */
export function poissonChunkCoefficients(plan: PoissonChebyshevPlan, t0: number, count: number, acc: Float64Array): void {
  const s = plan.series;
  const slots = plan.slots;
  const blocks = s.variables * s.powers;
  if (acc.length < blocks * count * slots) {
    throw new RangeError(`poissonChunkCoefficients: accumulator of ${acc.length} < ${blocks * count * slots}`);
  }
  acc.fill(0, 0, blocks * count * slots);
  const dt = 2 * plan.halfSegment;
  const quartic = s.phaseDegree > 1;
  if (gScratch.length < slots) {
    gScratch = new Float64Array(slots);
    besselScratch = new Float64Array(slots);
  }
  const tCentre = t0 + 0.5 * (count - 1) * dt;
  for (let b = 0; b < blocks; b++) {
    const accBase = b * count * slots;
    for (let k = s.blockStart[b]; k < s.blockStart[b + 1]; k++) {
      const m = plan.kept[k];
      if (m === 0) continue;
      let g: Float64Array;
      let gAt: number;
      let step: number; // φ(t0 + dt) − φ(t0)
      let second = 0; // second difference of φ at t0
      let phi0: number;
      if (quartic) {
        fillFactors(s.amplitude[k], phaseRate(s, k, tCentre) * plan.halfSegment, m, plan.millerStart[k], besselScratch, gScratch, 0);
        g = gScratch;
        gAt = 0;
        phaseTaylor(s, k, t0);
        phi0 = taylor[0];
        step = 0;
        for (let r = s.phaseDegree; r >= 1; r--) step = (step + taylor[r]) * dt; // Σ_{r≥1} q_r dt^r
        let p = dt * dt;
        for (let r = 2; r <= s.phaseDegree; r++, p *= dt) second += taylor[r] * p * (2 ** r - 2);
      } else {
        g = plan.g as Float64Array;
        gAt = plan.gOffset[k];
        phi0 = s.phase[2 * k] + s.phase[2 * k + 1] * t0;
        step = s.phase[2 * k + 1] * dt;
      }
      let c = Math.cos(phi0);
      let sn = Math.sin(phi0);
      if (s.sine) {
        const t = c; // sin φ = cos(φ − π/2): (cos, sin) → (sin φ, −cos φ)
        c = sn;
        sn = -t;
      }
      let cd = Math.cos(step);
      let sd = Math.sin(step);
      const cq = Math.cos(second);
      const sq = Math.sin(second);
      for (let seg = 0; seg < count; seg++) {
        const o = accBase + seg * slots;
        for (let j = 0; j < m; j += 2) {
          acc[o + j] += g[gAt + j] * c;
          acc[o + j + 1] += g[gAt + j + 1] * sn;
        }
        const cNext = c * cd - sn * sd;
        sn = sn * cd + c * sd;
        c = cNext;
        if (quartic) {
          const cdNext = cd * cq - sd * sq;
          sd = sd * cq + cd * sq;
          cd = cdNext;
        }
      }
    }
  }
}
