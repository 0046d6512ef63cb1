/** The short cells a table shows for one candidate. */
import type { Candidate } from '../detect/types.js';

export function scoreCell(c: Candidate): string {
  return c.score.toFixed(3);
}

export function falseAlarmCell(c: Candidate): string {
  return Number.isFinite(c.falseAlarm) ? c.falseAlarm.toExponential(1) : '—';
}

export function flagsCell(c: Candidate): string {
  return c.flags.length ? c.flags.join(', ') : 'none';
}
