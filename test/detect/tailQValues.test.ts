// Benjamini–Hochberg adjusted q-values against SciPy's false_discovery_control (method 'bh'),
// test/fixtures/scipy/tailReference.json (provenance in test/fixtures/scipy/README.md).
import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { seededRandom } from '../../src/core/random.js';
import { benjaminiHochbergQValues } from '../../src/detect/tailQValues.js';

const ref = JSON.parse(readFileSync(new URL('../fixtures/scipy/tailReference.json', import.meta.url), 'utf8'));

describe('Benjamini–Hochberg q-values', () => {
  it('equal SciPy false_discovery_control(p, method="bh") within 1e-15 relative, ties included', () => {
    const p: number[] = ref.benjaminiHochberg.p;
    const q = benjaminiHochbergQValues(p);
    let worst = 0;
    p.forEach((_, j) => { worst = Math.max(worst, Math.abs(q[j] / ref.benjaminiHochberg.q[j] - 1)); });
    console.log(`BH q-values vs SciPy: worst relative difference ${worst.toExponential(2)}`);
    expect(worst).toBeLessThan(1e-15);
  });

  it('over the marked tests only: the others NaN, m the marked count', () => {
    const p = [0.001, 0.5, 0.002, 0.9];
    const q = benjaminiHochbergQValues(p, Uint8Array.from([1, 0, 1, 0]));
    expect(q[0]).toBeCloseTo(0.002, 15); // 2·0.001/1, then min with 2·0.002/2 = 0.002
    expect(q[2]).toBeCloseTo(0.002, 15);
    expect(Number.isNaN(q[1]) && Number.isNaN(q[3])).toBe(true);
    expect(() => benjaminiHochbergQValues([0.1, NaN])).toThrow(RangeError);
    expect(() => benjaminiHochbergQValues([0.1, NaN], Uint8Array.from([1, 0]))).not.toThrow();
  });

  it('under a global null (uniform p), some q < 0.05 in about 5% of 200 families of 1 000 (BH 1995: the FDR is then the family-wise error rate)', () => {
    const r = seededRandom(1995);
    let any = 0;
    for (let t = 0; t < 200; t++) {
      const q = benjaminiHochbergQValues(Float64Array.from({ length: 1000 }, () => r()));
      if (q.some((v) => v < 0.05)) any++;
    }
    console.log(`families with any q < 0.05 under the global null: ${any} of 200`);
    expect(any).toBeLessThanOrEqual(17); // binomial(200, 0.05): mean 10, P(> 17) ≈ 1.5% (common practice)
  });
});
