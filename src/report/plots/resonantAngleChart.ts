/**
 * The resonant angle φ = λ − λ_P of a co-orbital body against time: φ in degrees on
 * (−180°, 180°] (wrapped as in core/coorbital/types.ts), time in years from the epoch, drawn
 * as points or as a line broken wherever φ wraps (a step of more than 180° between two
 * samples), over optional translucent bands that mark the state of each stretch
 * (palette.ts: one fixed colour per state; the legend lists the states present).
 */
import type { TopLevelSpec } from 'vega-lite';
import { COORBITAL_STATES, type CoorbitalState } from '../../core/coorbital/types.js';
import { DEFAULT_MAX_POINTS, strideIndices, thinningNote } from './decimate.js';
import { BAND_OPACITY, STATE_COLOURS } from './palette.js';

/** One stretch of time in one state; endYears exclusive. */
export interface StateBand {
  startYears: number;
  endYears: number;
  state: CoorbitalState;
}

export interface ResonantAngleChartInput {
  designation: string;
  planet: string; // e.g. 'Earth'
  tYears: ArrayLike<number>; // time from the epoch, years, finite, non-decreasing
  phiDeg: ArrayLike<number>; // φ in (−180, 180]; NaN where unknown (a gap)
  bands?: readonly StateBand[];
  style?: 'line' | 'points'; // default 'line'
  maxPoints?: number; // default DEFAULT_MAX_POINTS
}

export const RESONANT_ANGLE_WIDTH_PX = 640;
export const RESONANT_ANGLE_HEIGHT_PX = 300;

interface PhiRow {
  t: number;
  phi: number | null; // null: a break in the line
}

function checkInput(input: ResonantAngleChartInput): void {
  const { tYears, phiDeg } = input;
  if (tYears.length !== phiDeg.length) {
    throw new RangeError(`tYears and phiDeg differ in length: ${tYears.length} and ${phiDeg.length}`);
  }
  for (let i = 0; i < tYears.length; i++) {
    if (!Number.isFinite(tYears[i])) throw new RangeError(`tYears[${i}] is not a finite number: ${tYears[i]}`);
    if (i > 0 && tYears[i] < tYears[i - 1]) throw new RangeError(`tYears decreases at index ${i}`);
    const phi = phiDeg[i];
    if (phi <= -180 || phi > 180) throw new RangeError(`phiDeg[${i}] = ${phi} is outside (−180, 180]`);
  }
  for (const b of input.bands ?? []) {
    if (!COORBITAL_STATES.includes(b.state)) throw new RangeError(`unknown co-orbital state "${b.state}"`);
    if (!(b.startYears < b.endYears)) {
      throw new RangeError(`state band ${b.state} must start before it ends: ${b.startYears}..${b.endYears}`);
    }
  }
}

/** The drawn samples; for a line, a null row between two samples where φ wraps. */
function phiRows(input: ResonantAngleChartInput, keep: Uint32Array, breakAtWraps: boolean): PhiRow[] {
  const rows: PhiRow[] = [];
  let prev = NaN;
  let prevT = NaN;
  for (const i of keep) {
    const t = input.tYears[i];
    const phi = input.phiDeg[i];
    if (breakAtWraps && Math.abs(phi - prev) > 180) rows.push({ t: (t + prevT) / 2, phi: null });
    rows.push({ t, phi: Number.isNaN(phi) ? null : phi });
    prev = phi;
    prevT = t;
  }
  return rows;
}

/** The Vega-Lite specification of the chart (render it with renderChart). */
export function resonantAngleChart(input: ResonantAngleChartInput): TopLevelSpec {
  checkInput(input);
  const style = input.style ?? 'line';
  const keep = strideIndices(input.tYears.length, input.maxPoints ?? DEFAULT_MAX_POINTS);
  const rows = phiRows(input, keep, style === 'line');
  const bands = input.bands ?? [];
  const states = COORBITAL_STATES.filter((s) => bands.some((b) => b.state === s));
  const x = { field: 't', type: 'quantitative', title: 'time from epoch (years)', scale: { nice: false } } as const;
  const phiLayer = {
    data: { values: rows },
    mark: style === 'line'
      ? { type: 'line', color: 'black', strokeWidth: 1, invalid: 'break-paths-show-domains', aria: false }
      : { type: 'point', filled: true, color: 'black', size: 6, opacity: 1, aria: false },
    encoding: {
      x,
      y: {
        field: 'phi', type: 'quantitative', title: 'φ (degrees)',
        scale: { domain: [-180, 180], nice: false },
        axis: { values: [-180, -120, -60, 0, 60, 120, 180] },
      },
    },
  };
  const bandLayer = {
    data: { values: bands.map((b) => ({ t0: b.startYears, t1: b.endYears, state: b.state })) },
    mark: { type: 'rect', opacity: BAND_OPACITY },
    encoding: {
      x: { ...x, field: 't0' },
      x2: { field: 't1' },
      color: {
        field: 'state', type: 'nominal', title: 'state',
        scale: { domain: states, range: states.map((s) => STATE_COLOURS[s]) },
      },
    },
  };
  const note = thinningNote(input.tYears.length, keep.length);
  return {
    $schema: 'https://vega.github.io/schema/vega-lite/v6.json',
    title: { text: `${input.designation}: resonant angle φ = λ − λ(${input.planet})`, ...(note ? { subtitle: note } : {}) },
    width: RESONANT_ANGLE_WIDTH_PX,
    height: RESONANT_ANGLE_HEIGHT_PX,
    layer: bands.length > 0 ? [bandLayer, phiLayer] : [phiLayer],
  } as TopLevelSpec;
}
