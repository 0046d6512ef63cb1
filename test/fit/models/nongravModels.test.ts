// The model catalogue: each model's parameters land where the core's force model reads them.
// Checked through the force model itself: the extra acceleration of a body at a known place
// against the published laws (Marsden, Sekanina & Yeomans 1973, AJ 78, 211, eq. 1;
// radiation pressure with S = 1361 W/m², IAU 2015 Resolution B3, and c, SI).
import { describe, expect, it } from 'vitest';
import { M_PER_AU, SECONDS_PER_DAY } from '../../../src/core/constants.js';
import { TestBodyForceModel } from '../../../src/core/forces/forceModel.js';
import { marsdenG } from '../../../src/core/forces/nonGravLaw.js';
import {
  forceParamsFor, NONGRAV_MODEL_IDS, NONGRAV_MODELS, nongravModel, SRP_ASSUMED_CR, withNormalComponent,
  type NongravModel,
} from '../../../src/fit/models/nongravModels.js';

/**
 * Extra acceleration (au/d²) of a body at (r, 0, 0) moving along +y, beyond the Sun's pull. The
 * Sun's GM is set to 1e-30 so that subtracting its pull costs no digits of the small extra term.
 */
function extraAcceleration(model: NongravModel, values: number[], rAu: number): number[] {
  const x = Float64Array.from([rAu, 0, 0]);
  const v = Float64Array.from([0, 0.017, 0]);
  const withIt = new Float64Array(3);
  const without = new Float64Array(3);
  new TestBodyForceModel(1, forceParamsFor(model, values), { ...model.forceOptions, sunGm: 1e-30 }).accel(0, x, v, withIt);
  new TestBodyForceModel(1, null, { sunGm: 1e-30 }).accel(0, x, v, without);
  return [0, 1, 2].map((i) => withIt[i] - without[i]);
}

describe('the model catalogue', () => {
  it('has the four models with the parameters each solves', () => {
    expect(NONGRAV_MODEL_IDS).toEqual(['gravity', 'thermal', 'comet', 'srp']);
    expect(NONGRAV_MODELS.gravity.params).toEqual([]);
    expect(NONGRAV_MODELS.thermal.params.map((p) => p.name)).toEqual(['A2']);
    expect(NONGRAV_MODELS.comet.params.map((p) => p.name)).toEqual(['A1', 'A2']);
    expect(withNormalComponent(NONGRAV_MODELS.comet).params.map((p) => p.name)).toEqual(['A1', 'A2', 'A3']);
    expect(NONGRAV_MODELS.srp.params.map((p) => [p.name, p.unit])).toEqual([['areaToMass', 'm²/kg']]);
    expect(NONGRAV_MODELS.srp.params[0].meaning).toMatch(/C_R = 1 assumed/);
    expect(withNormalComponent(withNormalComponent(NONGRAV_MODELS.comet)).params).toHaveLength(3);
    expect(nongravModel('srp')).toBe(NONGRAV_MODELS.srp);
    expect(() => nongravModel('drag')).toThrow(TypeError);
    expect(() => withNormalComponent(NONGRAV_MODELS.thermal)).toThrow(RangeError);
  });
  it('thermal: A2·(1 au/r)² along the motion', () => {
    const a = extraAcceleration(NONGRAV_MODELS.thermal, [4e-12], 2);
    expect(a[0]).toBe(0);
    expect(Math.abs(a[1] / 1e-12 - 1)).toBeLessThan(1e-14);
    expect(a[2]).toBe(0);
  });
  it('comet: g(r)·(A1 radial + A2 transverse + A3 normal), g the water-ice law', () => {
    const m = withNormalComponent(NONGRAV_MODELS.comet);
    const a = extraAcceleration(m, [1e-8, 2e-9, -3e-9], 1.5);
    const g = marsdenG(1.5);
    expect(Math.abs(a[0] / (g * 1e-8) - 1)).toBeLessThan(1e-14);
    expect(Math.abs(a[1] / (g * 2e-9) - 1)).toBeLessThan(1e-14);
    expect(Math.abs(a[2] / (-g * 3e-9) - 1)).toBeLessThan(1e-14);
  });
  it('srp: C_R·(S/c)·(A/m)·(1 au/r)² away from the Sun, C_R = 1', () => {
    expect(SRP_ASSUMED_CR).toBe(1);
    const a = extraAcceleration(NONGRAV_MODELS.srp, [0.01], 2);
    // IAU 2015 B3: S = 1361 W/m²; c = 299 792 458 m/s (SI).
    const want = (((1361 / 299_792_458) * 0.01) / 4) * (SECONDS_PER_DAY ** 2 / M_PER_AU);
    expect(Math.abs(a[0] / want - 1)).toBeLessThan(1e-14);
    expect(a[1]).toBe(0);
  });
  it('refuses the wrong number of values and non-finite ones', () => {
    expect(() => forceParamsFor(NONGRAV_MODELS.comet, [1e-8])).toThrow(RangeError);
    expect(() => forceParamsFor(NONGRAV_MODELS.thermal, [NaN])).toThrow(RangeError);
  });
  it('gives a positive prior scale for every parameter', () => {
    for (const id of NONGRAV_MODEL_IDS) {
      for (const p of NONGRAV_MODELS[id].params) expect(p.priorScale).toBeGreaterThan(0);
    }
  });
});
