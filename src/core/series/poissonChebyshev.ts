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
 * cos φ_m and sin φ_m advance by a rotation (the angle-addition recurrence; Numerical Recipes
 * 3rd ed., section on recurrence relations, from memory), restarted from Math.cos/Math.sin
 * at every chunk so the rounding drift stays at a few ulps per step. For quartic phases
 * (ELP/MPP02) the rotation angle itself rotates by the second difference of the phase (exact
 * for a quadratic; the cubic remainder is bounded below in `PhaseNotes`). Loop order: terms
 * outer, segments and coefficients inner, so one term's constants stay in registers.
 * Long-period terms may be expanded on groups of consecutive segments instead (levels), which
 * costs one rotation per group; the caller evaluates each group's series on its segments.
 *
 * PhaseNotes (quartic phases; ELP/MPP02 has |φ2| ≤ 1e-3 rad/cy², |φ3| ≤ 1.5e-6 rad/cy³,
 * measured from the packed series; figures for 16-day segments in groups of 8, 64 per
 * chunk): the neglected curvature inside a 128-day group is ≤ |φ''| h²/2 ≈ 3e-9 rad; taking
 * ω at the chunk's centre ≤ |φ''| (chunk/2) h ≈ 5e-8 rad; the cubic drift of the recurrence
 * over a chunk ≈ |φ'''| Δ³ S³/6 ≈ 4e-11 rad. Times the Moon's largest term (0.11 rad of
 * longitude ≈ 4e4 km) divided by 82.3 for the Earth–Moon barycentre: ≤ 3e-5 km (2e-13 au).
 */
import { besselJSequence } from './besselJ.js';
import type { PoissonSeries } from './poissonSeries.js';

/** One level of segment grouping: `group` consecutive cache segments share one expansion. */
export interface PoissonLevel {
  readonly group: number;
  /** Coefficient slots per (grouped) segment and block (even). */
  readonly slots: number;
  /** Half-length of a grouped segment in the series' time unit. */
  readonly halfSegment: number;
}

/** What a plan keeps of a series: per-term level, coefficient counts and fixed factors. */
export interface PoissonChebyshevPlan {
  readonly series: PoissonSeries;
  readonly levels: readonly PoissonLevel[];
  /** Level of term k (index into levels). */
  readonly level: Uint8Array;
  /** Coefficients kept for term k (even, 0 = term dropped), ≤ its level's slots. */
  readonly kept: Int32Array;
  /** g_j of term k at gOffset[k], at ω0 = φ'(tRef)·h of its level (exact for linear phases). */
  readonly g: Float64Array;
  readonly gOffset: Int32Array;
  /** Quartic phases only: dg_j/dω at ω0 (same layout as g), and ω0 per term. */
  readonly dg: Float64Array | null;
  readonly omega0: Float64Array;
  /** Worst-case bound of the dropped coefficients, per variable (output unit, au). */
  readonly droppedBound: Float64Array;
  readonly termsKept: number;
  /** Terms kept per level. */
  readonly termsPerLevel: Int32Array;
}

export interface PoissonPlanOptions {
  /**
   * Grouping levels, the first with group 1 (the cache's own segments). A term goes to the
   * level where its work per cache segment, (2 + m/2) / group for m kept coefficients (a
   * rotation step counted as two coefficient-pair updates; an estimate), is least, among
   * the levels whose slots hold all its non-negligible coefficients.
   */
  levels: ReadonlyArray<{ group: number; slots: number }>;
  /** Cache segment length in days. */
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

/** Extra Bessel orders computed past a level's slots to see what the slots would cut off. */
const BEYOND = 8;

/**
 * Decide, once per series and segment grid, where each term is expanded and how many
 * Chebyshev coefficients it keeps. Bound of coefficient j of term k in a variable of weight
 * W at power α: b_kj = W |t|max^α |A_k| (2 − δ_j0) |J_j(ω_k)| (|T_j| ≤ 1 on [−1, 1]).
 * Pass 1 picks each term's level at the nominal per-term threshold δ0 = budget / terms;
 * pass 2 keeps, per term, the shortest prefix whose dropped tail is ≤ δ, with δ the largest
 * value (bisection in log δ) for which the sum of all dropped tails stays within `budget`.
 * Terms whose whole bound is ≤ δ are dropped. At the first level, coefficients past the
 * slots are the cache segment's own truncation (as when sampling at the nodes) and are not
 * counted; a grouped level is only chosen when what its slots cut off is ≤ δ0 / 100.
 */
export function planPoissonChebyshev(series: PoissonSeries, opts: PoissonPlanOptions): PoissonChebyshevPlan {
  if (opts.levels.length < 1 || opts.levels[0].group !== 1 || opts.levels.length > 255) {
    throw new RangeError('planPoissonChebyshev: levels must start with group 1');
  }
  const levels: PoissonLevel[] = opts.levels.map((l) => ({
    group: l.group, slots: l.slots + (l.slots & 1), halfSegment: (0.5 * l.group * opts.segmentDays) / series.daysPerUnit,
  }));
  const count = series.amplitude.length;
  const maxSlots = Math.max(...levels.map((l) => l.slots));
  const tAbs = Math.max(Math.abs(opts.tMin), Math.abs(opts.tMax), 1e-12);
  const tMid = 0.5 * (opts.tMin + opts.tMax);
  const weight = new Float64Array(count); // W |t|max^α |A_k|
  const rate = new Float64Array(count); // max |φ'| over the span
  const variableOf = new Int32Array(count);
  for (let v = 0; v < series.variables; v++) {
    for (let alpha = 0; alpha < series.powers; alpha++) {
      const w = opts.variableWeight[v] * tAbs ** alpha;
      for (let k = series.blockStart[v * series.powers + alpha]; k < series.blockStart[v * series.powers + alpha + 1]; k++) {
        variableOf[k] = v;
        weight[k] = w * Math.abs(series.amplitude[k]);
        rate[k] = Math.max(
          Math.abs(phaseRate(series, k, opts.tMin)), Math.abs(phaseRate(series, k, tMid)), Math.abs(phaseRate(series, k, opts.tMax)),
        );
      }
    }
  }
  const level = chooseLevels(levels, weight, rate, opts.budget / Math.max(1, count));
  // Pass 2: tails at each term's level; tails[k*(maxSlots+1)+m] = Σ_{m≤j<slots} b_kj.
  const tails = new Float64Array(count * (maxSlots + 1));
  const bessel = new Float64Array(maxSlots);
  const rowEnd = new Int32Array(count);
  for (let k = 0; k < count; k++) {
    const lv = levels[level[k]];
    besselJSequence(rate[k] * lv.halfSegment, lv.slots, bessel);
    const row = k * (maxSlots + 1);
    rowEnd[k] = lv.slots;
    for (let j = lv.slots - 1; j >= 0; j--) {
      tails[row + j] = tails[row + j + 1] + weight[k] * (j === 0 ? 1 : 2) * Math.abs(bessel[j]);
    }
  }
  const delta = chooseThreshold(tails, count, maxSlots, opts.budget);
  const kept = new Int32Array(count);
  const droppedBound = new Float64Array(series.variables);
  const termsPerLevel = new Int32Array(levels.length);
  let termsKept = 0;
  for (let k = 0; k < count; k++) {
    const row = k * (maxSlots + 1);
    const m = keptFor(tails, row, delta);
    kept[k] = m;
    droppedBound[variableOf[k]] += tails[row + m];
    if (m > 0) {
      termsKept++;
      termsPerLevel[level[k]]++;
    }
  }
  // Each level needs no more slots than its longest kept term.
  const used = levels.map(() => 2);
  for (let k = 0; k < count; k++) used[level[k]] = Math.max(used[level[k]], kept[k]);
  const trimmed = levels.map((lv, L) => ({ ...lv, slots: Math.min(lv.slots, used[L]) }));
  const plan = { series, levels: trimmed, level, kept, droppedBound, termsKept, termsPerLevel };
  return { ...plan, ...termFactors(series, levels, level, kept, maxSlots, tMid) };
}

/** Shortest even prefix m with tail ≤ delta (tails non-increasing in m; the row ends at 0). */
function keptFor(tails: Float64Array, row: number, delta: number): number {
  let m = 0;
  while (tails[row + m] > delta) m++;
  return m + (m & 1); // slots are filled in pairs
}

/** Pass 1: each term's cheapest level at the nominal threshold delta0. */
function chooseLevels(levels: PoissonLevel[], weight: Float64Array, rate: Float64Array, delta0: number): Uint8Array {
  const level = new Uint8Array(weight.length);
  const bessel = new Float64Array(Math.max(...levels.map((l) => l.slots)) + BEYOND);
  for (let k = 0; k < weight.length; k++) {
    let best = Infinity;
    for (let L = 0; L < levels.length; L++) {
      const lv = levels[L];
      besselJSequence(rate[k] * lv.halfSegment, lv.slots + BEYOND, bessel);
      let beyond = 0;
      for (let j = lv.slots; j < lv.slots + BEYOND; j++) beyond += 2 * weight[k] * Math.abs(bessel[j]);
      if (L > 0 && beyond > 0.01 * delta0) continue;
      let tail = 0;
      let m = lv.slots;
      while (m > 0 && tail + (m === 1 ? 1 : 2) * weight[k] * Math.abs(bessel[m - 1]) <= delta0) {
        tail += (m === 1 ? 1 : 2) * weight[k] * Math.abs(bessel[m - 1]);
        m--;
      }
      const cost = (2 + (m + (m & 1)) / 2) / lv.group;
      if (cost < best) {
        best = cost;
        level[k] = L;
      }
    }
  }
  return level;
}

/** Largest δ (bisection in log δ, 40 steps: δ to 3e-11 relative) with Σ_k tail_k(m_k(δ)) ≤ budget. */
function chooseThreshold(tails: Float64Array, count: number, slots: number, budget: number): number {
  if (!(budget > 0)) return 0;
  const dropped = (delta: number): number => {
    let sum = 0;
    for (let k = 0; k < count; k++) {
      const row = k * (slots + 1);
      sum += tails[row + keptFor(tails, row, delta)];
    }
    return sum;
  };
  let lo = Math.log(budget * 1e-12);
  let hi = Math.log(budget);
  if (dropped(Math.exp(hi)) <= budget) return Math.exp(hi);
  for (let it = 0; it < 40; it++) {
    const mid = 0.5 * (lo + hi);
    if (dropped(Math.exp(mid)) <= budget) lo = mid;
    else hi = mid;
  }
  return Math.exp(lo);
}

/** s_j = (−1)^i for j = 2i and −(−1)^i for j = 2i + 1 (the Jacobi–Anger signs above). */
function jacobiAngerSign(j: number): number {
  const i = j >> 1;
  return (j & 1) === 0 ? ((i & 1) === 0 ? 1 : -1) : ((i & 1) === 0 ? -1 : 1);
}

/**
 * g_j = A (2 − δ_j0) s_j J_j(ω0) for every kept term, at ω0 = φ'(tRef) h; for quartic phases
 * also dg_j/dω from J'_j = (J_{j−1} − J_{j+1}) / 2 (A&S 9.1.27; J_{−1} = −J_1), so a chunk
 * can move ω to its own φ' by one multiply-add per coefficient. The second-order remainder
 * in value is ≤ |A| Δω²/2 (|∂²/∂ω² cos(φ + ωx)| ≤ x² ≤ 1) with Δω ≤ max|φ''| |t − tRef| h:
 * for ELP/MPP02 on 128-day groups over ±10 centuries, Δω ≤ 3.5e-5 rad and the remainder
 * ≤ 3e-7 km at the barycentre (4e4 km × Δω²/2 / 82.3).
 */
function termFactors(
  s: PoissonSeries, levels: PoissonLevel[], level: Uint8Array, kept: Int32Array, maxSlots: number, tRef: number,
) {
  const count = kept.length;
  const gOffset = new Int32Array(count);
  let total = 0;
  for (let k = 0; k < count; k++) {
    gOffset[k] = total;
    total += kept[k];
  }
  const g = new Float64Array(total);
  const quartic = s.phaseDegree > 1;
  const dg = quartic ? new Float64Array(total) : null;
  const omega0 = new Float64Array(count);
  const bessel = new Float64Array(maxSlots + 2);
  for (let k = 0; k < count; k++) {
    const m = kept[k];
    if (m === 0) continue;
    const omega = phaseRate(s, k, tRef) * levels[level[k]].halfSegment;
    omega0[k] = omega;
    besselJSequence(omega, m + 1, bessel);
    const a = s.amplitude[k];
    for (let j = 0; j < m; j++) {
      const f = a * (j === 0 ? 1 : 2) * jacobiAngerSign(j);
      g[gOffset[k] + j] = f * bessel[j];
      if (dg !== null) dg[gOffset[k] + j] = (f * ((j === 0 ? -bessel[1] : bessel[j - 1]) - bessel[j + 1])) / 2;
    }
  }
  return { g, gOffset, dg, omega0 };
}

/** Scratch for quartic-phase factors; the functions here are synchronous, not recursive. */
let gScratch = new Float64Array(64);
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
 * Chebyshev coefficients of the terms at level `levelIndex`, on `count` consecutive
 * (grouped) segments of that level whose first midpoint is t0 (series units), of every block
 * (variable v, power α) of the series without its t^α factor:
 * acc[((v*powers+α)*count + s)*slots + j], slots and spacing 2·halfSegment of the level.
 */
export function poissonChunkCoefficients(
  plan: PoissonChebyshevPlan, levelIndex: number, t0: number, count: number, acc: Float64Array,
): void {
  const s = plan.series;
  const lv = plan.levels[levelIndex];
  const slots = lv.slots;
  const halfSegment = lv.halfSegment;
  const blocks = s.variables * s.powers;
  if (acc.length < blocks * count * slots) {
    throw new RangeError(`poissonChunkCoefficients: accumulator of ${acc.length} < ${blocks * count * slots}`);
  }
  acc.fill(0, 0, blocks * count * slots);
  const dt = 2 * halfSegment;
  const quartic = s.phaseDegree > 1;
  if (gScratch.length < slots) gScratch = new Float64Array(slots);
  const tCentre = t0 + 0.5 * (count - 1) * dt;
  for (let b = 0; b < blocks; b++) {
    const accBase = b * count * slots;
    for (let k = s.blockStart[b]; k < s.blockStart[b + 1]; k++) {
      const m = plan.kept[k];
      if (m === 0 || plan.level[k] !== levelIndex) continue;
      let g: Float64Array;
      let gAt: number;
      let step: number; // φ(t0 + dt) − φ(t0)
      let second = 0; // second difference of φ at t0
      let phi0: number;
      if (quartic) {
        const shift = phaseRate(s, k, tCentre) * halfSegment - plan.omega0[k];
        const dg = plan.dg as Float64Array;
        for (let j = 0, at = plan.gOffset[k]; j < m; j++, at++) gScratch[j] = plan.g[at] + shift * dg[at];
        g = gScratch;
        gAt = 0;
        phaseTaylor(s, k, t0);
        phi0 = taylor[0];
        step = 0;
        for (let r = s.phaseDegree; r >= 1; r--) step = (step + taylor[r]) * dt; // Σ_{r≥1} q_r dt^r
        let p = dt * dt;
        for (let r = 2; r <= s.phaseDegree; r++, p *= dt) second += taylor[r] * p * (2 ** r - 2);
      } else {
        g = plan.g;
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
      const cd = Math.cos(step);
      const sd = Math.sin(step);
      // A linear phase is the quadratic case with a zero second step (cos 1, sin 0): the
      // rotation of the step by it is exact, so results are bit-identical to a linear loop.
      const cq = quartic ? Math.cos(second) : 1;
      const sq = quartic ? Math.sin(second) : 0;
      accumulatePhase(acc, accBase, slots, count, g, gAt, m, c, sn, cd, sd, cq, sq);
    }
  }
}

/**
 * One term: acc[o + j] += g_j cos φ_s (j even) or g_j sin φ_s (j odd), with φ_{s+1} = φ_s +
 * step_s and the step itself advancing by `second` each segment (rotations by cd, sd and cq, sq).
 */
function accumulatePhase(
  acc: Float64Array, accBase: number, slots: number, count: number, g: Float64Array, gAt: number, m: number,
  c: number, sn: number, cd: number, sd: number, cq: number, sq: number,
): void {
  for (let seg = 0, o = accBase; seg < count; seg++, o += slots) {
    for (let j = 0; j < m; j += 2) {
      acc[o + j] += g[gAt + j] * c;
      acc[o + j + 1] += g[gAt + j + 1] * sn;
    }
    const cNext = c * cd - sn * sd;
    sn = sn * cd + c * sd;
    c = cNext;
    const cdNext = cd * cq - sd * sq;
    sd = sd * cq + cd * sq;
    cd = cdNext;
  }
}
