// `wayward propagate`, called through runPropagate / propagateOne as the command would.
// Outside checks: astronomy-engine 2.1.19 (an independent library: its GravitySimulator
// integrates small bodies under the Sun and planets from its own planetary model, and its
// HelioState gives the Earth); Kepler's third law (a body returns after one period,
// common practice). Elements and catalogue lines: (1) Ceres as written in the published
// one-line orbit export sample (provenance in test/fixtures/orbit-export/).
import { mkdtempSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import * as Astronomy from 'astronomy-engine';
import { Command, CommanderError, InvalidArgumentError } from 'commander';
import {
  propagateOne, PropagateUsageError, registerPropagate, runPropagate, type PropagateOptions,
} from '../../src/cli/propagate.js';
import { PropagateInputError } from '../../src/cli/propagateBody.js';
import { parseDate, parseElements, parseNonGrav } from '../../src/cli/propagateInput.js';
import { GAUSS_K, GM_SUN_AU3_PER_DAY2, J2000_JD, KM_PER_AU } from '../../src/core/constants.js';
import { Instant } from '../../src/core/time/time.js';
import { ROOT, runCli } from './cliHarness.js';

const CERES_LINE = '00001    3.34  0.15 K2669 274.41935   73.29420   80.24863   10.58803  0.0796923  0.21430445   2.7655526  0 MPO980521  7297 126 1801-2026 0.83 M-v 30k Veres      4000      (1) Ceres              20260103';
const CERES = 'a=2.7655526,e=0.0796923,i=10.58803,node=80.24863,peri=73.29420,M=274.41935,epoch=2461200.5';

function opts(over: Partial<PropagateOptions>): PropagateOptions {
  return { to: Instant.fromJd(2462502.5, 'TDB'), nbody: false, relativity: true, distances: false, format: 'text', ...over };
}

/** A date (JD TDB) as the target of a propagation. */
const tdb = (jd: number) => Instant.fromJd(jd, 'TDB');
const epochTDB = (el: ReturnType<typeof parseElements>) => el.epoch.to('TDB').jd;

describe('propagate: two-body', () => {
  it('one Keplerian period later the body is back where it started (Kepler III)', async () => {
    const el = parseElements(CERES);
    const period = 2 * Math.PI * Math.sqrt(2.7655526 ** 3 / GM_SUN_AU3_PER_DAY2);
    const start = await propagateOne(opts({ elements: el, to: tdb(epochTDB(el)) }));
    const later = await propagateOne(opts({ elements: el, to: tdb(epochTDB(el) + period) }));
    const dKm = Math.hypot(...[0, 1, 2].map((k) => later.state[k] - start.state[k])) * KM_PER_AU;
    console.log(`two-body, one period of Ceres: back within ${(dKm * 1000).toFixed(3)} m`);
    expect(dKm).toBeLessThan(1e-3);
    // The elements printed back at the epoch are the ones given.
    expect(start.semimajor!.aAu).toBeCloseTo(2.7655526, 10);
    expect(start.perihelion.e).toBeCloseTo(0.0796923, 10);
    expect(start.perihelion.iDeg).toBeCloseTo(10.58803, 8);
    expect(start.semimajor!.meanAnomalyDeg).toBeCloseTo(274.41935, 8);
  });

  it('the text output names the model, both dates and the state', async () => {
    const text = await runPropagate(opts({ elements: parseElements(CERES), distances: true }));
    expect(text).toMatch(/^body {5}elements from the command line\nmodel {4}two-body/);
    expect(text).toMatch(/\n {9}non-gravitational forces: none\n/);
    expect(text).toMatch(/\n {2}x {2}[ -]\d\.\d{12} au/);
    expect(text).toMatch(/geocentric {3}\d\.\d{10} au\n$/);
  });

  it('dates are shown in the scale they were given in, and in TDB', async () => {
    // The epoch is a bare Julian date, so TT; the target says Z, so UTC.
    const text = await runPropagate(opts({ elements: parseElements(CERES), to: parseDate('2030-01-01T00:00Z') }));
    expect(text).toMatch(/\nfrom {5}2026-06-09T00:00:00 TT = JD 2461200\.500000000 TT = JD 2461200\.50000\d{4} TDB\n/);
    // TT − UTC = 69.184 s since 2017 (IERS Bulletin C leap-second list); TDB − TT < 2 ms
    // (IAU 2006 Resolution B3), so the TDB date is 0.000800 7–0.000800 8 day after UTC's.
    expect(text).toMatch(/\nto {7}2030-01-01T00:00:00Z = JD 2462502\.500000000 UTC = JD 2462502\.5008007\d{2} TDB\n/);
    const j = JSON.parse(await runPropagate(opts({ elements: parseElements(CERES), to: parseDate('2030-01-01'), format: 'json' })));
    expect(j.epoch).toMatchObject({ scale: 'TT', jd: 2461200.5, iso: '2026-06-09T00:00:00.000 TT' });
    expect(j.target).toMatchObject({ scale: 'TT', jd: 2462502.5 });
    expect(Math.abs(j.target.tdb.jd - 2462502.5) * 86400).toBeLessThan(0.002); // TDB − TT < 2 ms
    expect(j.elements.tp.scale).toBe('TDB'); // computed by the dynamics
  });

  it('a hyperbolic orbit says why a and M are absent', async () => {
    const el = parseElements('q=1.2,e=1.3,i=20,node=10,peri=30,tp=2030-01-01');
    const text = await runPropagate(opts({ elements: el, to: parseDate('2030-06-01') }));
    expect(text).not.toMatch(/\n {2}a {4}/);
    expect(text).toMatch(/\n {2}a and M are not given: the orbit is hyperbolic \(e = 1\.30000000 > 1\), unbound and without a period: its semimajor axis would be negative/);
    const j = JSON.parse(await runPropagate(opts({ elements: el, to: parseDate('2030-06-01'), format: 'json' })));
    expect(j.elements.a).toBeNull();
    expect(j.elements.M).toBeNull();
    expect(j.elements.aAndMAbsentBecause).toMatch(/hyperbolic/);
    const bound = JSON.parse(await runPropagate(opts({ elements: parseElements(CERES), format: 'json' })));
    expect(bound.elements.aAndMAbsentBecause).toBeNull();
  });

  it('JSON: a labelled state, and units stated beside the numbers, never inside key names', async () => {
    const j = JSON.parse(await runPropagate(opts({ elements: parseElements(CERES), distances: true, format: 'json' })));
    expect(j.state.frame).toBe('heliocentric J2000 ecliptic');
    expect(j.state.units).toEqual({ position: 'au', velocity: 'au/day' });
    expect(Object.keys(j.state.position)).toEqual(['x', 'y', 'z']);
    expect(Object.keys(j.state.velocity)).toEqual(['x', 'y', 'z']);
    expect(j.elements.units).toMatchObject({ q: 'au', a: 'au', i: 'deg' });
    expect(j.distances.units).toEqual({ heliocentric: 'au', geocentric: 'au' });
    // Two-body: a is unchanged (Kepler), as the text says
    expect(j.elements.a).toBeCloseTo(2.7655526, 9);
    const keys: string[] = [];
    const walk = (v: unknown): void => {
      if (Array.isArray(v)) v.forEach(walk);
      else if (v !== null && typeof v === 'object') for (const [k, x] of Object.entries(v)) { keys.push(k); walk(x); }
    };
    walk(j);
    const unitInName = keys.filter((k) => /(Au|Deg|Rad|Days?|PerDay|Jd|JD|TDB|TT|Km)\d*$/.test(k) || /Au[A-Z]/.test(k));
    expect(unitInName).toEqual([]);
    expect(keys.filter((k) => !/^[A-Za-z][A-Za-z0-9]*$/.test(k))).toEqual([]); // one spelling: camelCase words
  });
});

describe('propagate --nbody against astronomy-engine\'s gravity simulator', () => {
  it('Ceres over 4 years: position difference in km, and the planets matter', async () => {
    const el = parseElements(CERES);
    const epochJdTDB = epochTDB(el);
    const target = epochJdTDB + 4 * 365.25;
    const nb = await propagateOne(opts({ elements: el, to: tdb(target), nbody: true, relativity: false, distances: true }));
    const kep = await propagateOne(opts({ elements: el, to: tdb(target) }));
    const start = await propagateOne(opts({ elements: el, to: tdb(epochJdTDB) }));
    // astronomy-engine: equatorial J2000 states, time as TT days since J2000 (TDB − TT < 2 ms).
    const ecl2eqj = Astronomy.Rotation_ECL_EQJ();
    const t0 = Astronomy.AstroTime.FromTerrestrialTime(epochJdTDB - J2000_JD);
    const s = start.state;
    const eq0 = Astronomy.RotateState(ecl2eqj, new Astronomy.StateVector(s[0], s[1], s[2], s[3], s[4], s[5], t0));
    const sim = new Astronomy.GravitySimulator(Astronomy.Body.Sun, t0, [eq0]);
    let ref = eq0;
    const steps = 4 * 365 * 4; // quarter-day steps, the library asks for small increments
    for (let k = 1; k <= steps; k++) {
      ref = sim.Update(Astronomy.AstroTime.FromTerrestrialTime(epochJdTDB - J2000_JD + ((target - epochJdTDB) * k) / steps))[0];
    }
    const back = Astronomy.RotateState(Astronomy.Rotation_EQJ_ECL(), ref);
    const dKm = Math.hypot(nb.state[0] - back.x, nb.state[1] - back.y, nb.state[2] - back.z) * KM_PER_AU;
    const perturbationKm = Math.hypot(...[0, 1, 2].map((k) => nb.state[k] - kep.state[k])) * KM_PER_AU;
    console.log(`Ceres 4 yr, N-body vs astronomy-engine: ${dKm.toFixed(0)} km; planetary perturbation itself `
      + `${perturbationKm.toFixed(0)} km`);
    // Measured 745 km against a perturbation of 1.9e6 km: the reference's own model. Its
    // simulator moves the Sun by a barycentre shift of its series planets rather than by
    // their pull; measured while writing this bound: given the library's planets, our
    // integrator still differs from it by 660 km, an RK4 of the heliocentric equations with
    // those planets agrees with ours within 1.4 km, one that moves the Sun as the library
    // does reproduces the library within 0.2 km; its quarter-day steps add 22 km. Bound
    // near 10× (was 0.005 × perturbation ≈ 9 500 km); the force model is checked to metres
    // against an independent integration in test/core/propagateOrbit.test.ts.
    expect(perturbationKm).toBeGreaterThan(1e5);
    expect(dKm).toBeLessThan(7500);
    // Geocentric distance against the library's Earth.
    const earth = Astronomy.RotateState(Astronomy.Rotation_EQJ_ECL(),
      Astronomy.HelioState(Astronomy.Body.Earth, Astronomy.AstroTime.FromTerrestrialTime(target - J2000_JD)));
    const geoRef = Math.hypot(nb.state[0] - earth.x, nb.state[1] - earth.y, nb.state[2] - earth.z);
    const geoErrKm = Math.abs(nb.distances!.geocentricAu - geoRef) * KM_PER_AU;
    console.log(`geocentric distance vs astronomy-engine's Earth: ${geoErrKm.toFixed(1)} km`);
    // Measured 110.6 km: the library's Earth (a truncated series, up to 2 200 km from VSOP87B
    // over 1900–2100) at this date. Bound near 10× (was 5 000 km); the metre-level check of the
    // geocentric distance is in test/core/propagateOrbit.test.ts.
    expect(geoErrKm).toBeLessThan(1200);
  });
});

describe('propagate: designation from a catalogue file', () => {
  const dir = mkdtempSync(join(tmpdir(), 'wayward-propagate-'));
  const file = join(dir, 'orbits.txt');
  writeFileSync(file, CERES_LINE + '\n');

  it('finds (1) Ceres by readable form, number, packed number and name, with the file\'s elements', async () => {
    for (const name of ['(1) Ceres', '1', '(1)', '00001', 'ceres', 'CERES']) {
      const r = await propagateOne(opts({ designation: name, catalogue: [file], to: parseDate('2026-06-09') }));
      expect(r.body.label, name).toBe('(1) Ceres');
      expect(r.body.source).toBe(`${file}:1`);
      expect(r.semimajor!.aAu).toBeCloseTo(2.7655526, 9);
      expect(r.perihelion.nodeDeg).toBeCloseTo(80.24863, 8);
    }
  });

  it('an unknown designation or an unreadable file is an input error (exit 1)', async () => {
    await expect(propagateOne(opts({ designation: '(2) Pallas', catalogue: [file] })))
      .rejects.toThrow(PropagateInputError);
    await expect(propagateOne(opts({ designation: '(1) Ceres', catalogue: [join(dir, 'missing.txt')] })))
      .rejects.toThrow(/missing\.txt/);
  });
});

// The demo catalogue is invented (data/demo/README.md); each line carries its packed and
// readable designation side by side, so the pairs below are the file's own.
const DEMO_ORBITS = join(ROOT, 'data/demo/orbits.txt');
const DEMO_COMETS = join(ROOT, 'data/demo/comets.txt');

describe('propagate: finding a body in the demo catalogue', () => {
  it.each([
    ['2030 CO1', '2030 CO1'], ['2030CO1', '2030 CO1'], ['2030 co1', '2030 CO1'], ['K30C01O', '2030 CO1'],
    ['9000001', '(9000001)'], ['(9000001)', '(9000001)'], ['~ZA1J', '(9000001)'],
  ])('%s → %s', async (query, label) => {
    const r = await propagateOne(opts({ designation: query, catalogue: [DEMO_ORBITS] }));
    expect(r.body.label).toBe(label);
  });

  it('comets by packed or readable designation; the name column travels with them', async () => {
    for (const q of ['PK32D010', 'P/2032 D1', 'p/2032d1']) {
      const r = await propagateOne(opts({ designation: q, catalogue: [DEMO_ORBITS, DEMO_COMETS] }));
      expect(r.body.label).toBe('P/2032 D1 (Larkspur)');
      expect(r.body).toMatchObject({ kind: 'comet', name: 'Larkspur', source: `${DEMO_COMETS}:1` });
    }
  });

  it('a name several bodies share lists them and asks for one (exit 1)', async () => {
    // 26 demo comets are called Larkspur (data/demo/comets.txt).
    const err = await propagateOne(opts({ designation: 'Larkspur', catalogue: [DEMO_COMETS] })).catch((e: unknown) => e);
    expect(err).toBeInstanceOf(PropagateInputError);
    expect((err as Error).message).toMatch(/^'Larkspur' matches 26 bodies by name in .*comets\.txt \(312 bodies accepted\): P\/2032 D1 \(Larkspur\); P\/2031 L1 \(Larkspur\);/);
    expect((err as Error).message).toMatch(/, and 16 more; give one designation or number$/);
  });

  it('a miss lists the nearest spellings', async () => {
    const miss = (q: string, files: string[]) => propagateOne(opts({ designation: q, catalogue: files })).catch((e: unknown) => e as Error);
    expect((await miss('2030 CO1x', [DEMO_ORBITS])).message).toMatch(/^'2030 CO1x' is not a number, designation or name in .*; nearest: 2030 CO1; /);
    expect((await miss('Holowmere', [DEMO_COMETS])).message).toMatch(/; nearest: [CP]\/20\d\d \w+ \(Hollowmere\);/);
    expect((await miss('Larkspur', [DEMO_ORBITS])).message).toMatch(/; no number, designation or name is within 3 edits of it$/);
  });
});

describe('propagate: what the orbit can and cannot support', () => {
  it('prints the quality flags, and warns plainly about a poor orbit', async () => {
    // Line 18606 of the demo file: 2031 VO4, one opposition, 20 observations over 14 days, U 7.
    const poor = await runPropagate(opts({ designation: '2031 VO4', catalogue: [DEMO_ORBITS] }));
    expect(poor).toMatch(/\nquality {2}U 7, observations 20, arc 14 days; flags: single-opposition, short-arc, poor-uncertainty\n/);
    expect(poor).toMatch(/\nwarning: poor orbit \(single-opposition, short-arc, poor-uncertainty\): the propagated position carries a large uncertainty that this command does not quantify/);
    const good = await runPropagate(opts({ designation: '2030 CO1', catalogue: [DEMO_ORBITS] }));
    expect(good).toMatch(/\nquality {2}U 1, observations 83, arc \d+ days; flags: none\n/);
    expect(good).not.toMatch(/warning/);
    const j = JSON.parse(await runPropagate(opts({ designation: '2031 VO4', catalogue: [DEMO_ORBITS], format: 'json' })));
    expect(j.body.quality).toMatchObject({ uncertainty: 7, observations: 20, arc: 14, units: { arc: 'days' } });
    expect(j.warnings).toHaveLength(1);
  });

  it('a comet says it is propagated without non-gravitational forces unless they are given', async () => {
    const bare = await runPropagate(opts({ designation: 'P/2031 K1', catalogue: [DEMO_COMETS] }));
    expect(bare).toMatch(/\nnote: comet propagated without non-gravitational \(outgassing\) forces: none were given/);
    const asteroid = await runPropagate(opts({ designation: '2030 CO1', catalogue: [DEMO_ORBITS] }));
    expect(asteroid).not.toMatch(/note: comet/);
    const withForces = await runPropagate(opts({
      designation: 'P/2031 K1', catalogue: [DEMO_COMETS], nbody: true, to: parseDate('2033-01-01'),
      nonGravAuPerDay2: parseNonGrav('A1=1e-8,A2=-2e-9'),
    }));
    expect(withForces).not.toMatch(/note: comet/);
    expect(withForces).toMatch(/\n {9}non-gravitational forces: A1 1e-8, A2 -2e-9, A3 0 au\/day²\n/);
  });

  it('--nongrav: a transverse A2 raises a circular orbit\'s a at 2 A2 g(r)/n (Gauss\'s equations)', async () => {
    // da/dt = (2 a²/h)(e sin f R + (p/r) T) (Burns 1976, Am. J. Phys. 44, 944, eq. for a;
    // from memory), for e = 0 da/dt = 2 T / n. T = A2 g(r) with g(1 au) = 1 for the water-ice
    // law (Marsden, Sekanina & Yeomans 1973, AJ 78, 211: the law is normalised at 1 au);
    // n = k = 0.01720209895 rad/day at a = 1 au (IAU Gaussian constant). The planets act on
    // both runs alike, so the difference of a isolates the non-gravitational push. The body
    // stays about 2 au from the Earth (opposite longitude, i = 60°).
    const el = parseElements('a=1,e=0,i=60,node=0,peri=0,M=280,epoch=2030-01-01');
    const oneYear = parseDate('2031-01-01');
    const a2 = 1e-8;
    const run = (nonGrav: [number, number, number] | null) =>
      propagateOne(opts({ elements: el, to: oneYear, nbody: true, nonGravAuPerDay2: nonGrav }));
    const [pushed, free] = await Promise.all([run([0, a2, 0]), run(null)]);
    const daAu = pushed.semimajor!.aAu - free.semimajor!.aAu;
    const expectedAu = (2 * a2 / GAUSS_K) * 365;
    console.log(`A2 = 1e-8 au/day² for a year: Δa ${daAu.toExponential(4)} au, Gauss ${expectedAu.toExponential(4)} au`);
    // Measured 9e-5 relative (g(1 au) = 0.99995 and the slow growth of r account for it).
    expect(Math.abs(daAu / expectedAu - 1)).toBeLessThan(1e-3);
  });
});

describe('propagate: bad input is refused at the boundary', () => {
  it('non-finite, missing or contradictory elements → InvalidArgumentError with the reason', () => {
    expect(() => parseElements('a=2.7,e=NaN,i=1,node=1,peri=1,M=1,epoch=2461200.5')).toThrow(/e='NaN' is not a finite number/);
    expect(() => parseElements('a=Infinity,e=0.1,i=1,node=1,peri=1,M=1,epoch=2461200.5')).toThrow(InvalidArgumentError);
    expect(() => parseElements('a=2.7,e=0.1,i=1,node=1,peri=1')).toThrow(/elements lack M, epoch/);
    expect(() => parseElements('a=2.7,q=2,e=0.1,i=1,node=1,peri=1,M=1,epoch=1')).toThrow(/either q/);
    // An element of the other form is refused, not silently ignored.
    expect(() => parseElements('q=1,e=0.1,i=1,node=1,peri=1,tp=2461200.5,M=30')).toThrow(/M goes with a/);
    expect(() => parseElements('a=2.7,e=0.1,i=1,node=1,peri=1,M=1,epoch=2461200.5,tp=2461000.5')).toThrow(/tp goes with q/);
    expect(() => parseElements('a=-2.7,e=0.1,i=1,node=1,peri=1,M=1,epoch=2461200.5')).toThrow(/must be > 0/);
    expect(() => parseElements('q=1,e=-0.1,i=1,node=1,peri=1,tp=2461200.5')).toThrow(/e=-0.1 must be ≥ 0/);
    expect(() => parseElements('q=1,e=0.1,i=200,node=1,peri=1,tp=2461200.5')).toThrow(/0–180/);
    expect(() => parseElements('q=1,e=0.1,i=1,node=1,peri=1,tp=yesterday')).toThrow(/neither an ISO date/);
    expect(() => parseElements('x=1')).toThrow(/key one of/);
  });

  it('dates: ISO in TT by default, UTC when it says Z, bare numbers are JD (TT); the scale is kept', () => {
    const tt = parseDate('2030-01-01T00:00');
    const utc = parseDate('2030-01-01T00:00Z');
    expect([tt.scale, utc.scale, parseDate('2462502.5').scale, parseDate('2030-01-01T00:00 TDB').scale]).toEqual(['TT', 'UTC', 'TT', 'TDB']);
    // TT − UTC = 69.184 s since 2017 (IERS Bulletin C leap-second list; no leap second since).
    expect(tt.secondsSince(utc)).toBeCloseTo(-69.184, 6);
    expect(parseDate('2462502.5').jd).toBe(tt.jd);
    expect(() => parseDate('2030-13-01')).toThrow(InvalidArgumentError);
  });

  it('a date outside the planetary ephemeris span is a usage error naming calendar dates, never NaN', async () => {
    const el = parseElements(CERES);
    // The span's first day, JD 2086295, is 0999-12-19 in the Julian calendar: JD 2086307.5 =
    // 1000 Jan 1.0 by Meeus 1998 eq. 7.1 with B = 0 (worked by hand), 12.5 days later.
    await expect(propagateOne(opts({ elements: el, to: parseDate('3500-01-01'), nbody: true })))
      .rejects.toThrow(/^dates 2026-06-09 to 3500-01-01 \(JD 2461200\.5–2999408\.5 TDB\) lie outside the planetary ephemeris span 0999-12-19 \(Julian calendar\) to 3000-01-08 \(JD 2086295–2816795 TDB\)$/);
    await expect(propagateOne(opts({ elements: el, designation: 'x' })))
      .rejects.toThrow(PropagateUsageError);
  });

  it('options that would be silently ignored are usage errors', async () => {
    const el = parseElements(CERES);
    await expect(propagateOne(opts({ elements: el, relativity: false })))
      .rejects.toThrow(/^--no-relativity applies only with --nbody/);
    await expect(propagateOne(opts({ elements: el, nonGravAuPerDay2: [1e-8, 0, 0] })))
      .rejects.toThrow(/^--nongrav applies only with --nbody/);
    expect(() => parseNonGrav('A1=1e-8,B=2')).toThrow(/key one of A1, A2, A3/);
    expect(() => parseNonGrav('A2=3')).toThrow(/implausibly large/);
    expect(parseNonGrav('a2=-2e-9')).toEqual([0, -2e-9, 0]);
  });
});

describe('propagate: the registered command and its exit codes', () => {
  /** Parse argv with the command registered on a fresh program; capture what it writes. */
  async function parse(args: string[]): Promise<{ error: unknown; stdout: string; stderr: string; exitCode: unknown }> {
    const program = new Command().exitOverride().configureOutput({ writeErr: () => {}, writeOut: () => {} });
    registerPropagate(program);
    let stdout = '', stderr = '';
    const out = process.stdout.write, err = process.stderr.write;
    const before = process.exitCode;
    process.stdout.write = ((s: string) => { stdout += s; return true; }) as typeof process.stdout.write;
    process.stderr.write = ((s: string) => { stderr += s; return true; }) as typeof process.stderr.write;
    let error: unknown;
    try {
      await program.parseAsync(['node', 'wayward', 'propagate', ...args]);
    } catch (e) {
      error = e;
    } finally {
      process.stdout.write = out;
      process.stderr.write = err;
    }
    const exitCode = process.exitCode;
    process.exitCode = before;
    return { error, stdout, stderr, exitCode };
  }

  it('prints the propagation (exit 0)', async () => {
    const r = await parse(['--elements', CERES, '--to', '2030-01-01', '--format', 'json']);
    expect(r.error).toBeUndefined();
    const j = JSON.parse(r.stdout);
    expect(j.elements.a).toBeCloseTo(2.7655526, 9); // two-body: a is unchanged
  });

  it('bad elements and out-of-span dates are commander usage errors (exit 2 in main)', async () => {
    const bad = await parse(['--elements', 'a=2.7,e=oops,i=1,node=1,peri=1,M=1,epoch=2461200.5', '--to', '2030-01-01']);
    expect(bad.error).toBeInstanceOf(CommanderError);
    expect((bad.error as CommanderError).code).toBe('commander.invalidArgument');
    const span = await parse(['--elements', CERES, '--to', '3500-01-01', '--nbody']);
    expect(span.error).toBeInstanceOf(CommanderError);
    expect((span.error as CommanderError).exitCode).toBe(2);
    expect((span.error as CommanderError).message).toMatch(/outside the planetary ephemeris span/);
    const noTo = await parse(['--elements', CERES]);
    expect(noTo.error).toBeInstanceOf(CommanderError);
  });

  it('--no-relativity or --nongrav without --nbody is a usage error (exit 2)', async () => {
    for (const extra of [['--no-relativity'], ['--nongrav', 'A1=1e-8']]) {
      const r = await parse(['--elements', CERES, '--to', '2030-01-01', ...extra]);
      expect(r.error, extra[0]).toBeInstanceOf(CommanderError);
      expect((r.error as CommanderError).exitCode).toBe(2);
      expect((r.error as CommanderError).message).toMatch(new RegExp(`^wayward: ${extra[0]} applies only with --nbody`));
    }
    const ok = await parse(['--elements', CERES, '--to', '2027-01-01', '--nbody', '--no-relativity', '--format', 'json']);
    expect(ok.error).toBeUndefined();
    expect(JSON.parse(ok.stdout).model).toMatchObject({ planets: true, relativity: false });
  });

  it('an unreadable catalogue sets exit code 1 with one line on stderr', async () => {
    const r = await parse(['(1) Ceres', '--catalogue', '/nonexistent/orbits.txt', '--to', '2030-01-01']);
    expect(r.error).toBeUndefined();
    expect(r.exitCode).toBe(1);
    expect(r.stderr).toMatch(/^wayward: .*orbits\.txt.*\n$/);
  });
});

describe('propagate: the built program (dist/) on the demo catalogue', () => {
  it('finds K30C01O and 2030CO1, prints the state; a miss exits 1 with near matches; --no-relativity alone exits 2', () => {
    for (const q of ['K30C01O', '2030CO1']) {
      const r = runCli(['propagate', q, '--catalogue', 'data/demo/orbits.txt', '--to', '2035-01-01', '--format', 'json']);
      expect(r.status, r.stderr).toBe(0);
      const j = JSON.parse(r.stdout);
      expect(j.body).toMatchObject({ label: '2030 CO1', source: 'data/demo/orbits.txt:13889', matchedBy: 'designation' });
      expect(j.state.frame).toBe('heliocentric J2000 ecliptic');
    }
    const miss = runCli(['propagate', '2030 CO1x', '--catalogue', 'data/demo/orbits.txt', '--to', '2035-01-01']);
    expect(miss.status).toBe(1);
    expect(miss.stdout).toBe('');
    expect(miss.stderr).toMatch(/^wayward: '2030 CO1x' is not a number, designation or name in data\/demo\/orbits\.txt \(\d+ bodies accepted\); nearest: 2030 CO1; .*\n$/);
    const usage = runCli(['propagate', 'K30C01O', '--catalogue', 'data/demo/orbits.txt', '--to', '2035-01-01', '--no-relativity']);
    expect(usage.status).toBe(2);
    expect(usage.stderr).toMatch(/--no-relativity applies only with --nbody/);
  });
});
