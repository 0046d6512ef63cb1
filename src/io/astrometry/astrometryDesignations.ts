/**
 * Designations met in one astrometry file, for the caller to decide what a file that mixes
 * bodies means. Observations are grouped by their readable designation; a record that
 * carries both a number and a provisional designation (80-column columns 1–5 and 6–12, or
 * ADES permID and provID) ties the provisional one to the number, so provisional-only
 * records of the same body join the numbered group. `mixed` is true when more than one
 * group remains.
 */
import type { AstrometryObservation, DesignationCount } from './types.js';

export interface DesignationSummary {
  designations: DesignationCount[]; // in order of first appearance
  mixed: boolean;
}

/** Groups `observations` by designation (see the file comment). */
export function summariseDesignations(observations: readonly AstrometryObservation[]): DesignationSummary {
  const alias = new Map<string, string>(); // provisional → numbered designation
  for (const o of observations) {
    if (o.provisional !== '' && o.provisional !== o.designation && !alias.has(o.provisional)) alias.set(o.provisional, o.designation);
  }
  const groups = new Map<string, DesignationCount>();
  for (const o of observations) {
    const key = alias.get(o.designation) ?? o.designation;
    const g = groups.get(key);
    if (g === undefined) groups.set(key, { designation: key, observations: 1, firstLine: o.line });
    else {
      g.observations++;
      g.firstLine = Math.min(g.firstLine, o.line);
    }
  }
  const designations = [...groups.values()].sort((a, b) => a.firstLine - b.firstLine);
  return { designations, mixed: designations.length > 1 };
}
