/**
 * Bulk fitting of cache segments from the VSOP87B series (and, for the Earth–Moon
 * barycentre, the ELP/MPP02 Moon): the same quantities as sampling the direct ephemeris
 * (vsop87Ephemeris.ts) at the Chebyshev nodes of each segment, obtained instead from the
 * series' own Chebyshev coefficients (poissonChebyshev.ts).
 *
 * Per segment: for each variable (L, B, R), Horner's scheme over the powers of time,
 * V = S_0 + t (S_1 + t (S_2 + …)), done on Chebyshev coefficients with t = t_m + h x
 * (chebyshevAlgebra.ts); V evaluated at the n nodes; spherical → rectangular at each node
 * (and the Moon added to the Earth for the barycentre); then the n-point Chebyshev
 * interpolant of x, y, z (NR §5.8), as in the node-sampling path. The series coefficients
 * are kept to SLOT_MARGIN more than n, so their own truncation stays below the interpolant's.
 */
import { ARCSEC_PER_RAD, J2000_JD } from '../constants.js';
import type { PlanetName } from '../constants.js';
import type { EphemerisBody } from '../types.js';
import { ephemerisBodyIndex } from './ephemerisBody.js';
import { chebyshevNode } from '../series/chebyshev.js';
import { chebyshevDerivative, chebyshevFitMatrix, chebyshevTimesLinear, matrixTimesVector } from '../series/chebyshevAlgebra.js';
import type { PoissonChebyshevPlan, PoissonPlanOptions } from '../series/poissonChebyshev.js';
import { planPoissonChebyshev, poissonChunkCoefficients } from '../series/poissonChebyshev.js';
import type { PoissonSeries } from '../series/poissonSeries.js';
import { elpPoissonSeries, vsop87PoissonSeries } from '../series/poissonSeries.js';
import { sphericalToRectangularState } from './vsop87.js';
import { elpMoonStateFromSums, MOON_TO_EMB_AU_PER_KM } from './elpMoon.js';
import type { SegmentFitter, SegmentFitterOptions, SegmentGrid } from './segmentFitter.js';

/** Series coefficients kept beyond the n of the cache (truncation margin; measured, see tests). */
const SLOT_MARGIN = 8;
/**
 * Longest run of segments per recurrence restart (drift ≤ 64 rotations of a few ulps); a
 * multiple of GROUP, and runs start at multiples of it in the cache.
 */
export const SEGMENT_FITTER_CHUNK = 64;

/**
 * Grouping levels (poissonChebyshev.ts): the cache's own segments with n + SLOT_MARGIN
 * coefficients, and groups of GROUP segments with GROUP_SLOTS coefficients for the many
 * long-period terms, which then cost one rotation per group instead of one per segment.
 * Chosen with the cost model of poissonChebyshev.ts applied to the real series (groups of
 * 2–64, two- and three-level ladders, counting the evaluation at the nodes), then checked by
 * timing: a three-level ladder (1, 4, 32) filled 1 000 years no faster than (1, 8).
 */
const GROUP = 8;
const GROUP_SLOTS = 96;

/** Plans kept per series (read-only once made), most recent last; at most PLAN_MEMO_SIZE. */
const planMemo = new WeakMap<PoissonSeries, Map<string, PoissonChebyshevPlan>>();
const PLAN_MEMO_SIZE = 16;

/**
 * planPoissonChebyshev, remembered: caches over the same span and layout (e.g. one per
 * object in a batch) share the plan instead of paying 5–80 ms per body again.
 */
function memoPlan(series: PoissonSeries, opts: PoissonPlanOptions): PoissonChebyshevPlan {
  let plans = planMemo.get(series);
  if (plans === undefined) {
    plans = new Map();
    planMemo.set(series, plans);
  }
  const key = JSON.stringify([opts.levels, opts.segmentDays, opts.tMin, opts.tMax, Array.from(opts.variableWeight), opts.budget]);
  let plan = plans.get(key);
  if (plan === undefined) {
    plan = planPoissonChebyshev(series, opts);
    if (plans.size >= PLAN_MEMO_SIZE) plans.delete(plans.keys().next().value as string);
  } else {
    plans.delete(key); // re-inserted below as the most recent
  }
  plans.set(key, plan);
  return plan;
}

/** A level's share of a chunk: coefficients, and the node matrices of each sub-position. */
interface LevelState {
  acc: Float64Array;
  readonly width: number; // coefficients after Horner: slots + powers − 1
  /** nodeMatrix[g]: T_j at the nodes of sub-segment g of a group, in group coordinates. */
  readonly nodeMatrix: Float64Array[];
}

/** One theory's part of a body: plan, scratch and node values of its variables (+ rates). */
class SeriesPart {
  readonly plan: PoissonChebyshevPlan;
  private readonly levels: LevelState[];
  private readonly horner: Float64Array;
  private readonly hornerTmp: Float64Array;
  private readonly deriv: Float64Array;
  /** nodeValues[6k + v] = V_v at node k; [6k + 3 + v] = dV_v/dt (per series unit). */
  readonly nodeValues: Float64Array;
  private chunkFirst = 0;
  private chunkCount = 0;

  constructor(readonly series: PoissonSeries, readonly grid: SegmentGrid, weights: number[], budgetAu: number,
    private readonly n: number) {
    const toT = (jd: number) => (jd - J2000_JD) / series.daysPerUnit;
    // Groups may reach past the grid's end by < GROUP segments: bound |t| there too.
    const endJd = grid.startJdTDB + (grid.segmentCount + GROUP) * grid.segmentDays;
    this.plan = memoPlan(series, {
      levels: [{ group: 1, slots: n + SLOT_MARGIN }, { group: GROUP, slots: GROUP_SLOTS }],
      segmentDays: grid.segmentDays, tMin: toT(grid.startJdTDB), tMax: toT(endJd),
      variableWeight: weights, budget: budgetAu,
    });
    const nodeX = Float64Array.from({ length: n }, (_, k) => chebyshevNode(k, n));
    this.levels = this.plan.levels.map((lv) => {
      const width = lv.slots + series.powers - 1;
      const nodeMatrix: Float64Array[] = [];
      for (let g = 0; g < lv.group; g++) {
        const m = new Float64Array(n * width);
        for (let k = 0; k < n; k++) {
          const x = (2 * g + 1 + nodeX[k]) / lv.group - 1;
          let t0 = 1;
          let t1 = x;
          for (let j = 0; j < width; j++) {
            m[k * width + j] = t0;
            const t2 = 2 * x * t1 - t0;
            t0 = t1;
            t1 = t2;
          }
        }
        nodeMatrix.push(m);
      }
      return { acc: new Float64Array(0), width, nodeMatrix };
    });
    const widest = Math.max(...this.levels.map((l) => l.width));
    this.horner = new Float64Array(widest + 1);
    this.hornerTmp = new Float64Array(widest + 1);
    this.deriv = new Float64Array(widest);
    this.nodeValues = new Float64Array(6 * n);
  }

  /** Series time of the midpoint of `group` segments starting at segment s. */
  midT(s: number, group = 1): number {
    const g = this.grid;
    return (g.startJdTDB + (s + 0.5 * group) * g.segmentDays - J2000_JD) / this.series.daysPerUnit;
  }

  /** Series coefficients for segments [first, first + count), every level. */
  loadChunk(first: number, count: number): void {
    const s = this.series;
    for (let L = 0; L < this.levels.length; L++) {
      if (this.plan.termsPerLevel[L] === 0) continue;
      const lv = this.plan.levels[L];
      const groups = Math.ceil(count / lv.group);
      const size = s.variables * s.powers * groups * lv.slots;
      if (this.levels[L].acc.length < size) this.levels[L].acc = new Float64Array(size);
      poissonChunkCoefficients(this.plan, L, this.midT(first, lv.group), groups, this.levels[L].acc);
    }
    this.chunkFirst = first;
    this.chunkCount = count;
  }

  /** V_v (and with rates, dV_v/dt) of segment s (inside the loaded chunk) at the nodes. */
  evaluate(s: number, withRates: boolean): void {
    this.nodeValues.fill(0);
    const local = s - this.chunkFirst;
    for (let L = 0; L < this.levels.length; L++) {
      if (this.plan.termsPerLevel[L] === 0) continue;
      const group = this.plan.levels[L].group;
      const sub = local % group;
      const first = s - sub;
      this.addLevel(L, (local - sub) / group, sub, this.midT(first, group), withRates);
    }
  }

  /** Add level L's share (its group `index` in the chunk, sub-position `sub`) at the nodes. */
  private addLevel(L: number, index: number, sub: number, tm: number, withRates: boolean): void {
    const ser = this.series;
    const lv = this.plan.levels[L];
    const state = this.levels[L];
    const groups = Math.ceil(this.chunkCount / lv.group);
    const width = state.width;
    const matrix = state.nodeMatrix[sub];
    const h = lv.halfSegment;
    const n = this.n;
    for (let v = 0; v < ser.variables; v++) {
      // Horner over α on Chebyshev coefficients: V ← S_α + (t_m + h x) V.
      let len = 0;
      this.horner.fill(0);
      for (let alpha = ser.powers - 1; alpha >= 0; alpha--) {
        if (len > 0) {
          chebyshevTimesLinear(this.horner, 0, len, tm, h, this.hornerTmp, 0);
          len++;
          for (let j = 0; j < len; j++) this.horner[j] = this.hornerTmp[j];
        }
        const base = ((v * ser.powers + alpha) * groups + index) * lv.slots;
        for (let j = 0; j < lv.slots; j++) this.horner[j] += state.acc[base + j];
        len = Math.max(len, lv.slots);
      }
      addAtNodes(matrix, n, width, this.horner, this.nodeValues, v, 1);
      if (withRates) {
        chebyshevDerivative(this.horner, 0, width, this.deriv, 0);
        this.deriv[width - 1] = 0;
        addAtNodes(matrix, n, width, this.deriv, this.nodeValues, 3 + v, 1 / h);
      }
    }
  }
}

/** out[6k + at] += scale · Σ_j m[k*width + j] c[j], k < n. */
function addAtNodes(m: Float64Array, n: number, width: number, c: Float64Array, out: Float64Array, at: number, scale: number): void {
  for (let k = 0; k < n; k++) {
    let s = 0;
    const row = k * width;
    for (let j = 0; j < width; j++) s += m[row + j] * c[j];
    out[6 * k + at] += scale * s;
  }
}

/** Bound of a Poisson variable's size: Σ_α t^α Σ_k |A_k| over its blocks (triangle inequality). */
function variableBound(s: PoissonSeries, v: number, tAbs: number): number {
  let sum = 0;
  for (let alpha = 0; alpha < s.powers; alpha++) {
    let a = 0;
    for (let k = s.blockStart[v * s.powers + alpha]; k < s.blockStart[v * s.powers + alpha + 1]; k++) {
      a += Math.abs(s.amplitude[k]);
    }
    sum += a * tAbs ** alpha;
  }
  return sum;
}

export class Vsop87SegmentFitter implements SegmentFitter {
  readonly termsKept: number;
  readonly termsTotal: number;
  readonly droppedBoundAu: number;
  private readonly planet: SeriesPart;
  private readonly moon: SeriesPart | null;
  private readonly n: number;
  private readonly fitMatrix: Float64Array;
  private readonly nodeX: Float64Array;
  private readonly states: Float64Array;
  private readonly lbr = new Float64Array(6);
  private readonly moonState = new Float64Array(6);

  constructor(body: EphemerisBody, private readonly grid: SegmentGrid, private readonly opts: SegmentFitterOptions) {
    const index = ephemerisBodyIndex(body);
    const n = grid.coefficients;
    if (!Number.isInteger(n) || n < 2) throw new RangeError(`Vsop87SegmentFitter: bad coefficient count ${n}`);
    if (!(opts.toleranceAu >= 0)) throw new RangeError(`Vsop87SegmentFitter: tolerance must be ≥ 0 au, got ${opts.toleranceAu}`);
    this.n = n;
    const planetName: PlanetName = index === 8 ? 'earth' : (body as PlanetName);
    const vsop = vsop87PoissonSeries(planetName);
    const endJd = grid.startJdTDB + grid.segmentCount * grid.segmentDays;
    const tauAbs = Math.max(Math.abs(grid.startJdTDB - J2000_JD), Math.abs(endJd - J2000_JD)) / vsop.daysPerUnit;
    const rMaxAu = variableBound(vsop, 2, tauAbs);
    const share = index === 8 ? 0.5 : 1;
    this.planet = new SeriesPart(vsop, grid, [rMaxAu, rMaxAu, 1], share * opts.toleranceAu, n);
    if (index === 8) {
      const elp = elpPoissonSeries();
      const tAbs = (tauAbs * vsop.daysPerUnit) / elp.daysPerUnit;
      const rMoonKm = variableBound(elp, 2, tAbs);
      const angular = (rMoonKm / ARCSEC_PER_RAD) * MOON_TO_EMB_AU_PER_KM;
      this.moon = new SeriesPart(elp, grid, [angular, angular, MOON_TO_EMB_AU_PER_KM], share * opts.toleranceAu, n);
    } else {
      this.moon = null;
    }
    this.termsKept = this.planet.plan.termsKept + (this.moon?.plan.termsKept ?? 0);
    this.termsTotal = this.planet.series.amplitude.length + (this.moon?.series.amplitude.length ?? 0);
    const bound = (p: PoissonChebyshevPlan) => p.droppedBound.reduce((a, b) => a + b, 0);
    this.droppedBoundAu = bound(this.planet.plan) + (this.moon === null ? 0 : bound(this.moon.plan));
    this.fitMatrix = chebyshevFitMatrix(n);
    this.nodeX = Float64Array.from({ length: n }, (_, k) => chebyshevNode(k, n));
    this.states = new Float64Array(6 * n);
  }

  fitSegments(first: number, count: number, coeffs: Float64Array, stride: number): void {
    if (!(Number.isInteger(first) && Number.isInteger(count) && first >= 0 && count >= 0 && first + count <= this.grid.segmentCount)) {
      throw new RangeError(`fitSegments: segments [${first}, ${first + count}) outside [0, ${this.grid.segmentCount})`);
    }
    for (let c = first; c < first + count; c += SEGMENT_FITTER_CHUNK) {
      const m = Math.min(SEGMENT_FITTER_CHUNK, first + count - c);
      this.planet.loadChunk(c, m);
      this.moon?.loadChunk(c, m);
      for (let s = c; s < c + m; s++) this.fitOne(s, coeffs, s * stride);
    }
  }

  private fitOne(s: number, coeffs: Float64Array, at: number): void {
    const n = this.n;
    const rates = this.opts.fitVelocities;
    const states = this.states;
    const lbr = this.lbr;
    this.planet.evaluate(s, rates);
    const pv = this.planet.nodeValues;
    const perDay = 1 / this.planet.series.daysPerUnit;
    for (let k = 0; k < n; k++) {
      for (let v = 0; v < 3; v++) {
        lbr[v] = pv[6 * k + v];
        lbr[3 + v] = rates ? pv[6 * k + 3 + v] * perDay : 0;
      }
      sphericalToRectangularState(lbr, states, 6 * k);
    }
    if (this.moon !== null) this.addMoon(s, rates);
    const axes = rates ? 6 : 3;
    for (let a = 0; a < axes; a++) matrixTimesVector(this.fitMatrix, n, n, states, a, 6, coeffs, at + a * n, 1);
  }

  /** Add the Moon's share of the barycentre offset at every node of segment s. */
  private addMoon(s: number, rates: boolean): void {
    const moon = this.moon as SeriesPart;
    moon.evaluate(s, rates);
    const mv = moon.nodeValues;
    const h = (0.5 * this.grid.segmentDays) / moon.series.daysPerUnit;
    const tm = moon.midT(s);
    for (let k = 0; k < this.n; k++) {
      for (let v = 0; v < 3; v++) {
        this.lbr[v] = mv[6 * k + v];
        this.lbr[3 + v] = rates ? mv[6 * k + 3 + v] : 0;
      }
      elpMoonStateFromSums(this.lbr, tm + h * this.nodeX[k], this.moonState, 0);
      for (let j = 0; j < 6; j++) this.states[6 * k + j] += this.moonState[j] * MOON_TO_EMB_AU_PER_KM;
    }
  }
}
