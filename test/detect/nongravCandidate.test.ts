// The nongrav candidate row from a checked body's numbers (invented numbers: a synthetic test of
// the row's rules, not of the fit): a signal that vanishes without one station is a probable data
// artefact, reported apart (boundary, score 0, flagged) with its Δχ² and p-value kept in the row;
// the why sentence quotes the fields' own numbers.
import { describe, expect, it } from 'vitest';
import { CatalogueBuilder } from '../../src/clean/catalogueBuilder.js';
import { ARTEFACT_CLASS, nongravCandidate, pText } from '../../src/detect/nongravCandidate.js';
import type { NongravChecked } from '../../src/detect/nongravCheck.js';
import { asteroidRow } from '../clean/rowFactory.js';

const builder = new CatalogueBuilder();
builder.add(asteroidRow({ designation: '2031 QE1' }), 'synthetic.txt', 1, '');
const cat = builder.finish();

const checked: NongravChecked = {
  ok: true, observations: 300, preferred: 'thermal', deltaChi2: 41.25, tailDeltaChi2: 41.25, pValue: 4.1e-11, deltaBic: -35.5,
  params: [{ name: 'A2', unit: 'au/d²', value: 3.2e-13, sigma: 5.0e-14 }], rmsArcsec: 0.41, weightedRmsArcsec: 0.33, kept: 296, rejected: 4,
  gravityWeightedRmsArcsec: 0.36, plausibility: 'too-large', driftAuPerMyr: 0.012, vanishesWithout: [], stationsRefitted: ['F51', 'G96'], verdict: '',
};

describe('nongrav candidate row', () => {
  it('a model detected and persisting without every station: class = the model, score = Δχ², p-value as false-alarm probability', () => {
    const c = nongravCandidate(cat, 0, checked, 0.25, 8);
    expect(c.class).toBe('thermal');
    expect(c.boundary).toBe(false);
    expect(c.score).toBe(41.25);
    expect(c.falseAlarmProb).toBe(4.1e-11);
    expect(c.flags).toContain('nongrav-beyond-natural');
    expect(c.details.drift_au_per_myr).toBe(0.012);
    expect(c.why).toContain('Δχ² 41.3 against gravity only, p = 4.10e-11');
    expect(c.why).toContain('A2 = 3.20e-13 ± 5.00e-14 au/d² (S/N 6.4)');
    expect(c.why).toContain('it persists without each of 2 stations');
    expect(c.why).toContain('2 of the 8 bodies checked have a Δχ² this large');
  });

  it('a signal that vanishes without one station: a probable data artefact, ranked apart with score 0', () => {
    const c = nongravCandidate(cat, 0, { ...checked, vanishesWithout: ['G96'] }, 0.25, 8);
    expect(c.class).toBe(ARTEFACT_CLASS);
    expect(c.boundary).toBe(true);
    expect(c.score).toBe(0);
    expect(c.details.delta_chi2).toBe(41.25);
    expect(c.details.vanishes_without).toBe('G96');
    expect(c.flags).toContain('nongrav-station-artefact');
    expect(c.why).toMatch(/^The thermal signal .* vanishes when station G96 is dropped: a probable data artefact, not thrust\.$/);
  });

  it('a p-value that underflows to 0 is written as below 1e-300, not as 0', () => {
    expect(pText(0)).toBe('p < 1e-300');
    expect(pText(0.0123)).toBe('p = 0.0123');
  });
});
