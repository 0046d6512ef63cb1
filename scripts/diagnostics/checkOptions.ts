/**
 * What the check diagnostics (scripts/diagnostics/check*.ts) share: the integer option parser
 * and the injection's candidate stations (as scripts/injection-recovery.ts draws them).
 */
import { InvalidArgumentError } from 'commander';

export function int(value: string): number {
  const n = Number(value);
  if (value.trim() === '' || !Number.isInteger(n)) throw new InvalidArgumentError(`not an integer: ${value}`);
  return n;
}

/** The injection's candidate survey stations. */
export const CANDIDATE_STATION_CODES: readonly string[] = ['F51', 'G96', '703', 'W84', 'I41', 'Q55'];
