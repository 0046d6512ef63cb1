// Physical plausibility of a fitted drift and a fitted area-to-mass ratio.
import { describe, expect, it } from 'vitest';
import { C_M_PER_S, SOLAR_IRRADIANCE_1AU_W_PER_M2 } from '../../../src/core/constants.js';
import { radiationPressureMPerS2 } from '../../../src/core/forces/radiationPressure.js';
import { sphereAreaToMassM2PerKg } from '../../../src/fit/models/bulkDensity.js';
import { areaToMassPlausibility } from '../../../src/fit/models/radiationPressurePlausibility.js';
import {
  BENNU_A_AU, BENNU_DENSITY_KG_PER_M3, BENNU_DIAMETER_KM, BENNU_E, driftPlausibility, maxNaturalDriftAuPerMyr,
} from '../../../src/fit/models/yarkovskyPlausibility.js';

describe('radiation pressure at 1 au (IAU 2015 Resolution B3)', () => {
  it('the core uses S = 1361 W/m² and c = 299 792 458 m/s: S/c = 4.5398e-6 Pa', () => {
    expect(SOLAR_IRRADIANCE_1AU_W_PER_M2).toBe(1361); // IAU 2015 B3 nominal total solar irradiance
    expect(C_M_PER_S).toBe(299_792_458); // SI, exact
    // 1361 / 299 792 458 = 4.539807…e-6 N/m² (computed by hand from the two published numbers).
    expect(Math.abs(radiationPressureMPerS2(1, 1, 1) / 4.5398074e-6 - 1)).toBeLessThan(1e-7);
    expect(radiationPressureMPerS2(0.01, 1.3, 2)).toBeCloseTo((1.3 * 4.5398074e-6 * 0.01) / 4, 15);
  });
});

describe('sphere A/m = 3/(2ρD)', () => {
  it('a 1 m sphere of water density has A/m = π·0.25 / (1000·π/6) = 1.5e-3 m²/kg', () => {
    expect(sphereAreaToMassM2PerKg(1, 1000)).toBeCloseTo(1.5e-3, 15);
    expect(() => sphereAreaToMassM2PerKg(0, 1000)).toThrow(RangeError);
  });
});

describe('driftPlausibility', () => {
  it('at Bennu\'s own size, density and orbit the maximum is Bennu\'s drift over |cos 178°|', () => {
    const max = maxNaturalDriftAuPerMyr(BENNU_DIAMETER_KM, BENNU_DENSITY_KG_PER_M3, BENNU_A_AU, BENNU_E);
    expect(max).toBeCloseTo(19.0e-4 / Math.cos((2 * Math.PI) / 180), 12);
  });
  it('scales as 1/D, 1/ρ and 1/(√a (1 − e²))', () => {
    const base = maxNaturalDriftAuPerMyr(1, 1000, 2, 0.1);
    expect(maxNaturalDriftAuPerMyr(2, 1000, 2, 0.1)).toBeCloseTo(base / 2, 15);
    expect(maxNaturalDriftAuPerMyr(1, 2000, 2, 0.1)).toBeCloseTo(base / 2, 15);
    expect(maxNaturalDriftAuPerMyr(1, 1000, 8, 0.1)).toBeCloseTo(base / 2, 15);
    expect(maxNaturalDriftAuPerMyr(1, 1000, 2, 0.5)).toBeCloseTo((base * 0.99) / 0.75, 15);
  });
  it('Bennu\'s measured drift (Chesley et al. 2014) is plausible for its H = 20.21', () => {
    const r = driftPlausibility({ driftAuPerMyr: -19.0e-4, aAu: BENNU_A_AU, e: BENNU_E, absMagH: 20.21 });
    expect(r.verdict).toBe('plausible');
    expect(r.text).toMatch(/^plausible for a natural body of this size: \|da\/dt\| = 0\.00190 au\/Myr/);
  });
  it('calls a drift marginal within the margin and too large beyond it (invented drifts)', () => {
    const at = (drift: number) => driftPlausibility({ driftAuPerMyr: drift, aAu: 1.5, e: 0.3, absMagH: 22 });
    const max = at(1e-4).maxDriftAuPerMyr;
    expect(at(0.99 * max).verdict).toBe('plausible');
    expect(at(-1.5 * max).verdict).toBe('marginal');
    expect(at(2.5 * max).verdict).toBe('too-large');
    expect(at(2.5 * max).text).toMatch(/^too large for a natural body of this size: 2\.50 times/);
    expect(driftPlausibility({ driftAuPerMyr: 1e-3, aAu: 1, e: 0, absMagH: NaN }).verdict).toBe('unknown-size');
  });
});

describe('areaToMassPlausibility', () => {
  // 2009 BD: fitted area-to-mass ratio (2.97 ± 0.33) × 10⁻⁴ m²/kg (Micheli, Tholen & Elliott 2012, New
  // Astronomy 17, 446; value and H = 28.43 from memory): a natural body of a few metres.
  it('2009 BD\'s fitted A/m is within the natural range for its size', () => {
    const r = areaToMassPlausibility({ areaToMassM2PerKg: 2.97e-4, absMagH: 28.43 });
    expect(r.verdict).toBe('natural');
    expect(r.ratio).toBeGreaterThan(0.05);
    expect(r.text).toMatch(/^within what natural bodies of this size can have: A\/m = 0\.000297 m²\/kg/);
  });
  it('a hollow-object A/m of 1e-2 m²/kg at H = 28.4 is far above (invented value)', () => {
    const r = areaToMassPlausibility({ areaToMassM2PerKg: 1e-2, absMagH: 28.4 });
    expect(r.verdict).toBe('artificial-like');
    expect(r.text).toMatch(/the signature of a light, hollow, artificial object/);
    // Natural maximum: C_R = 2, ρ = 500 kg/m³, D at albedo 0.5 (3.93 m): 2·3/(2·500·3.93) = 1.53e-3.
    expect(r.naturalMaxM2PerKg).toBeCloseTo(1.527e-3, 5);
    expect(r.accelerationAt1AuMPerS2).toBeCloseTo(4.5398e-8, 11);
  });
  it('between the maximum and the factor: above natural; negative: not radiation pressure', () => {
    const hi = areaToMassPlausibility({ areaToMassM2PerKg: 1e-4, absMagH: 28.4 }).naturalMaxM2PerKg;
    expect(areaToMassPlausibility({ areaToMassM2PerKg: 2 * hi, absMagH: 28.4 }).verdict).toBe('above-natural');
    expect(areaToMassPlausibility({ areaToMassM2PerKg: 2 * hi, absMagH: 28.4, artificialFactor: 1.5 }).verdict).toBe('artificial-like');
    expect(areaToMassPlausibility({ areaToMassM2PerKg: -1e-4, absMagH: 28.4 }).verdict).toBe('negative');
    expect(areaToMassPlausibility({ areaToMassM2PerKg: 1e-4, absMagH: NaN }).verdict).toBe('unknown-size');
  });
});
