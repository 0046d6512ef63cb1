/**
 * coorbital-truth.csv: one row per planted co-orbital and passing control, with what the
 * detector's stages said when the demo was made (coorbitalTruth.ts): the screen's x and φ from
 * the written elements, the prediction, and the N-body history over the detector's window —
 * the state now, years spent in each state, the sequence of states, temporary captures, the
 * least distance to the planet and when. Where prediction and N-body disagree, the reason.
 */
import { writeFileSync } from 'node:fs';
import { DAYS_PER_JULIAN_YEAR, DEG_PER_RAD } from '../../src/core/constants.js';
import { COORBITAL_STATES, type CoorbitalHistory, type CoorbitalPrediction } from '../../src/core/coorbital/types.js';
import type { CoorbitalPlant } from './coorbitalPlan.js';

/** A written co-orbital plant: where it is and what it is. */
export interface CoorbitalTruthRow { designation: string; line: number; plant: CoorbitalPlant }

export const COORBITAL_TRUTH_COLUMNS = [
  'designation', 'line', 'planet', 'planted_as', 'state_now', 'predicted', 'agree', 'disagreement_reason',
  'delta_a_over_a', 'phi_deg', ...COORBITAL_STATES.map((s) => `years_${s.replace('-', '_')}`),
  'transitions', 'history', 'temporary_capture', 'captures', 'first_capture_yr', 'min_distance_au', 'min_distance_yr', 'draws',
] as const;

const yr = (jd: number, epoch: number): number => (jd - epoch) / DAYS_PER_JULIAN_YEAR;
const fixed = (x: number, d: number): string => (Number.isFinite(x) ? x.toFixed(d) : '');

/** Why the averaged prediction and the N-body state now differ ('' when they agree). */
export function disagreementReason(p: CoorbitalPrediction, h: CoorbitalHistory): string {
  if (p.state === h.stateAtEpoch) return '';
  const why: string[] = [];
  if (p.closeApproach) why.push(`the level curve passes ${p.minDistanceHill.toFixed(1)} Hill radii from the planet, inside the 3 where averaging is not valid`);
  const changes = h.segments.length - 1;
  if (changes > 0) why.push(`the N-body history changes state ${changes} time${changes === 1 ? '' : 's'} in the window (the averaged problem has one state)`);
  if (p.state === 'compound' || h.stateAtEpoch === 'compound') why.push('compound is named by the range of φ in the N-body run (segments.ts) and by the wells of the potential in the prediction');
  if (p.separatrixMargin < 0.05) why.push(`the prediction is ${p.separatrixMargin.toFixed(3)} from its separatrix`);
  if (why.length === 0) {
    why.push(`the averaged problem (one planet on a circular orbit, no other planet) and the N-body model with all eight part for this orbit (separatrix margin ${p.separatrixMargin.toFixed(3)})`);
  }
  return why.join('; ');
}

function csvField(text: string): string {
  return /[",\n]/.test(text) ? `"${text.replace(/"/g, '""')}"` : text;
}

function historyColumns(h: CoorbitalHistory | null, p: CoorbitalPrediction | null): string[] {
  if (!h || !p) return ['not integrated', p ? p.state : '', '', 'not integrated', ...COORBITAL_STATES.map(() => ''), '', '', '', '', '', '', ''];
  const years = COORBITAL_STATES.map((s) => fixed(h.segments.filter((g) => g.state === s).reduce((t, g) => t + yr(g.endJdTDB, g.startJdTDB), 0), 1));
  const first = h.captures[0];
  return [
    h.stateAtEpoch, p.state, String(p.state === h.stateAtEpoch), disagreementReason(p, h), ...years,
    String(h.segments.length - 1), h.segments.map((s) => s.state).join(' > '), h.captures.length > 0 ? 'yes' : 'no',
    String(h.captures.length), first ? fixed(yr(first.startJdTDB, h.epochJdTDB), 2) : '',
    fixed(h.minDistanceAu, 6), fixed(yr(h.minDistanceJdTDB, h.epochJdTDB), 2),
  ];
}

export function coorbitalTruthCsv(rows: readonly CoorbitalTruthRow[]): string {
  const lines = [COORBITAL_TRUTH_COLUMNS.join(',')];
  for (const r of rows) {
    const j = r.plant.judgement;
    const h = historyColumns(j.history, j.prediction);
    lines.push([
      csvField(r.designation), String(r.line), r.plant.planet, r.plant.plantedAs, ...h.slice(0, 4),
      fixed(j.entry ? j.entry.x : NaN, 8), fixed(j.entry ? j.entry.phiRad * DEG_PER_RAD : NaN, 6), ...h.slice(4),
      String(r.plant.draws),
    ].map((f, k) => (k === 7 ? csvField(f) : f)).join(','));
  }
  return lines.join('\n') + '\n';
}

export function writeCoorbitalTruthCsv(path: string, rows: readonly CoorbitalTruthRow[]): void {
  writeFileSync(path, coorbitalTruthCsv(rows));
}
