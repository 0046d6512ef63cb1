/**
 * Option parsers of `wayward propagate`: dates, elements and non-gravitational parameters.
 * Each converts and validates at the boundary and throws commander's InvalidArgumentError
 * (exit code 2) naming what is wrong.
 *
 * Dates keep the time scale they were given in, so that they can be shown as given: a date
 * without a scale is TT (as catalogue epochs are); 'Z'/UTC, TAI and TDB in the text are
 * honoured; a bare number is a Julian date in TT. The dynamics convert to TDB.
 */
import { InvalidArgumentError } from 'commander';
import { Instant } from '../core/time/time.js';
import { TimeFormatError } from '../core/time/isoTime.js';

/** Elements given on the command line or read from a catalogue. Angles in degrees. */
export type ElementsSpec =
  | { form: 'perihelion'; qAu: number; e: number; iDeg: number; nodeDeg: number; periDeg: number; tp: Instant; epoch: Instant }
  | { form: 'semimajor'; aAu: number; e: number; iDeg: number; nodeDeg: number; periDeg: number; meanAnomalyDeg: number; epoch: Instant };

/** ISO 8601 date-time (TT unless it names a scale) or a Julian date (TT), in the scale given. */
export function parseDate(value: string): Instant {
  const text = value.trim();
  if (/^[+-]?\d+(\.\d*)?$/.test(text) && !/^\d{4}-/.test(text)) {
    const jd = Number(text);
    if (!Number.isFinite(jd) || jd <= 0) throw new InvalidArgumentError(`'${value}' is not a Julian date`);
    return Instant.fromJd(jd, 'TT');
  }
  try {
    return Instant.parse(text, 'TT');
  } catch (err) {
    if (err instanceof TimeFormatError || err instanceof RangeError) {
      throw new InvalidArgumentError(`'${value}' is neither an ISO date (e.g. 2030-01-01T00:00) nor a Julian date`);
    }
    throw err;
  }
}

/** Splits `k=v,k=v` (or `;`) into a map with lowercase keys among `allowed`; `what` names the option. */
function keyValues(value: string, allowed: readonly string[], shown: string, what: string): Map<string, string> {
  const got = new Map<string, string>();
  for (const part of value.split(/[,;]/)) {
    if (part.trim() === '') continue;
    const eq = part.indexOf('=');
    const key = part.slice(0, eq).trim().toLowerCase();
    if (eq <= 0 || !allowed.includes(key)) {
      throw new InvalidArgumentError(`${what} '${part.trim()}' is not key=value with key one of ${shown}`);
    }
    if (got.has(key)) throw new InvalidArgumentError(`${what} '${key}' given twice`);
    got.set(key, part.slice(eq + 1).trim());
  }
  return got;
}

const ELEMENT_KEYS = ['q', 'a', 'e', 'i', 'node', 'peri', 'tp', 'm', 'epoch'] as const;

/** `q=…,e=…,i=…,node=…,peri=…,tp=…[,epoch=…]` or `a=…,e=…,i=…,node=…,peri=…,M=…,epoch=…`. */
export function parseElements(value: string): ElementsSpec {
  const got = keyValues(value, ELEMENT_KEYS, 'q, a, e, i, node, peri, tp, M, epoch', 'element');
  const shown = (k: string) => (k === 'm' ? 'M' : k);
  const num = (k: string): number => {
    const x = Number(got.get(k));
    if (got.get(k) === '' || !Number.isFinite(x)) {
      throw new InvalidArgumentError(`element ${shown(k)}='${got.get(k)}' is not a finite number`);
    }
    return x;
  };
  const need = (keys: string[]): void => {
    const missing = keys.filter((k) => !got.has(k));
    if (missing.length > 0) throw new InvalidArgumentError(`elements lack ${missing.map(shown).join(', ')}`);
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
    const tp = parseDate(got.get('tp')!);
    const epoch = got.has('epoch') ? parseDate(got.get('epoch')!) : tp;
    return { form: 'perihelion', qAu, e, iDeg, nodeDeg, periDeg, tp, epoch };
  }
  const aAu = num('a');
  if (e === 1) throw new InvalidArgumentError('e = 1 has no finite a: give q and tp instead');
  if (e < 1 && !(aAu > 0)) throw new InvalidArgumentError(`a=${aAu} au must be > 0 when e < 1`);
  if (e > 1 && !(aAu < 0)) throw new InvalidArgumentError(`a=${aAu} au must be < 0 when e > 1`);
  return { form: 'semimajor', aAu, e, iDeg, nodeDeg, periDeg, meanAnomalyDeg: num('m'), epoch: parseDate(got.get('epoch')!) };
}

/**
 * Largest |A1|, |A2|, |A3| accepted: 1e-4 au/day², about ten thousand times the largest
 * published comet values (order 1e-8 au/day², from memory); a larger number is a unit slip.
 */
const MAX_NONGRAV_AU_PER_DAY2 = 1e-4;

/** `A1=…,A2=…[,A3=…]` in au/day² (a missing one is 0) → [A1, A2, A3]. */
export function parseNonGrav(value: string): [number, number, number] {
  const got = keyValues(value, ['a1', 'a2', 'a3'], 'A1, A2, A3', 'non-gravitational parameter');
  if (got.size === 0) throw new InvalidArgumentError('--nongrav needs at least one of A1, A2, A3 (au/day²)');
  return (['a1', 'a2', 'a3'] as const).map((k) => {
    const text = got.get(k) ?? '0';
    const x = Number(text);
    if (text === '' || !Number.isFinite(x)) throw new InvalidArgumentError(`${k.toUpperCase()}='${text}' is not a finite number`);
    if (Math.abs(x) > MAX_NONGRAV_AU_PER_DAY2) {
      throw new InvalidArgumentError(`${k.toUpperCase()}=${text} au/day² is implausibly large (comets: about 1e-8 au/day²); units are au/day²`);
    }
    return x;
  }) as [number, number, number];
}
