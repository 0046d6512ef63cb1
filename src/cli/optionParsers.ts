/**
 * Option parsers for commander: each converts and validates one option at the boundary and
 * throws InvalidArgumentError (exit code 2) with the accepted values when it cannot.
 */
import { InvalidArgumentError } from 'commander';
import { PLANETS, type PlanetName } from '../core/constants.js';
import { DETECTORS } from '../detect/registry.js';
import type { InputFormat } from '../io/types.js';

export function parsePlanet(value: string): PlanetName {
  const v = value.trim().toLowerCase();
  if (!(PLANETS as readonly string[]).includes(v)) {
    throw new InvalidArgumentError(`unknown planet '${value}'; one of: ${PLANETS.join(', ')}`);
  }
  return v as PlanetName;
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

const FORMATS: readonly InputFormat[] = ['orbit-export', 'comet-export', 'csv'];

export function parseInputFormat(value: string): InputFormat {
  if (!(FORMATS as readonly string[]).includes(value)) {
    throw new InvalidArgumentError(`unknown input format '${value}'; one of: ${FORMATS.join(', ')}`);
  }
  return value as InputFormat;
}

/** `name=header,name=header` → { name: header }. */
export function parseColumnMapping(value: string): Record<string, string> {
  const out: Record<string, string> = {};
  for (const part of value.split(',')) {
    const eq = part.indexOf('=');
    const name = part.slice(0, eq).trim();
    const header = part.slice(eq + 1).trim();
    if (eq <= 0 || header === '') throw new InvalidArgumentError(`column mapping '${part}' is not name=header`);
    out[name] = header;
  }
  return out;
}

export function parseOutputFormat(value: string): 'text' | 'json' {
  if (value !== 'text' && value !== 'json') throw new InvalidArgumentError(`--format must be text or json, not '${value}'`);
  return value;
}
