/**
 * The N-body run behind the co-orbital confirmation: massless bodies integrated backward and
 * forward from their epoch under the Sun, the eight planet systems and the Sun's first
 * post-Newtonian term (propagateTestBodies.ts, forces/forceModel.ts), sampled on a uniform
 * grid from the integrator's dense output (no extra force evaluations). At each sample: the
 * resonant angle φ = λ − λ_P (resonantAngle.ts) and the motion about the planet (capture.ts).
 *
 * Several independent bodies share one force model when given together: the planet states
 * at each substep are then read once for all of them; the step size follows the most
 * demanding body (the cost figures are printed by scripts/bench/coorbital.ts).
 * Frame and units: heliocentric J2000 ecliptic, au, au/day, JD TDB. 'earth' is the Earth–Moon
 * barycentre with the Earth + Moon GM, as everywhere in the force model.
 */
import { DAYS_PER_JULIAN_YEAR, GM_SUN_AU3_PER_DAY2, PLANETS, planetGmAu3PerDay2, type PlanetName } from '../constants.js';
import { wrapPi } from '../math.js';
import { createEphemeris } from '../ephemeris/ephemeris.js';
import { PLANET_SYSTEM_BODIES } from '../ephemeris/ephemerisBody.js';
import { DYNAMICS_FIT_TOLERANCE_AU } from '../ephemeris/ephemerisCache.js';
import type { GaussRadauIntegrator, GaussRadauOptions } from '../integrate/gaussRadau.js';
import { createTestBodyIntegrator } from '../propagate/propagateTestBodies.js';
import type { Ephemeris, EphemerisBody } from '../types.js';
import { createPlanetocentricSeries, planetocentricSampleInto, type PlanetocentricSeries } from './capture.js';
import { meanLongitudeRad, planetKeplerGmAu3PerDay2, unwrapAnglesInPlace } from './resonantAngle.js';

export interface CoorbitalSamplingOptions {
  /** Years integrated on each side of the epoch; default 500 (design note §6 [design]). */
  windowYears?: number;
  /**
   * Spacing (days) of the samples of the motion about the planet (distance, capture);
   * default max(2 d, P/200) with P the planet's period. φ is kept at every k-th of them, the
   * largest k with k·step ≤ P/20 (design note §6: "Output step: ≤ P_P/20").
   */
  sampleStepDays?: number;
  /** Planet positions over the window; default: a Chebyshev cache built and filled here. */
  ephemeris?: Ephemeris;
  /** The Sun's 1PN term; default true. */
  relativity?: boolean;
  /** Integrator options; the tolerance defaults to CONFIRM_EPSILON. */
  integrator?: GaussRadauOptions;
  /**
   * Also keep the body's position in the frame rotating with the planet at every φ sample
   * (rotatingXAu, rotatingYAu) and the planet's distance there; default false, so a run
   * that does not plot pays nothing. Frame: the heliocentric J2000-ecliptic position
   * projected on the ecliptic and turned about the ecliptic pole by −L_P, with L_P the
   * planet's heliocentric ecliptic longitude at that instant (atan2 of its y and x), so the
   * Sun is at the origin and the planet on +x at its projected distance; the planet moves
   * counter-clockwise seen from the ecliptic's north, so the leading point L4 is at y > 0.
   */
  rotatingFrame?: boolean;
  /**
   * Where the planetocentric rotating-frame angle is wanted: bound samples closer than this
   * (au), e.g. the capture zone; NaN elsewhere (planetocentricSampleInto). Default: everywhere.
   */
  captureZoneAu?: number;
}

/**
 * Gauss–Radau tolerance of the confirmation runs [design]: looser than the integrator's 1e-9,
 * since the labels are wanted, not the positions. Measured (scripts/bench/coorbital.ts,
 * J2000 ± 500 yr): an Earth Trojan, an Earth co-orbital meeting the Earth down to 0.0036 au
 * and a Jupiter Trojan get the same segments at 1e-9, 1e-8 and 1e-7; against 1e-9 the end
 * positions after 500 yr move by 6e-11 au (Earth Trojan), 5e-3 au (Jupiter Trojan, 0.05° of
 * longitude) and 0.7 au (the encounter body, chaotic: 1e-8 moves it 2 au); the cost per body
 * falls by ~35%.
 */
export const CONFIRM_EPSILON = 1e-7;

export const DEFAULT_WINDOW_YEARS = 500;
/**
 * Finest default sample spacing: a bound orbit about the Earth–Moon system at 0.01 au has a
 * period of ~210 days (Kepler's third law), at 0.003 au ~35 days; 2 days follow both [design].
 */
export const MIN_DEFAULT_SAMPLE_STEP_DAYS = 2;
/** Default samples per planet period for the motion about the planet [design]. */
export const DEFAULT_SAMPLES_PER_PERIOD = 200;
/** φ samples per planet period at least (design note §6). */
export const MIN_PHI_SAMPLES_PER_PERIOD = 20;
/** Samples per integrateTo call: bounds the dense-output buffer. */
const CHUNK = 2048;

/** The sampled motion of one body. */
export interface CoorbitalSamples {
  phiUnwrappedRad: Float64Array; // λ − λ_P at phiTimesJd, unwrapped; a non-elliptic sample holds the last value
  planetocentric: PlanetocentricSeries;
  minDistanceAu: number; // between samples by straight-line closest approach (within half a step)
  minDistanceJdTDB: number;
  /** Rotating-frame position (au) at phiTimesJd; present only with the rotatingFrame option. */
  rotatingXAu?: Float64Array;
  rotatingYAu?: Float64Array;
}

/** The grids and the bodies' sampled motion. */
export interface CoorbitalSampling {
  timesJd: Float64Array; // the planetocentric samples
  epochIndex: number; // timesJd[epochIndex] = epoch
  phiTimesJd: Float64Array; // every phiStride-th of timesJd, from the first
  phiStride: number;
  bodies: CoorbitalSamples[];
  integratorSteps: number; // accepted steps, both directions
  /** The planet's distance (au) from the Sun in the ecliptic plane at phiTimesJd; with rotatingFrame only. */
  planetDistanceAu?: Float64Array;
}

/** The planet's ephemeris body: 'emb' for 'earth' (the Earth–Moon barycentre). */
export function planetEphemerisBody(planet: PlanetName): EphemerisBody {
  return planet === 'earth' ? 'emb' : planet;
}

/** Osculating heliocentric period (days) of the planet at `jdTDB`, with GM_sun + GM_planet. */
export function planetPeriodDays(eph: Ephemeris, planet: PlanetName, jdTDB: number): number {
  const s = new Float64Array(6);
  eph.helioState(planetEphemerisBody(planet), jdTDB, s, 0);
  const gm = planetKeplerGmAu3PerDay2(planet);
  const aAu = 1 / (2 / Math.hypot(s[0], s[1], s[2]) - (s[3] ** 2 + s[4] ** 2 + s[5] ** 2) / gm); // vis-viva
  return 2 * Math.PI * Math.sqrt(aAu ** 3 / gm); // Kepler's third law
}

/** Sample spacing (days) and grid: epoch + k·step, |k| ≤ nSide (a multiple of the φ stride). */
interface SampleGrid {
  stepDays: number;
  phiStride: number;
  timesJd: Float64Array;
  epochIndex: number;
}

/** The grid over epoch ± window, ascending. */
function sampleGrid(epochJdTDB: number, windowDays: number, stepDays: number, phiStride: number): SampleGrid {
  const nSide = phiStride * Math.floor(windowDays / (stepDays * phiStride) + 1e-9);
  const timesJd = new Float64Array(2 * nSide + 1);
  for (let k = 0; k < timesJd.length; k++) timesJd[k] = epochJdTDB + (k - nSide) * stepDays;
  return { stepDays, phiStride, timesJd, epochIndex: nSide };
}

/** A cache over [start, end] (± a day) filled up front for the eight planet systems. */
export function createWindowEphemeris(startJdTDB: number, endJdTDB: number): Ephemeris {
  return createEphemeris({
    startJdTDB: startJdTDB - 1, endJdTDB: endJdTDB + 1, eager: PLANET_SYSTEM_BODIES, fitToleranceAu: DYNAMICS_FIT_TOLERANCE_AU,
  });
}

/** What one sample needs, allocated once per run. */
interface SampleContext {
  eph: Ephemeris;
  planetBody: EphemerisBody;
  planetGm: number; // GM of the planet system (planetocentric energy)
  planetKeplerGm: number; // GM_sun + GM_planet (the planet's mean longitude)
  halfStepDays: number;
  phiStride: number; // φ at the grid indices that are multiples of it
  out: CoorbitalSamples[];
  planetState: Float64Array; // 6
  bodyState: Float64Array; // 6
  approach: Float64Array; // 2: closest-approach scratch
  planetDistanceAu: Float64Array | null; // at the φ samples, with the rotatingFrame option
  captureZoneAu: number | undefined; // the rotating-frame angle only within it
}

/**
 * Straight-line closest approach to the planet within ±halfStep of the sample (common
 * practice): distance (au) into ca[0], its time offset (days) into ca[1].
 */
function closestApproachInto(b: Float64Array, p: Float64Array, halfStepDays: number, ca: Float64Array): void {
  const dx = b[0] - p[0], dy = b[1] - p[1], dz = b[2] - p[2];
  const du = b[3] - p[3], dv = b[4] - p[4], dw = b[5] - p[5];
  const u2 = du * du + dv * dv + dw * dw;
  let dt = u2 > 0 ? -(dx * du + dy * dv + dz * dw) / u2 : 0;
  dt = Math.max(-halfStepDays, Math.min(halfStepDays, dt));
  ca[0] = Math.hypot(dx + du * dt, dy + dv * dt, dz + dw * dt);
  ca[1] = dt;
}

/** Record sample k at tJd from positions x[xo + 3i] and velocities v[vo + 3i] of the bodies. */
function recordSample(ctx: SampleContext, k: number, tJd: number, x: Float64Array, xo: number, v: Float64Array, vo: number): void {
  const ps = ctx.planetState, bs = ctx.bodyState;
  ctx.eph.helioState(ctx.planetBody, tJd, ps, 0);
  const withPhi = k % ctx.phiStride === 0;
  const lambdaP = withPhi ? meanLongitudeRad(ps, ctx.planetKeplerGm) : NaN;
  // Rotation by −L_P about the ecliptic pole (the frame of CoorbitalSamplingOptions.rotatingFrame).
  const rotating = withPhi && ctx.planetDistanceAu !== null;
  const rPlanet = rotating ? Math.hypot(ps[0], ps[1]) : NaN;
  const cosL = ps[0] / rPlanet, sinL = ps[1] / rPlanet;
  if (rotating) ctx.planetDistanceAu![k / ctx.phiStride] = rPlanet;
  for (let i = 0; i < ctx.out.length; i++) {
    for (let c = 0; c < 3; c++) { bs[c] = x[xo + 3 * i + c]; bs[3 + c] = v[vo + 3 * i + c]; }
    const s = ctx.out[i];
    // φ in (−π, π]; NaN (a non-elliptic orbit) stays NaN.
    if (withPhi) s.phiUnwrappedRad[k / ctx.phiStride] = -wrapPi(lambdaP - meanLongitudeRad(bs, GM_SUN_AU3_PER_DAY2));
    if (rotating && s.rotatingXAu && s.rotatingYAu) {
      s.rotatingXAu[k / ctx.phiStride] = cosL * bs[0] + sinL * bs[1];
      s.rotatingYAu[k / ctx.phiStride] = -sinL * bs[0] + cosL * bs[1];
    }
    planetocentricSampleInto(bs, 0, ps, 0, ctx.planetGm, s.planetocentric, k, ctx.captureZoneAu);
    closestApproachInto(bs, ps, ctx.halfStepDays, ctx.approach);
    if (ctx.approach[0] < s.minDistanceAu) { s.minDistanceAu = ctx.approach[0]; s.minDistanceJdTDB = tJd + ctx.approach[1]; }
  }
}

/** Integrate over the grid indices from `from` to `to` (inclusive, either direction), recording each sample. */
function runDirection(
  integrator: GaussRadauIntegrator, timesJd: Float64Array, from: number, to: number, ctx: SampleContext,
): void {
  const dir = to >= from ? 1 : -1;
  const dim = integrator.dim;
  const chunkTimes = new Float64Array(CHUNK);
  const buf = new Float64Array(2 * dim * CHUNK);
  let k = from;
  while (dir * (to - k) >= 0) {
    const m = Math.min(CHUNK, dir * (to - k) + 1);
    for (let j = 0; j < m; j++) chunkTimes[j] = timesJd[k + dir * j];
    integrator.integrateTo(chunkTimes[m - 1], chunkTimes.subarray(0, m), buf);
    for (let j = 0; j < m; j++) recordSample(ctx, k + dir * j, chunkTimes[j], buf, 2 * dim * j, buf, 2 * dim * j + dim);
    k += dir * m;
  }
}

/** Replace NaN entries by the nearest earlier finite one (the first finite one at the start). */
function holdNaNInPlace(a: Float64Array): void {
  let last = NaN;
  for (let k = 0; k < a.length; k++) if (Number.isFinite(a[k])) { last = a[k]; break; }
  for (let k = 0; k < a.length; k++) {
    if (Number.isFinite(a[k])) last = a[k];
    else a[k] = last;
  }
}

/** Check the options against the planet and lay out the grid. */
function checkedGrid(eph: Ephemeris, planet: PlanetName, epochJdTDB: number, opts: CoorbitalSamplingOptions): SampleGrid {
  if (!PLANETS.includes(planet)) throw new RangeError(`co-orbital sampling: unknown planet '${planet}'`);
  const windowYears = opts.windowYears ?? DEFAULT_WINDOW_YEARS;
  if (!(windowYears > 0) || !Number.isFinite(windowYears)) throw new RangeError(`co-orbital sampling: bad window ${windowYears} yr`);
  const periodDays = planetPeriodDays(eph, planet, epochJdTDB);
  const maxPhiStep = periodDays / MIN_PHI_SAMPLES_PER_PERIOD;
  const stepDays = opts.sampleStepDays ?? Math.max(MIN_DEFAULT_SAMPLE_STEP_DAYS, periodDays / DEFAULT_SAMPLES_PER_PERIOD);
  if (!(stepDays > 0 && stepDays <= maxPhiStep)) {
    throw new RangeError(`co-orbital sampling: step ${stepDays} d must be in (0, ${maxPhiStep.toFixed(2)}] d `
      + '(a twentieth of the planet\'s period)');
  }
  const windowDays = windowYears * DAYS_PER_JULIAN_YEAR;
  const grid = sampleGrid(epochJdTDB, windowDays, stepDays, Math.floor(maxPhiStep / stepDays));
  if (grid.epochIndex === 0) throw new RangeError(`co-orbital sampling: window ${windowYears} yr shorter than one φ step`);
  return grid;
}

/** The per-run context: planet constants, scratch, and the bodies' output columns. */
function sampleContext(
  eph: Ephemeris, planet: PlanetName, grid: SampleGrid, nBodies: number, rotatingFrame: boolean, captureZoneAu: number | undefined,
): SampleContext {
  const n = grid.timesJd.length;
  const nPhi = (n - 1) / grid.phiStride + 1;
  const out: CoorbitalSamples[] = [];
  for (let i = 0; i < nBodies; i++) {
    out.push({
      phiUnwrappedRad: new Float64Array(nPhi), planetocentric: createPlanetocentricSeries(n),
      minDistanceAu: Infinity, minDistanceJdTDB: NaN,
      ...(rotatingFrame ? { rotatingXAu: new Float64Array(nPhi), rotatingYAu: new Float64Array(nPhi) } : {}),
    });
  }
  return {
    eph, planetBody: planetEphemerisBody(planet), planetGm: planetGmAu3PerDay2(planet),
    planetKeplerGm: planetKeplerGmAu3PerDay2(planet), halfStepDays: grid.stepDays / 2, phiStride: grid.phiStride, out,
    planetState: new Float64Array(6), bodyState: new Float64Array(6), approach: new Float64Array(2),
    planetDistanceAu: rotatingFrame ? new Float64Array(nPhi) : null, captureZoneAu,
  };
}

/**
 * Integrate the bodies (heliocentric J2000-ecliptic states at `epochJdTDB`, 6 numbers per
 * body) over epoch ± window and sample their motion relative to `planet`.
 */
export function sampleCoorbitalMotion(
  states: Float64Array, epochJdTDB: number, planet: PlanetName, opts: CoorbitalSamplingOptions = {},
): CoorbitalSampling {
  if (!Number.isFinite(epochJdTDB)) throw new RangeError(`co-orbital sampling: non-finite epoch ${epochJdTDB}`);
  const windowDays = (opts.windowYears ?? DEFAULT_WINDOW_YEARS) * DAYS_PER_JULIAN_YEAR;
  const eph = opts.ephemeris ?? createWindowEphemeris(epochJdTDB - windowDays, epochJdTDB + windowDays);
  const grid = checkedGrid(eph, planet, epochJdTDB, opts);
  const { timesJd, epochIndex } = grid;
  const n = timesJd.length;
  const nPhi = (n - 1) / grid.phiStride + 1;
  const ctx = sampleContext(eph, planet, grid, states.length / 6, opts.rotatingFrame ?? false, opts.captureZoneAu);
  const req = {
    epochJdTDB, states, forces: { planets: PLANETS, ephemeris: eph, relativity: opts.relativity ?? true },
    integrator: { epsilon: CONFIRM_EPSILON, ...opts.integrator },
  };
  let steps = 0;
  for (const to of [n - 1, 0]) {
    const { integrator } = createTestBodyIntegrator(req, timesJd[to]);
    if (to === n - 1) recordSample(ctx, epochIndex, epochJdTDB, integrator.x, 0, integrator.v, 0);
    runDirection(integrator, timesJd, epochIndex + (to > epochIndex ? 1 : -1), to, ctx);
    steps += integrator.steps;
  }
  for (const s of ctx.out) {
    holdNaNInPlace(s.phiUnwrappedRad);
    unwrapAnglesInPlace(s.phiUnwrappedRad);
  }
  const phiTimesJd = new Float64Array(nPhi);
  for (let j = 0; j < nPhi; j++) phiTimesJd[j] = timesJd[j * grid.phiStride];
  return {
    timesJd, epochIndex, phiTimesJd, phiStride: grid.phiStride, bodies: ctx.out, integratorSteps: steps,
    ...(ctx.planetDistanceAu ? { planetDistanceAu: ctx.planetDistanceAu } : {}),
  };
}
