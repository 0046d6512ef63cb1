// The orbit fit (src/fit/fitOrbit.ts) on synthetic astrometry: places of an invented main-belt
// orbit computed here by a small generator of the test's own — the orbit carried to each
// emission instant by a fresh N-body integration (Sun, eight planets from VSOP87B, 1PN;
// propagateTestBodies), light time solved by computeAstrometricPlace's iteration, observers
// from the real observatory-code table — with seeded Gaussian noise of 0.3″ (Box–Muller,
// common practice). What a least-squares fit must then give (common practice of statistics):
// χ² per degree of freedom near 1 (its σ is √(2/dof) ≈ 0.14 here) and each element within 3σ
// of the truth by the fit's own covariance.
import { beforeAll, describe, expect, it } from 'vitest';
import { GM_SUN_AU3_PER_DAY2, PLANETS, RAD_PER_ARCSEC } from '../../src/core/constants.js';
import { wrapPi } from '../../src/core/math.js';
import { stateToSemimajorElements } from '../../src/core/orbit/stateToElements.js';
import { semimajorElementsToState } from '../../src/core/orbit/twoBody.js';
import { planetaryEphemerisOver } from '../../src/core/propagate/propagateOrbit.js';
import { propagateTestBodies } from '../../src/core/propagate/propagateTestBodies.js';
import { seededRandom } from '../../src/core/random.js';
import type { Ephemeris } from '../../src/core/types.js';
import { computeAstrometricPlace } from '../../src/fit/astrometricPlace.js';
import { fitOrbit } from '../../src/fit/fitOrbit.js';
import type { ObservationSigma } from '../../src/fit/observationWeights.js';
import { observerPlaceOf } from '../../src/fit/observerPlace.js';
import { observerHeliocentricState } from '../../src/fit/observerPosition.js';
import { OrbitFitError } from '../../src/fit/orbitFitTypes.js';
import { readObservatoryCodes } from '../../src/io/astrometry/observatoryCodes.js';
import type { AstrometryObservation, ObservatorySite } from '../../src/io/astrometry/types.js';

const EPOCH = 2_458_000.5; // 2017-09-04 TDB
const TT_MINUS_UTC_DAYS = 69.184 / 86400; // 37 leap seconds + 32.184 s, valid 2017–2019 (leap-second table; common practice)
const NOISE_ARCSEC = 0.3;
const STATIONS = ['F51', 'G96', '568', '691', 'J75'];

let sites: ReadonlyMap<string, ObservatorySite>;
let eph: Ephemeris;
const truth = new Float64Array(6);
let clean: AstrometryObservation[] = [];
let noisy: AstrometryObservation[] = [];
let drifting: AstrometryObservation[] = []; // the same instants, the truth with A2 = A2_TRUE
const A2_TRUE = 1e-9; // au/day², invented: large enough to stand out of a 4-year arc (σ measured 1.3e-10)

function record(jdUtc: number, station: string, raRad: number, decRad: number, line: number): AstrometryObservation {
  return {
    designation: 'synthetic', packed: 'synthetic', number: NaN, provisional: '', temporary: false,
    timeJdUtc: jdUtc, timeJdTT: jdUtc + TT_MINUS_UTC_DAYS, raRad, decRad,
    raDecimals: NaN, decDecimals: NaN, raResolutionArcsec: NaN, decResolutionArcsec: NaN,
    sigmaRaCosDecArcsec: NaN, sigmaDecArcsec: NaN, correlationRaDec: NaN,
    station, kind: 'optical', observerGeocentricKm: null, rovingSite: null,
    mag: NaN, band: '', note1: '', note2: 'C', mode: '', catalogue: '', discovery: false,
    file: 'synthetic', line, lines: 1,
  };
}

/** The truth's astrometric place from a station at a UTC instant (the generator); `a2` a transverse acceleration (au/day², inverse-square law). */
function truePlace(jdUtc: number, station: string, a2 = 0): { ra: number; dec: number; elongation: number } {
  const place = observerPlaceOf(record(jdUtc, station, 0, 0, 0), sites);
  const obs = observerHeliocentricState(place, jdUtc, jdUtc + TT_MINUS_UTC_DAYS, eph);
  const body = (jd: number, out: Float64Array) => {
    if (jd === EPOCH) { out.set(truth); return; }
    propagateTestBodies({
      epochJdTDB: EPOCH, states: truth, params: a2 === 0 ? null : Float64Array.of(0, a2, 0, 0),
      forces: { planets: PLANETS, ephemeris: eph, relativity: true, nonGravLaw: 'inverse-square' },
    }, jd, out);
  };
  const p = computeAstrometricPlace(body, obs.positionIcrfAu, obs.jdTDB);
  const r = obs.positionIcrfAu;
  const u = [Math.cos(p.decRad) * Math.cos(p.raRad), Math.cos(p.decRad) * Math.sin(p.raRad), Math.sin(p.decRad)];
  const cosE = -(u[0] * r[0] + u[1] * r[1] + u[2] * r[2]) / Math.hypot(r[0], r[1], r[2]); // angle Sun–observer–body
  return { ra: p.raRad, dec: p.decRad, elongation: Math.acos(cosE) };
}

const sigmas = (n: number): ObservationSigma[] => Array.from({ length: n }, () => ({
  sigmaRaCosDecArcsec: NOISE_ARCSEC, sigmaDecArcsec: NOISE_ARCSEC, correlation: 0, source: 'record', nightCount: 1, nightFactor: 1,
}));

beforeAll(async () => {
  sites = (await readObservatoryCodes(new URL('../fixtures/astrometry/observatory-codes.txt', import.meta.url).pathname)).sites;
  eph = planetaryEphemerisOver(EPOCH - 800, EPOCH + 800);
  semimajorElementsToState(2.62, 0.17, 0.14, 1.3, 4.4, 2.0, GM_SUN_AU3_PER_DAY2, truth); // invented
  const random = seededRandom(20261203);
  const gauss = () => Math.sqrt(-2 * Math.log(1 - random())) * Math.cos(2 * Math.PI * random());
  // Nights every 9 days over ±2.2 years when the body is more than 110° from the Sun; two
  // observations 40 minutes apart from a station taken in turn.
  let line = 0;
  for (let day = -800; day <= 800; day += 9) {
    const station = STATIONS[line % STATIONS.length];
    const jd = EPOCH + day + 0.3;
    const first = truePlace(jd, station);
    if (first.elongation < (110 * Math.PI) / 180) continue;
    for (const dt of [0, 0.028]) {
      const t = truePlace(jd + dt, station);
      line++;
      clean.push(record(jd + dt, station, t.ra, t.dec, line));
      const dRa = (gauss() * NOISE_ARCSEC * RAD_PER_ARCSEC) / Math.cos(t.dec);
      const dDec = gauss() * NOISE_ARCSEC * RAD_PER_ARCSEC;
      noisy.push(record(jd + dt, station, t.ra + dRa, t.dec + dDec, line));
      const g = truePlace(jd + dt, station, A2_TRUE);
      drifting.push(record(jd + dt, station, g.ra + dRa, g.dec + dDec, line));
    }
  }
}, 120_000);

function perturbedStart(): Float64Array {
  return Float64Array.from(truth, (x, i) => x + (i < 3 ? 2e-4 : 3e-6) * (i % 2 === 0 ? 1 : -1));
}

describe('orbit fit on synthetic observations of a known orbit', () => {
  it('without noise the fit returns the truth (state within 1e-9 au)', () => {
    const fit = fitOrbit(clean, sites, { kind: 'state', epochJdTDB: EPOCH, state: perturbedStart() }, { sigmas: sigmas(clean.length), reject: false, ephemeris: eph });
    const dr = Math.hypot(fit.state[0] - truth[0], fit.state[1] - truth[1], fit.state[2] - truth[2]);
    console.log(`synthetic, exact places: ${clean.length} observations, |Δr| ${dr.toExponential(2)} au, RMS ${fit.rmsArcsec.toExponential(2)}″, ${fit.iterations} iterations`);
    // The generator and the fit differ in how they carry the orbit to the emission instant
    // (a fresh integration vs dense output and a local expansion): measured 7e-6″ RMS, 5e-11 au.
    expect(dr).toBeLessThan(1e-9);
    expect(fit.rmsArcsec).toBeLessThan(1e-4);
  });

  it('with 0.3″ noise: χ²/dof near 1 and every element within 3σ of the truth', () => {
    const fit = fitOrbit(noisy, sites, { kind: 'state', epochJdTDB: EPOCH, state: perturbedStart() }, { sigmas: sigmas(noisy.length), reject: false, ephemeris: eph });
    const perDof = fit.chi2 / fit.degreesOfFreedom;
    const el = new Float64Array(6);
    stateToSemimajorElements(truth, GM_SUN_AU3_PER_DAY2, el);
    const pulls = Array.from(fit.elements.elements, (x, i) => (i >= 2 ? wrapPi(x - el[i]) : x - el[i]) / fit.elements.sigmas[i]);
    const statePulls = Array.from(fit.state, (x, i) => (x - truth[i]) / Math.sqrt(fit.covariance[7 * i]));
    console.log(`synthetic, 0.3″ noise: ${fit.kept} observations, χ²/dof ${perDof.toFixed(3)} (dof ${fit.degreesOfFreedom}), weighted RMS ${fit.weightedRmsArcsec.toFixed(3)}″, `
      + `element pulls ${pulls.map((x) => x.toFixed(2)).join(' ')}, state pulls ${statePulls.map((x) => x.toFixed(2)).join(' ')}, σ(a) ${fit.elements.sigmas[0].toExponential(2)} au`);
    expect(fit.kept).toBe(noisy.length);
    expect(Math.abs(perDof - 1)).toBeLessThan(3 * Math.sqrt(2 / fit.degreesOfFreedom));
    for (const p of [...pulls, ...statePulls]) expect(Math.abs(p)).toBeLessThan(3);
  });

  it('rejects planted 5″ outliers and keeps the rest', () => {
    const planted = new Set([4, 17, 30]);
    const obs = noisy.map((o, k) => (planted.has(k) ? { ...o, decRad: o.decRad + 5 * RAD_PER_ARCSEC } : o));
    const fit = fitOrbit(obs, sites, { kind: 'state', epochJdTDB: EPOCH, state: perturbedStart() }, { sigmas: sigmas(obs.length), ephemeris: eph });
    const rejected = fit.observations.flatMap((o, k) => (o.status === 'rejected' ? [k] : []));
    console.log(`synthetic with 3 planted outliers: rejected ${rejected.join(', ')}; their χ² ${rejected.map((k) => fit.observations[k].chi2.toFixed(0)).join(', ')}`);
    for (const k of planted) expect(fit.observations[k].status).toBe('rejected');
    // Gaussian noise alone passes χ²_rej = 8 with probability e⁻⁴ ≈ 1.8% (2-D χ², 2 degrees of
    // freedom): 1.6 of 88 expected, 5 or more with probability 2%. Measured: 2 strays at χ² 9.
    const strays = rejected.filter((k) => !planted.has(k));
    expect(strays.length).toBeLessThanOrEqual(4);
    for (const k of strays) expect(fit.observations[k].chi2).toBeLessThan(20);
    for (const k of planted) expect(fit.observations[k].chi2).toBeGreaterThan(100);
    // Without rejection the outliers pull the fit: its χ²/dof is far above 1.
    const all = fitOrbit(obs, sites, { kind: 'state', epochJdTDB: EPOCH, state: perturbedStart() }, { sigmas: sigmas(obs.length), reject: false, ephemeris: eph });
    expect(all.chi2 / all.degreesOfFreedom).toBeGreaterThan(2);
    expect(fit.chi2 / fit.degreesOfFreedom).toBeLessThan(1.5);
  });

  it('recovers the good observations the outliers first dragged above χ²_rej', () => {
    // Four planted 20″ outliers pull the first fit by about 1″, so in the first round many
    // good observations pass χ²_rej too; once the outliers are out they fall below χ²_rec and
    // come back. With recovery disabled (χ²_rec = 0) they stay out.
    const planted = new Set([3, 4, 5, 6]);
    const obs = noisy.map((o, k) => (planted.has(k) ? { ...o, decRad: o.decRad + 20 * RAD_PER_ARCSEC, raRad: o.raRad + 20 * RAD_PER_ARCSEC } : o));
    const start = { kind: 'state' as const, epochJdTDB: EPOCH, state: perturbedStart() };
    const fit = fitOrbit(obs, sites, start, { sigmas: sigmas(obs.length), ephemeris: eph });
    const strays = fit.observations.flatMap((o, k) => (o.status === 'rejected' && !planted.has(k) ? [o.chi2] : []));
    console.log(`4 planted 20″ outliers: ${fit.rejections} rejections, ${fit.recoveries} recoveries, ${fit.rejected} rejected at the end (others' χ² ${strays.map((c) => c.toFixed(1)).join(', ')})`);
    for (const k of planted) expect(fit.observations[k].status).toBe('rejected');
    expect(fit.recoveries).toBeGreaterThan(10);
    expect(strays.length).toBeLessThanOrEqual(4);
    for (const c of strays) expect(c).toBeLessThan(20);
    const noRecovery = fitOrbit(obs, sites, start, { sigmas: sigmas(obs.length), ephemeris: eph, reject: { chi2Reject: 8, chi2Recover: 0 } });
    console.log(`the same without recovery: ${noRecovery.rejected} rejected at the end`);
    expect(noRecovery.rejected).toBeGreaterThan(fit.rejected + 10);
  });

  it('an elements start reaches the same orbit as a state start', () => {
    const el = new Float64Array(6);
    stateToSemimajorElements(perturbedStart(), GM_SUN_AU3_PER_DAY2, el);
    const elements = { form: 'semimajor' as const, aAu: el[0], e: el[1], iRad: el[2], nodeRad: el[3], periRad: el[4], meanAnomalyRad: el[5], epochJdTDB: EPOCH };
    const opts = { sigmas: sigmas(noisy.length), reject: false as const, ephemeris: eph };
    const fromElements = fitOrbit(noisy, sites, { kind: 'elements', elements }, opts);
    const fromState = fitOrbit(noisy, sites, { kind: 'state', epochJdTDB: EPOCH, state: perturbedStart() }, opts);
    expect(fromElements.startedFrom).toBe('elements');
    for (let i = 0; i < 6; i++) {
      expect(Math.abs(fromElements.state[i] - fromState.state[i])).toBeLessThan(1e-3 * Math.sqrt(fromState.covariance[7 * i]));
    }
  });

  it('a state start can grow the arc from a window about the epoch', () => {
    const far = Float64Array.from(truth, (x, i) => x + (i < 3 ? 1e-3 : 0));
    const fit = fitOrbit(noisy, sites, { kind: 'state', epochJdTDB: EPOCH, state: far }, { sigmas: sigmas(noisy.length), ephemeris: eph, growArc: true, reject: false });
    const dr = Math.hypot(fit.state[0] - truth[0], fit.state[1] - truth[1], fit.state[2] - truth[2]);
    expect(dr).toBeLessThan(5 * Math.sqrt(fit.covariance[0] + fit.covariance[7] + fit.covariance[14]));
  });
});

describe('orbit fit with a solve-for parameter', () => {
  it('recovers a planted transverse acceleration A2 within 3σ, and gravity alone fits worse', () => {
    const start = { kind: 'state' as const, epochJdTDB: EPOCH, state: perturbedStart() };
    const fit = fitOrbit(drifting, sites, start, { sigmas: sigmas(drifting.length), ephemeris: eph, reject: false, solveFor: ['A2'], law: 'inverse-square' });
    const sigmaA2 = Math.sqrt(fit.covariance[6 * 7 + 6]);
    const pull = (fit.params[1] - A2_TRUE) / sigmaA2;
    const gravity = fitOrbit(drifting, sites, start, { sigmas: sigmas(drifting.length), ephemeris: eph, reject: false });
    console.log(`A2 planted ${A2_TRUE}: fitted ${fit.params[1].toExponential(3)} ± ${sigmaA2.toExponential(2)} au/day² (pull ${pull.toFixed(2)}), `
      + `χ²/dof ${(fit.chi2 / fit.degreesOfFreedom).toFixed(3)} with A2, ${(gravity.chi2 / gravity.degreesOfFreedom).toFixed(3)} gravity only`);
    expect(fit.columns).toEqual(['x', 'y', 'z', 'vx', 'vy', 'vz', 'A2']);
    expect(Math.abs(pull)).toBeLessThan(3);
    expect(fit.params[1] / sigmaA2).toBeGreaterThan(5);
    expect(gravity.chi2).toBeGreaterThan(fit.chi2 + 25);
  });
});

/** The OrbitFitError `run` throws (the test fails when it throws none or another). */
function fitError(run: () => unknown): OrbitFitError {
  try {
    run();
  } catch (e) {
    expect(e).toBeInstanceOf(OrbitFitError);
    return e as OrbitFitError;
  }
  throw new Error('expected an OrbitFitError, none thrown');
}

describe('orbit fit failures carry their numbers', () => {
  it('too few observations', () => {
    expect(() => fitOrbit(noisy.slice(0, 2), sites, { kind: 'state', epochJdTDB: EPOCH, state: truth }, { sigmas: sigmas(2), ephemeris: eph }))
      .toThrow(expect.objectContaining({ name: 'OrbitFitError', reason: 'too-few-observations' }));
  });
  it('a singular normal matrix: four copies of one observation', () => {
    const four = [noisy[10], noisy[10], noisy[10], noisy[10]];
    const f = fitError(() => fitOrbit(four, sites, { kind: 'state', epochJdTDB: EPOCH, state: truth }, { sigmas: sigmas(4), ephemeris: eph, reject: false }));
    expect(f.reason).toBe('singular');
    expect(f.condition).toBeGreaterThan(1e13);
    expect(f.iterations).toBe(1);
    expect(Number.isFinite(f.lastChi2)).toBe(true);
  });
  it('no convergence within the iterations allowed: diverged, with iterations and last χ²', () => {
    const far = Float64Array.from(truth, (x, i) => x + (i < 3 ? 0.05 : 0));
    const f = fitError(() => fitOrbit(noisy, sites, { kind: 'state', epochJdTDB: EPOCH, state: far }, { sigmas: sigmas(noisy.length), ephemeris: eph, maxIterations: 1, reject: false }));
    expect(f.reason).toBe('diverged');
    expect(f.iterations).toBe(1);
    expect(f.lastChi2).toBeGreaterThan(1e3);
    expect(f.message).toMatch(/1 iterations, last χ² /);
  });
});

describe('orbit fit with excluded observations', () => {
  // Three 20″ outliers (invented offsets) and one clean observation excluded by the caller. An
  // excluded observation must take no part: the fit is the fit of the others alone (the same
  // observations in the same order, so the same numbers to rounding), and it is reported as
  // 'excluded' with its residual at that solution — the planted 20″ (within 5σ of the 0.3″
  // noise, common practice), the clean one within 5σ of zero — never counted as rejected or
  // recovered, even where its χ² is below χ²_rec.
  const planted = [10, 20, 30];
  const clean = 40;
  const exclude = [...planted, clean];
  const offset = (o: AstrometryObservation, k: number): AstrometryObservation => (planted.includes(k) ? { ...o, decRad: o.decRad + 20 * RAD_PER_ARCSEC } : o);

  it('are left out of the fit, never recovered, and reported with their residuals', () => {
    const obs = noisy.map(offset);
    const start = { kind: 'state' as const, epochJdTDB: EPOCH, state: perturbedStart() };
    const fit = fitOrbit(obs, sites, start, { sigmas: sigmas(obs.length), ephemeris: eph, exclude });
    const others = obs.filter((_, k) => !exclude.includes(k));
    const alone = fitOrbit(others, sites, start, { sigmas: sigmas(others.length), ephemeris: eph });
    console.log(`excluded: residuals in δ ${exclude.map((k) => fit.observations[k].residualDecArcsec.toFixed(2)).join(', ')}″, χ² ${exclude.map((k) => fit.observations[k].chi2.toFixed(1)).join(', ')}; `
      + `${fit.rejected} rejected, ${fit.rejections} rejections, ${fit.recoveries} recoveries; the others alone: ${alone.rejected} rejected`);
    for (const k of exclude) expect(fit.observations[k].status).toBe('excluded');
    expect(fit.excluded).toBe(exclude.length);
    expect(fit.kept + fit.rejected + fit.excluded + fit.unusable).toBe(obs.length);
    // The same fit as without them: kept, rejected, rejections, recoveries, χ² and state.
    expect(fit.kept).toBe(alone.kept);
    expect(fit.rejected).toBe(alone.rejected);
    expect(fit.rejections).toBe(alone.rejections);
    expect(fit.recoveries).toBe(alone.recoveries);
    expect(fit.degreesOfFreedom).toBe(alone.degreesOfFreedom);
    expect(Math.abs(fit.chi2 - alone.chi2)).toBeLessThan(1e-9 * alone.chi2);
    for (let j = 0; j < 6; j++) expect(Math.abs(fit.state[j] - alone.state[j])).toBeLessThan(1e-12);
    // Their residuals, for the record.
    for (const k of planted) expect(Math.abs(fit.observations[k].residualDecArcsec - 20)).toBeLessThan(5 * NOISE_ARCSEC);
    expect(Math.abs(fit.observations[clean].residualDecArcsec)).toBeLessThan(5 * NOISE_ARCSEC);
    expect(Math.abs(fit.observations[clean].residualRaCosDecArcsec)).toBeLessThan(5 * NOISE_ARCSEC);
    expect(fit.observations[clean].chi2).toBeLessThan(7); // below χ²_rec, and still not recovered
    for (const k of planted) expect(fit.observations[k].chi2).toBeGreaterThan(1000);
  });

  it('refuses an index that is not one of the observations', () => {
    const start = { kind: 'state' as const, epochJdTDB: EPOCH, state: perturbedStart() };
    expect(() => fitOrbit(noisy, sites, start, { sigmas: sigmas(noisy.length), ephemeris: eph, exclude: [noisy.length] })).toThrow(RangeError);
    expect(() => fitOrbit(noisy, sites, start, { sigmas: sigmas(noisy.length), ephemeris: eph, exclude: [1.5] })).toThrow(RangeError);
  });

  it('counts the excluded ones out of the observations needed', () => {
    const few = noisy.slice(0, 5);
    const start = { kind: 'state' as const, epochJdTDB: EPOCH, state: perturbedStart() };
    const f = (() => { try { fitOrbit(few, sites, start, { sigmas: sigmas(5), ephemeris: eph, exclude: [0, 1, 2] }); } catch (e) { return e; } return null; })();
    expect(f).toBeInstanceOf(OrbitFitError);
    expect((f as OrbitFitError).reason).toBe('too-few-observations');
    expect((f as OrbitFitError).message).toMatch(/2 usable observations \(3 more excluded\) for 6 unknowns/);
  });
});
