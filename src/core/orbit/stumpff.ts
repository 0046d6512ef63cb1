/**
 * Stumpff functions c0..c3 of the universal-variable formulation of two-body motion.
 * Danby, Fundamentals of Celestial Mechanics, 2nd ed. (1988), §6.9 (section number from memory):
 *   c_k(x) = Σ_{j≥0} (−x)^j / (2j + k)!
 *   x > 0:  c0 = cos √x,  c1 = sin √x / √x;   x < 0: cosh and sinh of √−x;
 *   c2 = (1 − c0)/x,  c3 = (1 − c1)/x   (recurrence x c_{k+2} = 1/k! − c_k).
 * For |x| ≤ 1 the series for c2 and c3 are summed (the closed forms cancel there) and c0, c1
 * follow from the recurrence; elsewhere the closed forms lose at most one digit.
 */
import { INV_FACTORIAL } from '../math.js';

/**
 * Series terms kept for |x| ≤ 1: the first terms left out are x⁹/20! ≈ 4e-19 (c2 ≈ 0.5) and
 * x⁹/21! ≈ 2e-20 (c3 ≈ 1/6), both below 1e-18 of the function's value.
 */
const TERMS = 9;
/** INV_FACT_C2[j] = 1/(2j+2)!, INV_FACT_C3[j] = 1/(2j+3)!. */
const INV_FACT_C2 = Float64Array.from({ length: TERMS }, (_, j) => INV_FACTORIAL[2 * j + 2]);
const INV_FACT_C3 = Float64Array.from({ length: TERMS }, (_, j) => INV_FACTORIAL[2 * j + 3]);

/** Write c0(x), c1(x), c2(x), c3(x) into out[offset..offset+3]. */
export function stumpffInto(x: number, out: Float64Array, offset = 0): void {
  let c0: number, c1: number, c2: number, c3: number;
  if (Math.abs(x) <= 1) {
    c2 = INV_FACT_C2[TERMS - 1];
    c3 = INV_FACT_C3[TERMS - 1];
    for (let j = TERMS - 2; j >= 0; j--) {
      c2 = INV_FACT_C2[j] - x * c2;
      c3 = INV_FACT_C3[j] - x * c3;
    }
    c0 = 1 - x * c2;
    c1 = 1 - x * c3;
  } else if (x > 0) {
    const r = Math.sqrt(x);
    c0 = Math.cos(r);
    c1 = Math.sin(r) / r;
    c2 = (1 - c0) / x;
    c3 = (1 - c1) / x;
  } else {
    const r = Math.sqrt(-x);
    c0 = Math.cosh(r);
    c1 = Math.sinh(r) / r;
    c2 = (1 - c0) / x;
    c3 = (1 - c1) / x;
  }
  out[offset] = c0;
  out[offset + 1] = c1;
  out[offset + 2] = c2;
  out[offset + 3] = c3;
}
