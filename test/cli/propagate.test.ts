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
  parseDateToJdTDB, parseElements, propagateOne, PropagateInputError, PropagateUsageError, registerPropagate, runPropagate,
  type PropagateOptions,
} from '../../src/cli/propagate.js';
import { GM_SUN_AU3_PER_DAY2, J2000_JD, KM_PER_AU } from '../../src/core/constants.js';

const CERES_LINE = '00001    3.34  0.15 K2669 274.41935   73.29420   80.24863   10.58803  0.0796923  0.21430445   2.7655526  0 MPO980521  7297 126 1801-2026 0.83 M-v 30k Veres      4000      (1) Ceres              20260103';
const CERES = 'a=2.7655526,e=0.0796923,i=10.58803,node=80.24863,peri=73.29420,M=274.41935,epoch=2461200.5';

function opts(over: Partial<PropagateOptions>): PropagateOptions {
  return { toJdTDB: 2462502.5, nbody: false, relativity: true, distances: false, format: 'text', ...over };
}

describe('propagate: two-body', () => {
  it('one Keplerian period later the body is back where it started (Kepler III)', async () => {
    const el = parseElements(CERES);
    const period = 2 * Math.PI * Math.sqrt(2.7655526 ** 3 / GM_SUN_AU3_PER_DAY2);
    const start = await propagateOne(opts({ elements: el, toJdTDB: el.epochJdTDB }));
    const later = await propagateOne(opts({ elements: el, toJdTDB: el.epochJdTDB + period }));
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
    expect(text).toMatch(/^body {5}elements\nmodel {4}two-body/);
    expect(text).toContain('from     JD 2461200.500000 TDB (2026-06-09T00:00:00 TDB)');
    expect(text).toMatch(/to {7}JD 2462502\.50\d{4} TDB \(2030-01-01T00:00:00 TDB\)/);
    expect(text).toMatch(/\n {2}x {2}[ -]\d\.\d{12} au/);
    expect(text).toMatch(/geocentric {3}\d\.\d{10} au\n$/);
  });
});

describe('propagate --nbody against astronomy-engine\'s gravity simulator', () => {
  it('Ceres over 4 years: position difference in km, and the planets matter', async () => {
    const el = parseElements(CERES);
    const target = el.epochJdTDB + 4 * 365.25;
    const nb = await propagateOne(opts({ elements: el, toJdTDB: target, nbody: true, relativity: false, distances: true }));
    const kep = await propagateOne(opts({ elements: el, toJdTDB: target }));
    const start = await propagateOne(opts({ elements: el, toJdTDB: el.epochJdTDB }));
    // astronomy-engine: equatorial J2000 states, time as TT days since J2000 (TDB − TT < 2 ms).
    const ecl2eqj = Astronomy.Rotation_ECL_EQJ();
    const t0 = Astronomy.AstroTime.FromTerrestrialTime(el.epochJdTDB - J2000_JD);
    const s = start.state;
    const eq0 = Astronomy.RotateState(ecl2eqj, new Astronomy.StateVector(s[0], s[1], s[2], s[3], s[4], s[5], t0));
    const sim = new Astronomy.GravitySimulator(Astronomy.Body.Sun, t0, [eq0]);
    let ref = eq0;
    const steps = 4 * 365 * 4; // quarter-day steps, the library asks for small increments
    for (let k = 1; k <= steps; k++) {
      ref = sim.Update(Astronomy.AstroTime.FromTerrestrialTime(el.epochJdTDB - J2000_JD + ((target - el.epochJdTDB) * k) / steps))[0];
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

  it('finds (1) Ceres by readable form, by number and by name, with the file\'s elements', async () => {
    for (const name of ['(1) Ceres', '1', 'ceres']) {
      const r = await propagateOne(opts({ designation: name, catalogue: [file], toJdTDB: parseDateToJdTDB('2026-06-09') }));
      expect(r.label).toBe('(1) Ceres');
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

  it('dates: ISO in TT by default, UTC when it says Z, bare numbers are JD (TT)', () => {
    const tt = parseDateToJdTDB('2030-01-01T00:00');
    const utc = parseDateToJdTDB('2030-01-01T00:00Z');
    // TT − UTC = 69.184 s since 2017 (IERS Bulletin C leap-second list; no leap second since).
    expect((tt - utc) * 86400).toBeCloseTo(-69.184, 2);
    expect(parseDateToJdTDB('2462502.5')).toBeCloseTo(tt, 7);
    expect(() => parseDateToJdTDB('2030-13-01')).toThrow(InvalidArgumentError);
  });

  it('a date outside the planetary ephemeris span is a usage error, never NaN', async () => {
    const el = parseElements(CERES);
    await expect(propagateOne(opts({ elements: el, toJdTDB: parseDateToJdTDB('3500-01-01'), nbody: true })))
      .rejects.toThrow(/outside the planetary ephemeris span JD 2086295–2816795/);
    await expect(propagateOne(opts({ elements: el, toJdTDB: 2462502.5, designation: 'x' })))
      .rejects.toThrow(PropagateUsageError);
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
    expect(j.semimajor.aAu).toBeCloseTo(2.7655526, 9); // two-body: a is unchanged
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

  it('an unreadable catalogue sets exit code 1 with one line on stderr', async () => {
    const r = await parse(['(1) Ceres', '--catalogue', '/nonexistent/orbits.txt', '--to', '2030-01-01']);
    expect(r.error).toBeUndefined();
    expect(r.exitCode).toBe(1);
    expect(r.stderr).toMatch(/^wayward: .*orbits\.txt.*\n$/);
  });
});
