/**
 * Chebyshev cache over any Ephemeris: each body's heliocentric position is fitted on
 * fixed-length segments (length and degree per body) at the Chebyshev nodes (chebyshev.ts);
 * a query finds its segment by index in O(1) and sums one short polynomial.
 *
 * Filling. Sources that can (the direct VSOP87/ELP series) fit segments in bulk
 * (segmentFitter.ts, vsop87SegmentFitter.ts): the series' own Chebyshev coefficients, a few
 * multiply-adds per term and segment instead of a cosine per term and node; measured ≈ 45×
 * less CPU than sampling the series at the nodes (scripts/bench/ephemeris.ts: 1 000 years of
 * the eight planet systems in 5–6 s on one core instead of 250–330 s). Other sources are
 * sampled at the nodes ('nodes', also available for the series as the reference path).
 * Segments are fitted lazily at first touch, in runs of CACHE_FILL_CHUNK segments with
 * 'bulk' (a run of 64 Mercury segments costs ≈ 8 ms, one segment by node sampling ≈ 6 ms;
 * measured), so short uses of a long span pay only for what they read; short spans use node
 * sampling by default ('auto', CacheFillChoice); `prefill(start, end, bodies)` fits a range up front
 * for long integrations, `fillAll()` everything. Runs start at fixed segment indices, so the
 * coefficients do not depend on the order or way of filling (tested bit for bit).
 *
 * Velocities: by default the derivative of the position polynomial ('derivative'); the
 * alternative 'fitted' keeps a second polynomial fitted to the source's velocities at the
 * same nodes (twice the memory, slower to evaluate). Measured over 1900–2100 against the
 * series' analytic velocities: 'fitted' worst 7e-12 au/day (0.013 mm/s), 'derivative'
 * worst 2e-11 au/day (0.04 mm/s). The default is 'derivative': both are far beyond the
 * accuracy of the theory itself, and it takes half the memory, evaluates faster, and is
 * exactly the rate of the cached positions (self-consistent for
 * integrators). The test suite measures both modes.
 * Layouts, modes and tolerances with their measurements: ephemerisCacheOptions.ts.
 */
import type { Ephemeris, EphemerisBody } from '../types.js';
import { assertInSpan, ephemerisBodyIndex, EPHEMERIS_BODIES } from './ephemerisBody.js';
import { chebyshevFit, chebyshevNode, chebyshevValue3 } from '../series/chebyshev.js';
import { hasSegmentFitter } from './segmentFitter.js';
import type { SegmentFitter } from './segmentFitter.js';
import { assertSameTable } from './ephemerisCacheTable.js';
import type { CacheBodyTable } from './ephemerisCacheTable.js';
import { CACHE_FILL_CHUNK, DEFAULT_CHEBYSHEV_LAYOUTS, DEFAULT_FIT_TOLERANCE_AU } from './ephemerisCacheOptions.js';
import type {
  CacheFillChoice, CacheFillMethod, CacheVelocityMode, ChebyshevLayout, EphemerisCacheOptions,
} from './ephemerisCacheOptions.js';

export {
  CACHE_FILL_CHUNK, DEFAULT_CHEBYSHEV_LAYOUTS, DEFAULT_FIT_TOLERANCE_AU, DYNAMICS_FIT_TOLERANCE_AU,
} from './ephemerisCacheOptions.js';
export type {
  CacheFillChoice, CacheFillMethod, CacheVelocityMode, ChebyshevLayout, EphemerisCacheOptions,
} from './ephemerisCacheOptions.js';

/** One body's segments: coefficients of segment s at s*stride; built[s] = 1 once fitted. */
interface BodyTable {
  segmentCount: number;
  segmentDays: number; // actual length: span / segmentCount ≤ the nominal length
  n: number;
  stride: number;
  coeffs: Float64Array;
  built: Uint8Array;
}

export class EphemerisCache implements Ephemeris {
  readonly name: string;
  readonly startJdTDB: number;
  readonly endJdTDB: number;
  readonly velocity: CacheVelocityMode;
  readonly fill: CacheFillChoice;
  readonly fitToleranceAu: number;
  /** The per-body layouts in use (a copy). */
  readonly layouts: readonly ChebyshevLayout[];
  private readonly tables: BodyTable[];
  private readonly fitters: Array<SegmentFitter | null>;
  /** Fill method per body (resolved from `fill`). */
  private readonly methods: CacheFillMethod[];
  private readonly nodeStates: Float64Array;
  private segmentsFitted = 0;
  private lastBodies: readonly EphemerisBody[] | null = null; // helioPositions' last list
  private lastIndices = new Int32Array(0);

  constructor(readonly source: Ephemeris, opts: EphemerisCacheOptions) {
    const { startJdTDB, endJdTDB } = opts;
    if (!(Number.isFinite(startJdTDB) && Number.isFinite(endJdTDB) && startJdTDB < endJdTDB)) {
      throw new RangeError(`EphemerisCache: bad span [${startJdTDB}, ${endJdTDB}]`);
    }
    if (startJdTDB < source.startJdTDB || endJdTDB > source.endJdTDB) {
      throw new RangeError(
        `EphemerisCache: span [${startJdTDB}, ${endJdTDB}] exceeds the source '${source.name}' ` +
          `span [${source.startJdTDB}, ${source.endJdTDB}]`,
      );
    }
    this.startJdTDB = startJdTDB;
    this.endJdTDB = endJdTDB;
    this.velocity = opts.velocity ?? 'derivative';
    if (this.velocity !== 'derivative' && this.velocity !== 'fitted') {
      throw new TypeError(`EphemerisCache: velocity must be 'derivative' or 'fitted', got '${String(this.velocity)}'`);
    }
    this.name = `Chebyshev cache over ${source.name}`;
    const layouts = opts.layouts ?? DEFAULT_CHEBYSHEV_LAYOUTS;
    this.layouts = layouts.map((l) => ({ segmentDays: l.segmentDays, coefficients: l.coefficients }));
    if (layouts.length !== EPHEMERIS_BODIES.length) {
      throw new RangeError(`EphemerisCache: need ${EPHEMERIS_BODIES.length} layouts, got ${layouts.length}`);
    }
    this.tables = layouts.map((l) => this.makeTable(l));
    this.fill = opts.fill ?? 'auto';
    if (this.fill !== 'bulk' && this.fill !== 'nodes' && this.fill !== 'auto') {
      throw new TypeError(`EphemerisCache: fill must be 'auto', 'bulk' or 'nodes', got '${String(this.fill)}'`);
    }
    if (this.fill === 'bulk' && !hasSegmentFitter(source)) {
      throw new TypeError(`EphemerisCache: source '${source.name}' cannot fit segments in bulk; use fill 'nodes'`);
    }
    this.fitToleranceAu = opts.fitToleranceAu ?? DEFAULT_FIT_TOLERANCE_AU;
    if (!(this.fitToleranceAu >= 0 && Number.isFinite(this.fitToleranceAu))) {
      throw new RangeError(`EphemerisCache: fitToleranceAu must be a finite number ≥ 0, got ${this.fitToleranceAu}`);
    }
    this.fitters = this.tables.map(() => null);
    const bulkable = hasSegmentFitter(source);
    this.methods = this.tables.map((t) => (this.fill === 'auto'
      ? (bulkable && t.segmentCount > CACHE_FILL_CHUNK ? 'bulk' : 'nodes') : this.fill));
    const nMax = Math.max(...layouts.map((l) => l.coefficients));
    this.nodeStates = new Float64Array(6 * nMax);
  }

  private makeTable(layout: ChebyshevLayout): BodyTable {
    const { segmentDays, coefficients: n } = layout;
    if (!(segmentDays > 0) || !Number.isInteger(n) || n < 2) {
      throw new RangeError(`EphemerisCache: bad layout segmentDays=${segmentDays}, coefficients=${n}`);
    }
    const span = this.endJdTDB - this.startJdTDB;
    const segmentCount = Math.max(1, Math.ceil(span / segmentDays));
    const stride = (this.velocity === 'fitted' ? 6 : 3) * n;
    return {
      segmentCount,
      segmentDays: span / segmentCount,
      n,
      stride,
      coeffs: new Float64Array(segmentCount * stride),
      built: new Uint8Array(segmentCount),
    };
  }

  /** Options that rebuild an empty cache with the same segments (e.g. in another thread). */
  get options(): EphemerisCacheOptions {
    return {
      startJdTDB: this.startJdTDB, endJdTDB: this.endJdTDB, velocity: this.velocity,
      layouts: this.layouts.map((l) => ({ ...l })), fill: this.fill, fitToleranceAu: this.fitToleranceAu,
    };
  }

  /** A copy of the fitted segments of `body`, with what decided them (ephemerisCacheTable.ts). */
  exportBody(body: EphemerisBody): CacheBodyTable {
    const t = this.tables[ephemerisBodyIndex(body)];
    return { ...this.tableHeader(body), coeffs: t.coeffs.slice(), built: t.built.slice() };
  }

  /**
   * Take the fitted segments of another cache's exportBody (same span, layout, velocity mode,
   * fill method, tolerance and source, else RangeError); segments already fitted here stay.
   */
  importBody(table: CacheBodyTable): void {
    const b = ephemerisBodyIndex(table.body);
    assertSameTable(this.tableHeader(table.body), table);
    const t = this.tables[b];
    for (let s = 0; s < t.segmentCount; s++) {
      if (t.built[s] === 0 && table.built[s] === 1) {
        t.coeffs.set(table.coeffs.subarray(s * t.stride, (s + 1) * t.stride), s * t.stride);
        t.built[s] = 1;
        this.segmentsFitted++;
      }
    }
  }

  private tableHeader(body: EphemerisBody): Omit<CacheBodyTable, 'coeffs' | 'built'> {
    const b = ephemerisBodyIndex(body);
    const t = this.tables[b];
    return {
      body, startJdTDB: this.startJdTDB, endJdTDB: this.endJdTDB, segmentDays: t.segmentDays,
      segmentCount: t.segmentCount, coefficients: t.n, stride: t.stride, velocity: this.velocity,
      fillMethod: this.methods[b], fitToleranceAu: this.fitToleranceAu, sourceName: this.source.name,
    };
  }

  /** Number of segments fitted so far (all bodies). */
  get fittedSegmentCount(): number {
    return this.segmentsFitted;
  }

  /** Fit every segment of every body now (instead of at first touch). */
  fillAll(): void {
    this.prefill(this.startJdTDB, this.endJdTDB);
  }

  /**
   * Fit now every not-yet-fitted segment that overlaps [startJdTDB, endJdTDB] (clipped to the
   * cache span) for `bodies` (default all): the path for long integrations. The coefficients
   * are the same as lazy filling would produce, whatever the order of calls.
   */
  prefill(startJdTDB: number, endJdTDB: number, bodies: readonly EphemerisBody[] = EPHEMERIS_BODIES): void {
    if (!(startJdTDB <= endJdTDB)) throw new RangeError(`prefill: bad range [${startJdTDB}, ${endJdTDB}]`);
    const lo = Math.max(startJdTDB, this.startJdTDB);
    const hi = Math.min(endJdTDB, this.endJdTDB);
    if (lo > hi) return;
    for (const body of bodies) {
      const b = ephemerisBodyIndex(body);
      const t = this.tables[b];
      const first = this.segmentIndex(t, lo);
      const last = this.segmentIndex(t, hi);
      for (let s = first; s <= last; s++) if (t.built[s] === 0) this.fitAround(b, s);
    }
  }

  /** Segment of table t holding jdTDB (inside the span). */
  private segmentIndex(t: BodyTable, jdTDB: number): number {
    const s = Math.floor((jdTDB - this.startJdTDB) / t.segmentDays);
    return s >= t.segmentCount ? t.segmentCount - 1 : s < 0 ? 0 : s;
  }

  /** How the segments of `body` are fitted in this cache. */
  fillMethod(body: EphemerisBody): CacheFillMethod {
    return this.methods[ephemerisBodyIndex(body)];
  }

  /** Fit segment s of body b: alone ('nodes') or with its whole bulk-fill chunk ('bulk'). */
  private fitAround(b: number, s: number): void {
    if (this.methods[b] === 'nodes') {
      this.fitSegment(b, s);
      return;
    }
    const t = this.tables[b];
    const first = s - (s % CACHE_FILL_CHUNK);
    const count = Math.min(CACHE_FILL_CHUNK, t.segmentCount - first);
    this.bodyFitter(b).fitSegments(first, count, t.coeffs, t.stride);
    for (let k = first; k < first + count; k++) {
      if (t.built[k] === 0) this.segmentsFitted++;
      t.built[k] = 1;
    }
  }

  /** The source's bulk fitter for `body` (planned at first use); TypeError without one. */
  bulkFitter(body: EphemerisBody): SegmentFitter {
    return this.bodyFitter(ephemerisBodyIndex(body));
  }

  private bodyFitter(b: number): SegmentFitter {
    let f = this.fitters[b];
    if (f === null) {
      const t = this.tables[b];
      if (!hasSegmentFitter(this.source)) throw new TypeError(`EphemerisCache: source '${this.source.name}' has no bulk fitter`);
      f = this.source.createSegmentFitter(
        EPHEMERIS_BODIES[b],
        { startJdTDB: this.startJdTDB, segmentDays: t.segmentDays, segmentCount: t.segmentCount, coefficients: t.n },
        { fitVelocities: this.velocity === 'fitted', toleranceAu: this.fitToleranceAu },
      );
      this.fitters[b] = f;
    }
    return f;
  }

  /** The segment of table t (body b) at u segment lengths from the start, fitted if it was not. */
  private fittedSegment(b: number, t: BodyTable, u: number): number {
    let s = Math.floor(u);
    if (s >= t.segmentCount) s = t.segmentCount - 1; // the end of the span
    if (t.built[s] === 0) this.fitAround(b, s);
    return s;
  }

  helioState(body: EphemerisBody, jdTDB: number, out: Float64Array, offset = 0): void {
    const b = ephemerisBodyIndex(body);
    assertInSpan(this.name, jdTDB, this.startJdTDB, this.endJdTDB);
    const t = this.tables[b];
    const u = (jdTDB - this.startJdTDB) / t.segmentDays;
    const s = this.fittedSegment(b, t, u);
    const x = 2 * (u - s) - 1;
    const base = s * t.stride;
    if (this.velocity === 'fitted') {
      chebyshevValue3(t.coeffs, base, t.n, x, 0, out, offset);
      chebyshevValue3(t.coeffs, base + 3 * t.n, t.n, x, 0, out, offset + 3);
    } else {
      chebyshevValue3(t.coeffs, base, t.n, x, 2 / t.segmentDays, out, offset);
    }
  }

  /**
   * Positions only of bodies[j] at jdTDB into out[offset + stride·j .. +2]: the same segment
   * and the same arithmetic as helioState (bit for bit; 'fitted' and 'derivative' share the
   * position polynomial), without the velocity sums, with one span check for all and the
   * body indices looked up once per list (the force model asks with the same list every time).
   */
  helioPositions(bodies: readonly EphemerisBody[], jdTDB: number, out: Float64Array, offset: number, stride: number): void {
    assertInSpan(this.name, jdTDB, this.startJdTDB, this.endJdTDB);
    if (bodies !== this.lastBodies) {
      this.lastIndices = Int32Array.from(bodies.map((b) => ephemerisBodyIndex(b)));
      this.lastBodies = bodies;
    }
    const idx = this.lastIndices;
    for (let j = 0; j < idx.length; j++) {
      const b = idx[j];
      const t = this.tables[b];
      const u = (jdTDB - this.startJdTDB) / t.segmentDays;
      const s = this.fittedSegment(b, t, u);
      // chebyshevValue3's forward recurrence and order of additions, without the derivatives.
      const x = 2 * (u - s) - 1;
      const c = t.coeffs, n = t.n, o0 = s * t.stride, o1 = o0 + n, o2 = o1 + n;
      let px = c[o0], py = c[o1], pz = c[o2];
      let t0 = 1, t1 = x; // T_{k-1}, T_k
      for (let k = 1; k < n; k++) {
        px += c[o0 + k] * t1;
        py += c[o1 + k] * t1;
        pz += c[o2 + k] * t1;
        const t2 = 2 * x * t1 - t0;
        t0 = t1; t1 = t2;
      }
      const o = offset + stride * j;
      out[o] = px; out[o + 1] = py; out[o + 2] = pz;
    }
  }

  /** Sample the source at the n Chebyshev nodes of segment s and fit each axis. */
  private fitSegment(b: number, s: number): void {
    const t = this.tables[b];
    const body = EPHEMERIS_BODIES[b];
    const half = 0.5 * t.segmentDays;
    const mid = this.startJdTDB + (s + 0.5) * t.segmentDays;
    const states = this.nodeStates;
    for (let k = 0; k < t.n; k++) {
      this.source.helioState(body, mid + half * chebyshevNode(k, t.n), states, 6 * k);
    }
    const base = s * t.stride;
    const axes = this.velocity === 'fitted' ? 6 : 3;
    for (let a = 0; a < axes; a++) chebyshevFit(states, a, 6, t.n, t.coeffs, base + a * t.n);
    t.built[s] = 1;
    this.segmentsFitted++;
  }
}
