/**
 * The short cells a table shows for one candidate, and the column headings that go with
 * them. The tail fraction and the false-alarm probability have headings that cannot be
 * mistaken for each other; a detector without a null model shows '—' for the latter.
 */
import type { Candidate } from '../detect/types.js';
import type { OrbitQuality } from './orbitQuality.js';

export const TAIL_FRACTION_HEADING = 'tail fraction';
export const FALSE_ALARM_HEADING = 'false-alarm prob.';

export function scoreCell(c: Candidate): string {
  return c.score.toFixed(3);
}

/** The tail fraction with its population, e.g. '5.6e-5 of 17911'. */
export function tailFractionCell(c: Candidate): string {
  return Number.isFinite(c.tailFraction) ? `${c.tailFraction.toExponential(1)} of ${c.tailPopulation}` : '—';
}

export function falseAlarmCell(c: Candidate): string {
  return Number.isFinite(c.falseAlarmProb) ? c.falseAlarmProb.toExponential(1) : '—';
}

export function flagsCell(c: Candidate): string {
  return c.flags.length ? c.flags.join(', ') : 'none';
}

/** Orbit quality in one cell: 'U 3, 12 opp, 240 obs, arc 8100 d'; unknown parts left out. */
export function orbitQualityCell(q: OrbitQuality): string {
  const parts: string[] = [];
  if (q.U !== null) parts.push(`U ${q.U}`);
  if (q.oppositions !== null) parts.push(`${q.oppositions} opp`);
  if (q.observations !== null) parts.push(`${q.observations} obs`);
  if (q.arcDays !== null) parts.push(`arc ${Math.round(q.arcDays)} d`);
  return parts.length ? parts.join(', ') : 'unknown';
}
