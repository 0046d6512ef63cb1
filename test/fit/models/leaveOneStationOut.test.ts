// The leave-one-station-out driver and its stated rule, with refits replaced by invented
// results (synthetic: each station's refit is chosen to sit on one side of a threshold).
import { describe, expect, it } from 'vitest';
import { leaveOneStationOut, type ParameterEstimate } from '../../../src/fit/models/leaveOneStationOut.js';

const full: ParameterEstimate = { value: 6e-14, sigma: 1e-14 }; // S/N 6

describe('leaveOneStationOut', () => {
  it('judges each station by the rule and keeps the order given', async () => {
    const refits: Record<string, ParameterEstimate> = {
      '691': { value: 5.8e-14, sigma: 1.1e-14 }, // S/N 5.3, moved 0.2σ: persists
      'F51': { value: 2.5e-14, sigma: 1.0e-14 }, // S/N 2.5 < 3: vanishes
      'G96': { value: 2.9e-14, sigma: 0.5e-14 }, // S/N 5.8 but moved −3.1σ: vanishes
      '703': { value: 3.1e-14, sigma: 1.0e-14 }, // S/N 3.1, moved −2.9σ: persists
    };
    const asked: string[] = [];
    const r = await leaveOneStationOut(['F51', '691', 'G96', '703'], full, async (s) => { asked.push(s); return refits[s]; });
    expect(asked).toEqual(['F51', '691', 'G96', '703']);
    expect(r.drops.map((d) => d.verdict)).toEqual(['vanishes', 'persists', 'vanishes', 'persists']);
    expect(r.vanishesWithout).toEqual(['F51', 'G96']);
    expect(r.full.signalToNoise).toBeCloseTo(6, 12);
    expect(r.drops[0].why).toBe('vanishes when station F51 is dropped: S/N 6.00 → 2.50 (< 3)');
    expect(r.drops[2].why).toBe('vanishes when station G96 is dropped: the value moves by -3.10 σ (> 3 σ)');
    expect(r.drops[2].shiftSigma).toBeCloseTo(-3.1, 12);
  });
  it('reports a failed refit with its message and goes on', async () => {
    const r = await leaveOneStationOut(['A', 'B'], full, (s) => {
      if (s === 'A') throw new Error('singular normal matrix');
      return { value: 6e-14, sigma: 1e-14 };
    });
    expect(r.drops[0].verdict).toBe('refit-failed');
    expect(r.drops[0].why).toBe('the refit without station A failed: singular normal matrix');
    expect(r.drops[1].verdict).toBe('persists');
    const n = await leaveOneStationOut(['A'], full, () => null);
    expect(n.drops[0].verdict).toBe('refit-failed');
  });
  it('has nothing to test when the full fit is not significant', async () => {
    const r = await leaveOneStationOut(['A'], { value: 2e-14, sigma: 1e-14 }, () => ({ value: 0, sigma: 1e-14 }));
    expect(r.drops[0].verdict).toBe('no-signal-to-test');
    expect(r.vanishesWithout).toEqual([]);
  });
  it('follows stricter thresholds', async () => {
    const refit = (): ParameterEstimate => ({ value: 4.5e-14, sigma: 1e-14 }); // S/N 4.5, moved −1.5σ
    expect((await leaveOneStationOut(['A'], full, refit)).drops[0].verdict).toBe('persists');
    expect((await leaveOneStationOut(['A'], full, refit, { minSignalToNoise: 5 })).drops[0].verdict).toBe('vanishes');
    expect((await leaveOneStationOut(['A'], full, refit, { maxShiftSigma: 1 })).drops[0].verdict).toBe('vanishes');
  });
  it('refuses a full fit without σ and a station listed twice', async () => {
    await expect(leaveOneStationOut(['A'], { value: 1, sigma: 0 }, () => null)).rejects.toThrow(RangeError);
    await expect(leaveOneStationOut(['A', 'A'], full, () => null)).rejects.toThrow(/twice/);
  });
});
