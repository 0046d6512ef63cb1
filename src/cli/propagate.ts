/**
 * `wayward propagate`: one body's orbit carried to another date, two-body (default) or with
 * the Sun, eight planets and the Sun's 1PN term (--nbody). Prints the heliocentric J2000
 * ecliptic state, the osculating elements and, with --distances, the heliocentric and
 * geocentric distances. The command parses and validates, finds the elements and formats the
 * answer; the physics is core's propagateOrbit. runPropagate returns the text, so tests call
 * it directly.
 *
 * Time scales: dates without a scale are TT (as catalogue epochs are); 'Z'/UTC, TAI and TDB
 * in the text are honoured; a bare number is a Julian date in TT. Dynamics run in TDB.
 */
import { Command, InvalidArgumentError, Option } from 'commander';
import { DEG_PER_RAD, RAD_PER_DEG } from '../core/constants.js';
import { Instant } from '../core/time.js';
import { TimeFormatError } from '../core/isoTime.js';
import { EphemerisSpanError, propagateOrbit } from '../core/propagateOrbit.js';
import type { OrbitElements, OrbitPropagation } from '../core/propagateOrbit.js';
import { loadCatalogue } from './loadCatalogue.js';
import { parseOutputFormat } from './optionParsers.js';

/** Elements given on the command line or read from a catalogue. Angles in degrees, dates JD TDB. */
export type ElementsSpec =
  | { form: 'perihelion'; qAu: number; e: number; iDeg: number; nodeDeg: number; periDeg: number; tpJdTDB: number; epochJdTDB: number }
  | { form: 'semimajor'; aAu: number; e: number; iDeg: number; nodeDeg: number; periDeg: number; meanAnomalyDeg: number; epochJdTDB: number };

export interface PropagateOptions {
  elements?: ElementsSpec;
  designation?: string; // looked up in `catalogue`
  catalogue?: string[];
  toJdTDB: number;
  nbody: boolean;
  relativity: boolean; // only with nbody
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

/** The input does not hold what was asked for, or cannot be read (exit code 1). */
export class PropagateInputError extends Error {
  constructor(message: string) {
    super(message);
    this.name = 'PropagateInputError';
  }
}

/** ISO 8601 date-time (TT unless it names a scale) or a Julian date (TT) → JD TDB. */
export function parseDateToJdTDB(value: string): number {
  const text = value.trim();
  if (/^[+-]?\d+(\.\d*)?$/.test(text) && !/^\d{4}-/.test(text)) {
    const jd = Number(text);
    if (!Number.isFinite(jd) || jd <= 0) throw new InvalidArgumentError(`'${value}' is not a Julian date`);
    return Instant.fromJd(jd, 'TT').to('TDB').jd;
  }
  try {
    return Instant.parse(text, 'TT').to('TDB').jd;
  } catch (err) {
    if (err instanceof TimeFormatError || err instanceof RangeError) {
      throw new InvalidArgumentError(`'${value}' is neither an ISO date (e.g. 2030-01-01T00:00) nor a Julian date`);
    }
    throw err;
  }
}

const ELEMENT_KEYS = ['q', 'a', 'e', 'i', 'node', 'peri', 'tp', 'm', 'epoch'] as const;

/** `q=…,e=…,i=…,node=…,peri=…,tp=…[,epoch=…]` or `a=…,e=…,i=…,node=…,peri=…,M=…,epoch=…`. */
export function parseElements(value: string): ElementsSpec {
  const got = new Map<string, string>();
  for (const part of value.split(/[,;]/)) {
    if (part.trim() === '') continue;
    const eq = part.indexOf('=');
    const key = part.slice(0, eq).trim().toLowerCase();
    if (eq <= 0 || !(ELEMENT_KEYS as readonly string[]).includes(key)) {
      throw new InvalidArgumentError(`element '${part.trim()}' is not key=value with key one of q, a, e, i, node, peri, tp, M, epoch`);
    }
    if (got.has(key)) throw new InvalidArgumentError(`element '${key}' given twice`);
    got.set(key, part.slice(eq + 1).trim());
  }
  const num = (k: string): number => {
    const x = Number(got.get(k));
    if (got.get(k) === '' || !Number.isFinite(x)) {
      throw new InvalidArgumentError(`element ${k === 'm' ? 'M' : k}='${got.get(k)}' is not a finite number`);
    }
    return x;
  };
  const need = (keys: string[]): void => {
    const missing = keys.filter((k) => !got.has(k));
    if (missing.length > 0) {
      throw new InvalidArgumentError(`elements lack ${missing.map((k) => (k === 'm' ? 'M' : k)).join(', ')}`);
    }
  };
  const perihelionForm = got.has('q');
  if (perihelionForm === got.has('a')) throw new InvalidArgumentError('give either q (with tp) or a (with M and epoch), not both or neither');
  need(perihelionForm ? ['q', 'e', 'i', 'node', 'peri', 'tp'] : ['a', 'e', 'i', 'node', 'peri', 'm', 'epoch']);
  // An element of the other form would be silently ignored: refuse it instead.
  const foreign = perihelionForm ? 'm' : 'tp';
  if (got.has(foreign)) {
    throw new InvalidArgumentError(perihelionForm ? 'M goes with a (and epoch), not with q and tp' : 'tp goes with q, not with a, M and epoch');
  }
  const e = num('e'), iDeg = num('i'), nodeDeg = num('node'), periDeg = num('peri');
  if (e < 0) throw new InvalidArgumentError(`e=${e} must be ≥ 0`);
  if (iDeg < 0 || iDeg > 180) throw new InvalidArgumentError(`i=${iDeg}° must be within 0–180°`);
  if (perihelionForm) {
    const qAu = num('q');
    if (!(qAu > 0)) throw new InvalidArgumentError(`q=${qAu} au must be > 0`);
    const tpJdTDB = parseDateToJdTDB(got.get('tp')!);
    const epochJdTDB = got.has('epoch') ? parseDateToJdTDB(got.get('epoch')!) : tpJdTDB;
    return { form: 'perihelion', qAu, e, iDeg, nodeDeg, periDeg, tpJdTDB, epochJdTDB };
  }
  const aAu = num('a');
  if (e === 1) throw new InvalidArgumentError('e = 1 has no finite a: give q and tp instead');
  if (e < 1 && !(aAu > 0)) throw new InvalidArgumentError(`a=${aAu} au must be > 0 when e < 1`);
  if (e > 1 && !(aAu < 0)) throw new InvalidArgumentError(`a=${aAu} au must be < 0 when e > 1`);
  return { form: 'semimajor', aAu, e, iDeg, nodeDeg, periDeg, meanAnomalyDeg: num('m'), epochJdTDB: parseDateToJdTDB(got.get('epoch')!) };
}

/** The command's elements (degrees) as the core takes them (radians). */
function toOrbitElements(el: ElementsSpec): OrbitElements {
  const angles = { iRad: el.iDeg * RAD_PER_DEG, nodeRad: el.nodeDeg * RAD_PER_DEG, periRad: el.periDeg * RAD_PER_DEG };
  return el.form === 'perihelion'
    ? { form: 'perihelion', qAu: el.qAu, e: el.e, ...angles, tpJdTDB: el.tpJdTDB, epochJdTDB: el.epochJdTDB }
    : { form: 'semimajor', aAu: el.aAu, e: el.e, ...angles, meanAnomalyRad: el.meanAnomalyDeg * RAD_PER_DEG, epochJdTDB: el.epochJdTDB };
}

function normaliseDesignation(s: string): string {
  return s.trim().replace(/\s+/g, ' ').toUpperCase();
}

/** Elements of `designation` from catalogue files: exact readable form, or the number, or the name. */
async function elementsFromCatalogue(designation: string, files: string[]): Promise<{ label: string; el: ElementsSpec }> {
  const loaded = await loadCatalogue(files);
  if (loaded.errors.length > 0) throw new PropagateInputError(loaded.errors.map((e) => e.message).join('; '));
  const cat = loaded.catalogue;
  const want = normaliseDesignation(designation);
  const bare = want.replace(/^\((\d+)\)$/, '$1');
  let k = -1;
  for (let r = 0; r < cat.size && k < 0; r++) {
    const d = normaliseDesignation(cat.designation[r]);
    const m = /^\((\d+)\)\s*(.*)$/.exec(d);
    if (d === want || (m !== null && (m[1] === bare || m[2] === want))) k = r;
  }
  if (k < 0) throw new PropagateInputError(`designation '${designation}' not found in ${files.join(', ')} (${cat.size} bodies)`);
  const toTdb = (jdTT: number) => Instant.fromJd(jdTT, 'TT').to('TDB').jd;
  const common = {
    e: cat.e[k], iDeg: cat.i[k] * DEG_PER_RAD, nodeDeg: cat.node[k] * DEG_PER_RAD, periDeg: cat.peri[k] * DEG_PER_RAD,
    epochJdTDB: toTdb(cat.epochJdTT[k]),
  };
  const el: ElementsSpec = Number.isFinite(cat.meanAnomaly[k]) && Number.isFinite(cat.a[k])
    ? { form: 'semimajor', aAu: cat.a[k], meanAnomalyDeg: cat.meanAnomaly[k] * DEG_PER_RAD, ...common }
    : { form: 'perihelion', qAu: cat.q[k], tpJdTDB: toTdb(cat.tpJdTT[k]), ...common };
  return { label: cat.designation[k], el };
}

export interface PropagateResult {
  label: string;
  model: string;
  epochJdTDB: number;
  toJdTDB: number;
  state: number[]; // x, y, z au; vx, vy, vz au/day
  perihelion: { qAu: number; e: number; iDeg: number; nodeDeg: number; periDeg: number; tpJdTDB: number };
  semimajor: { aAu: number; meanAnomalyDeg: number } | null; // null for e ≥ 1
  distances: { heliocentricAu: number; geocentricAu: number } | null;
  steps: number | null; // integrator steps (N-body only)
}

/**
 * Propagate one body as the options say: the elements from the options or the catalogue,
 * the physics in core (propagateOrbit.ts). Throws PropagateUsageError / PropagateInputError.
 */
export async function propagateOne(opts: PropagateOptions): Promise<PropagateResult> {
  if ((opts.elements === undefined) === (opts.designation === undefined)) {
    throw new PropagateUsageError('give either --elements or a designation with --catalogue');
  }
  let label = 'elements';
  let el: ElementsSpec;
  if (opts.elements !== undefined) el = opts.elements;
  else {
    if (!opts.catalogue || opts.catalogue.length === 0) throw new PropagateUsageError('a designation needs --catalogue FILE');
    ({ label, el } = await elementsFromCatalogue(opts.designation!, opts.catalogue));
  }
  let orbit: OrbitPropagation;
  try {
    orbit = propagateOrbit(toOrbitElements(el), opts);
  } catch (err) {
    if (err instanceof EphemerisSpanError) throw new PropagateUsageError(err.message);
    throw err;
  }
  const pe = orbit.perihelion;
  return {
    label,
    model: opts.nbody
      ? `N-body: Sun + 8 planets (VSOP87B)${opts.relativity ? ' + solar 1PN' : ''}, Gauss–Radau 15th order`
      : 'two-body (Sun only, universal variables)',
    epochJdTDB: el.epochJdTDB, toJdTDB: opts.toJdTDB, state: Array.from(orbit.state),
    perihelion: { qAu: pe[0], e: pe[1], iDeg: pe[2] * DEG_PER_RAD, nodeDeg: pe[3] * DEG_PER_RAD, periDeg: pe[4] * DEG_PER_RAD, tpJdTDB: pe[5] },
    semimajor: orbit.semimajor && { aAu: orbit.semimajor.aAu, meanAnomalyDeg: orbit.semimajor.meanAnomalyRad * DEG_PER_RAD },
    distances: opts.distances ? { heliocentricAu: orbit.heliocentricAu, geocentricAu: orbit.geocentricAu } : null,
    steps: opts.nbody ? orbit.steps : null,
  };
}

function dateText(jdTDB: number): string {
  return `JD ${jdTDB.toFixed(6)} TDB (${Instant.fromJd(jdTDB, 'TDB').toIso(0)})`;
}

/** The text (or JSON) the command prints. */
export function formatPropagation(r: PropagateResult, format: 'text' | 'json'): string {
  if (format === 'json') return JSON.stringify(r, null, 2) + '\n';
  const f = (x: number, d = 12) => (x >= 0 ? ' ' : '') + x.toFixed(d);
  const p = r.perihelion;
  const lines = [
    `body     ${r.label}`,
    `model    ${r.model}${r.steps !== null ? ` (${r.steps} steps)` : ''}`,
    `from     ${dateText(r.epochJdTDB)}`,
    `to       ${dateText(r.toJdTDB)}`,
    'state, heliocentric J2000 ecliptic',
    `  x  ${f(r.state[0])} au      vx ${f(r.state[3], 14)} au/day`,
    `  y  ${f(r.state[1])} au      vy ${f(r.state[4], 14)} au/day`,
    `  z  ${f(r.state[2])} au      vz ${f(r.state[5], 14)} au/day`,
    'osculating elements, heliocentric J2000 ecliptic',
    `  q    ${p.qAu.toFixed(10)} au    e    ${p.e.toFixed(10)}`,
    `  i    ${p.iDeg.toFixed(8)}°    node ${p.nodeDeg.toFixed(8)}°    peri ${p.periDeg.toFixed(8)}°`,
    `  tp   ${dateText(p.tpJdTDB)}`,
  ];
  if (r.semimajor) lines.push(`  a    ${r.semimajor.aAu.toFixed(10)} au    M    ${r.semimajor.meanAnomalyDeg.toFixed(8)}°`);
  if (r.distances) {
    lines.push('distances');
    lines.push(`  heliocentric ${r.distances.heliocentricAu.toFixed(10)} au`);
    lines.push(`  geocentric   ${r.distances.geocentricAu.toFixed(10)} au`);
  }
  return lines.join('\n') + '\n';
}

/** Run the command as the CLI would and return what it prints. */
export async function runPropagate(opts: PropagateOptions): Promise<string> {
  return formatPropagation(await propagateOne(opts), opts.format);
}

interface RawPropagateFlags {
  elements?: ElementsSpec;
  catalogue?: string[];
  to: number;
  nbody: boolean;
  relativity: boolean;
  distances: boolean;
  format: 'text' | 'json';
}

function collect(value: string, previous: string[] | undefined): string[] {
  return [...(previous ?? []), value];
}

export function registerPropagate(program: Command): void {
  program
    .command('propagate')
    .description("carry one body's orbit to another date: two-body, or with the Sun and planets (--nbody)")
    .argument('[designation]', 'a body in the --catalogue file(s): readable designation, number or name')
    .addOption(new Option('--elements <list>', 'elements: "q=…,e=…,i=…,node=…,peri=…,tp=DATE[,epoch=DATE]" or "a=…,e=…,i=…,node=…,peri=…,M=…,epoch=DATE" (au, degrees, J2000 ecliptic)').argParser(parseElements))
    .option('--catalogue <file>', 'orbit file to take the designation from (repeatable)', collect)
    .requiredOption('--to <date>', 'target date: ISO 8601 (TT unless it says Z/UTC/TAI/TDB) or a Julian date (TT)', parseDateToJdTDB)
    .option('--nbody', 'integrate with the Sun, the eight planets and the Sun\'s 1PN term (default: two-body)', false)
    .option('--no-relativity', 'leave out the Sun\'s 1PN term with --nbody')
    .option('--distances', 'also print heliocentric and geocentric distances', false)
    .option('--format <format>', "'text' or 'json'", parseOutputFormat, 'text')
    .action(async function (this: Command, designation: string | undefined, flags: RawPropagateFlags) {
      try {
        const text = await runPropagate({
          elements: flags.elements, designation, catalogue: flags.catalogue, toJdTDB: flags.to,
          nbody: flags.nbody, relativity: flags.relativity, distances: flags.distances, format: flags.format,
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
