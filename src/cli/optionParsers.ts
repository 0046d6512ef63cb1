/**
 * Option parsers for commander: each converts and validates one option at the boundary and
 * throws InvalidArgumentError (exit code 2) with the accepted values when it cannot.
 */
import { InvalidArgumentError } from 'commander';
import { PLANETS, type PlanetName } from '../core/constants.js';
import { DETECTORS } from '../detect/registry.js';
import { CSV_KIND_CHOICES, type CsvKindChoice } from '../io/bodyKind.js';
import { parseColumnMapping as parseCsvColumnMapping } from '../io/columnMap.js';
import type { InputFormat } from '../io/types.js';

export function parsePlanet(value: string): PlanetName {
  const v = value.trim().toLowerCase();
  if (!(PLANETS as readonly string[]).includes(v)) {
    throw new InvalidArgumentError(`unknown planet '${value}'; one of: ${PLANETS.join(', ')}`);
  }
  return v as PlanetName;
}

/** A planet name, or 'all' for the eight: the planets whose 1:1 zones are screened. */
export function parsePlanetList(value: string): PlanetName[] {
  if (value.trim().toLowerCase() === 'all') return [...PLANETS];
  const names = value.split(',').map((s) => s.trim()).filter(Boolean);
  if (names.length === 0) throw new InvalidArgumentError(`no planet in '${value}'; one or more of: ${PLANETS.join(', ')}, or all`);
  return [...new Set(names.map((n) => {
    const v = n.toLowerCase();
    if (!(PLANETS as readonly string[]).includes(v)) throw new InvalidArgumentError(`unknown planet '${n}'; one of: ${PLANETS.join(', ')}, or all`);
    return v as PlanetName;
  }))];
}

export function parseDetectorList(value: string): string[] {
  const ids = value.split(',').map((s) => s.trim()).filter(Boolean);
  const known = DETECTORS.map((d) => d.id);
  const unknown = ids.filter((id) => !known.includes(id));
  if (ids.length === 0 || unknown.length > 0) {
    throw new InvalidArgumentError(`unknown detector '${unknown.join(',') || value}'; known: ${known.join(', ')}`);
  }
  return [...new Set(ids)];
}

export function parseFiniteNumber(value: string): number {
  const x = Number(value);
  if (value.trim() === '' || !Number.isFinite(x)) throw new InvalidArgumentError(`'${value}' is not a number`);
  return x;
}

/** A finite number ≥ 0 (a half-width, a tolerance). */
export function parseNonNegativeNumber(value: string): number {
  const x = parseFiniteNumber(value);
  if (x < 0) throw new InvalidArgumentError(`'${value}' is negative; a value ≥ 0 is needed`);
  return x;
}

export function parsePositiveInteger(value: string): number {
  const x = Number(value);
  if (!Number.isInteger(x) || x <= 0) throw new InvalidArgumentError(`'${value}' is not a positive integer`);
  return x;
}

export const INPUT_FORMATS: readonly InputFormat[] = ['orbit-export', 'comet-export', 'csv'];

export function parseInputFormat(value: string): InputFormat {
  if (!(INPUT_FORMATS as readonly string[]).includes(value)) {
    throw new InvalidArgumentError(`unknown input format '${value}'; one of: ${INPUT_FORMATS.join(', ')}`);
  }
  return value as InputFormat;
}

/**
 * `field=header,field=header` → { field: header }, through the io layer's checking parser:
 * an unknown orbit field, a malformed pair or a field given twice is a usage error.
 */
export function parseColumnMapping(value: string): Record<string, string> {
  try {
    return parseCsvColumnMapping(value) as Record<string, string>;
  } catch (err) {
    if (err instanceof RangeError) throw new InvalidArgumentError(err.message);
    throw err;
  }
}

export function parseCsvKind(value: string): CsvKindChoice {
  if (!(CSV_KIND_CHOICES as readonly string[]).includes(value)) {
    throw new InvalidArgumentError(`unknown kind '${value}'; one of: ${CSV_KIND_CHOICES.join(', ')}`);
  }
  return value as CsvKindChoice;
}

export function parseOutputFormat(value: string): 'text' | 'json' {
  if (value !== 'text' && value !== 'json') throw new InvalidArgumentError(`unknown output format '${value}'; one of: text, json`);
  return value;
}

/** A probability level in (0, 1] (a false-alarm threshold). */
export function parseProbabilityLevel(value: string): number {
  const x = parseFiniteNumber(value);
  if (!(x > 0 && x <= 1)) throw new InvalidArgumentError(`'${value}' is not in (0, 1]`);
  return x;
}

/** A finite number > 0 (a cutoff speed). */
export function parsePositiveNumber(value: string): number {
  const x = parseFiniteNumber(value);
  if (!(x > 0)) throw new InvalidArgumentError(`'${value}' is not a positive number`);
  return x;
}

/** N_min of a family: an integer ≥ 2. */
export function parseMinMembers(value: string): number {
  const x = Number(value);
  if (!Number.isInteger(x) || x < 2) throw new InvalidArgumentError(`'${value}' is not an integer ≥ 2`);
  return x;
}
