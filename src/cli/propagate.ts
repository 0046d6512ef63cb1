/**
 * `wayward propagate`: one body's orbit carried to another date, two-body (default) or with
 * the Sun, eight planets and the Sun's 1PN term (--nbody), optionally with a comet's
 * non-gravitational parameters (--nongrav, with --nbody). The command parses and validates
 * (./propagateInput.ts), finds the body (./propagateBody.ts over src/clean/bodyLookup.ts), and
 * formats the answer (./propagateFormat.ts); the physics is core's propagateOrbit.
 * runPropagate returns the text, so tests call it directly.
 */
import { Command, Option } from 'commander';
import { DEG_PER_RAD, RAD_PER_DEG } from '../core/constants.js';
import { Instant } from '../core/time/time.js';
import { EphemerisSpanError, propagateOrbit } from '../core/propagate/propagateOrbit.js';
import type { OrbitElements, OrbitPropagation } from '../core/propagate/propagateOrbit.js';
import { withDefault } from './optionDefault.js';
import { parseOutputFormat } from './optionParsers.js';
import { bodyFromCatalogue, COMMAND_LINE_BODY, PropagateInputError, type BodyInfo } from './propagateBody.js';
import { formatPropagation } from './propagateFormat.js';
import { parseDate, parseElements, parseNonGrav, type ElementsSpec } from './propagateInput.js';

export interface PropagateOptions {
  elements?: ElementsSpec;
  designation?: string; // looked up in `catalogue`: number, packed or readable designation, name
  catalogue?: string[];
  to: Instant; // target date, in the scale it was given in
  nbody: boolean;
  relativity: boolean; // false only with nbody
  nonGravAuPerDay2?: [number, number, number] | null; // A1, A2, A3; only with nbody
  distances: boolean;
  format: 'text' | 'json';
}

/** A request that cannot be served as asked (exit code 2). */
export class PropagateUsageError extends Error {
  constructor(message: string) {
    super(message);
    this.name = 'PropagateUsageError';
  }
}

export interface PropagateResult {
  body: BodyInfo;
  model: { description: string; planets: boolean; relativity: boolean; nonGravAuPerDay2: [number, number, number] | null; steps: number | null };
  epoch: Instant; // the elements' epoch, in the scale it was given in
  target: Instant; // the target date, in the scale it was given in
  state: number[]; // x, y, z au; vx, vy, vz au/day; heliocentric J2000 ecliptic
  perihelion: { qAu: number; e: number; iDeg: number; nodeDeg: number; periDeg: number; tp: Instant };
  semimajor: { aAu: number; meanAnomalyDeg: number } | null; // null for e ≥ 1
  semimajorAbsentBecause: string; // why a and M are not given ('' when they are)
  distances: { heliocentricAu: number; geocentricAu: number } | null;
  notes: string[];
  warnings: string[];
}

/** The command's elements (degrees, dates in any scale) as the core takes them (radians, JD TDB). */
function toOrbitElements(el: ElementsSpec): OrbitElements {
  const angles = { iRad: el.iDeg * RAD_PER_DEG, nodeRad: el.nodeDeg * RAD_PER_DEG, periRad: el.periDeg * RAD_PER_DEG };
  const epochJdTDB = el.epoch.to('TDB').jd;
  return el.form === 'perihelion'
    ? { form: 'perihelion', qAu: el.qAu, e: el.e, ...angles, tpJdTDB: el.tp.to('TDB').jd, epochJdTDB }
    : { form: 'semimajor', aAu: el.aAu, e: el.e, ...angles, meanAnomalyRad: el.meanAnomalyDeg * RAD_PER_DEG, epochJdTDB };
}

/** Plain warnings on the orbit's quality and notes on what the model leaves out. */
function caveats(body: BodyInfo, opts: PropagateOptions): { notes: string[]; warnings: string[] } {
  const notes: string[] = [], warnings: string[] = [];
  const q = body.quality;
  if (q === null) notes.push('orbit quality unknown: the elements were given on the command line');
  else if (q.poor.length > 0) {
    warnings.push(`poor orbit (${q.poor.join(', ')}): the propagated position carries a large uncertainty `
      + 'that this command does not quantify; treat it as a rough guide only');
  } else if (q.unknown) {
    warnings.push('orbit quality unknown (the input gives no uncertainty parameter, arc or observation count): '
      + 'the propagated position may carry a large uncertainty that this command does not quantify');
  }
  const nonGrav = opts.nonGravAuPerDay2 ?? null;
  if (body.kind === 'comet' && nonGrav === null) {
    notes.push('comet propagated without non-gravitational (outgassing) forces: none were given '
      + '(--nbody --nongrav A1=…,A2=…,A3=… applies them); its position can drift far from this one');
  }
  return { notes, warnings };
}

/** Why a and M are not given for an orbit of eccentricity `e` ≥ 1. */
function semimajorAbsence(e: number): string {
  return e > 1
    ? `a and M are not given: the orbit is hyperbolic (e = ${e.toFixed(8)} > 1), unbound and without a period: `
      + 'its semimajor axis would be negative and its mean anomaly is not the elliptic one, so q, e and tp describe it'
    : 'a and M are not given: the orbit is parabolic (e = 1), unbound and without a period: '
      + 'its semimajor axis is infinite, so q, e and tp describe it';
}

function modelOf(opts: PropagateOptions): PropagateResult['model'] {
  const nonGrav = opts.nonGravAuPerDay2 ?? null;
  const description = opts.nbody
    ? `N-body: Sun + 8 planets (VSOP87B)${opts.relativity ? ' + solar 1PN' : ''}`
      + `${nonGrav ? ' + non-gravitational A1, A2, A3 (water-ice law)' : ''}, Gauss–Radau 15th order`
    : 'two-body (Sun only, universal variables)';
  return { description, planets: opts.nbody, relativity: opts.nbody && opts.relativity, nonGravAuPerDay2: nonGrav, steps: null };
}

/** Refuse option combinations that would be silently ignored. */
function checkOptions(opts: PropagateOptions): void {
  if ((opts.elements === undefined) === (opts.designation === undefined)) {
    throw new PropagateUsageError('give either --elements or a designation with --catalogue');
  }
  if (opts.designation !== undefined && (!opts.catalogue || opts.catalogue.length === 0)) {
    throw new PropagateUsageError('a designation needs --catalogue FILE');
  }
  if (!opts.nbody && !opts.relativity) {
    throw new PropagateUsageError('--no-relativity applies only with --nbody (two-body motion has no relativity term)');
  }
  if (!opts.nbody && (opts.nonGravAuPerDay2 ?? null) !== null) {
    throw new PropagateUsageError('--nongrav applies only with --nbody (the non-gravitational forces are integrated)');
  }
}

/**
 * Propagate one body as the options say: the elements from the options or the catalogue,
 * the physics in core (propagateOrbit.ts). Throws PropagateUsageError / PropagateInputError.
 */
export async function propagateOne(opts: PropagateOptions): Promise<PropagateResult> {
  checkOptions(opts);
  let body = COMMAND_LINE_BODY;
  let el: ElementsSpec;
  if (opts.elements !== undefined) el = opts.elements;
  else ({ body, el } = await bodyFromCatalogue(opts.designation!, opts.catalogue!));
  let orbit: OrbitPropagation;
  try {
    orbit = propagateOrbit(toOrbitElements(el), { ...opts, toJdTDB: opts.to.to('TDB').jd });
  } catch (err) {
    if (err instanceof EphemerisSpanError) throw new PropagateUsageError(err.message);
    throw err;
  }
  const pe = orbit.perihelion;
  return {
    body, model: { ...modelOf(opts), steps: opts.nbody ? orbit.steps : null },
    epoch: el.epoch, target: opts.to, state: Array.from(orbit.state),
    perihelion: {
      qAu: pe[0], e: pe[1], iDeg: pe[2] * DEG_PER_RAD, nodeDeg: pe[3] * DEG_PER_RAD, periDeg: pe[4] * DEG_PER_RAD,
      tp: Instant.fromJd(pe[5], 'TDB'),
    },
    semimajor: orbit.semimajor && { aAu: orbit.semimajor.aAu, meanAnomalyDeg: orbit.semimajor.meanAnomalyRad * DEG_PER_RAD },
    semimajorAbsentBecause: orbit.semimajor ? '' : semimajorAbsence(pe[1]),
    distances: opts.distances ? { heliocentricAu: orbit.heliocentricAu, geocentricAu: orbit.geocentricAu } : null,
    ...caveats(body, opts),
  };
}

/** Run the command as the CLI would and return what it prints. */
export async function runPropagate(opts: PropagateOptions): Promise<string> {
  return formatPropagation(await propagateOne(opts), opts.format);
}

interface RawPropagateFlags {
  elements?: ElementsSpec;
  catalogue?: string[];
  to: Instant;
  nbody?: boolean;
  relativity: boolean;
  nongrav?: [number, number, number];
  distances?: boolean;
  format: 'text' | 'json';
}

function collect(value: string, previous: string[] | undefined): string[] {
  return [...(previous ?? []), value];
}

export function registerPropagate(program: Command): void {
  program
    .command('propagate')
    .description("carry one body's orbit to another date: two-body, or with the Sun and planets (--nbody)")
    .argument('[body]', 'a body in the --catalogue file(s): number, packed or readable designation (blanks optional), or name')
    .addOption(new Option('--elements <list>', 'elements: "q=…,e=…,i=…,node=…,peri=…,tp=DATE[,epoch=DATE]" or "a=…,e=…,i=…,node=…,peri=…,M=…,epoch=DATE" (au, degrees, J2000 ecliptic)').argParser(parseElements))
    .option('--catalogue <file>', 'orbit file to find the body in (repeatable)', collect)
    .requiredOption('--to <date>', 'target date: ISO 8601 (TT unless it says Z/UTC/TAI/TDB) or a Julian date (TT)', parseDate)
    .option('--nbody', 'integrate with the Sun, the eight planets and the Sun\'s 1PN term instead of two-body motion')
    .option('--no-relativity', 'leave out the Sun\'s 1PN term (only with --nbody)')
    .option('--nongrav <list>', 'comet non-gravitational parameters "A1=…,A2=…,A3=…" in au/day², water-ice law (only with --nbody)', parseNonGrav)
    .option('--distances', 'also print heliocentric and geocentric distances')
    .addOption(withDefault('--format <format>', 'text or json', 'text' as 'text' | 'json', 'text', parseOutputFormat))
    .action(async function (this: Command, designation: string | undefined, flags: RawPropagateFlags) {
      try {
        const text = await runPropagate({
          elements: flags.elements, designation, catalogue: flags.catalogue, to: flags.to,
          nbody: flags.nbody === true, relativity: flags.relativity, nonGravAuPerDay2: flags.nongrav ?? null,
          distances: flags.distances === true, format: flags.format,
        });
        process.stdout.write(text);
      } catch (err) {
        if (err instanceof PropagateUsageError) this.error(`wayward: ${err.message}`, { exitCode: 2, code: 'wayward.usage' });
        if (err instanceof PropagateInputError) {
          process.stderr.write(`wayward: ${err.message}\n`);
          process.exitCode = 1;
          return;
        }
        throw err;
      }
    });
}
