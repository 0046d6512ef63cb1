/**
 * The positive real roots of Gauss's eighth-degree equation in the middle heliocentric
 * distance r₂ (Gauss 1809, Theoria motus, book II, section 1; written as in Curtis,
 * Orbital Mechanics for Engineering Students, §5.10 — section from memory):
 *   p(x) = x⁸ + a x⁶ + b x³ + c = 0.
 * With c < 0 (as Gauss's c = −μ²B² always is) there is at least one positive root, and by
 * Descartes' rule of signs at most three.
 *
 * Method (exact bracketing, no starting guess): p′(x) = x² (8x⁵ + 6a x³ + 3b), and the
 * quintic q(x) = 8x⁵ + 6a x³ + 3b has q′(x) = x² (40x² + 18a): one turning point at most on
 * x > 0. So q has at most two positive roots, bracketed on either side of its turning
 * point; they split (0, X] into at most three stretches where p is monotone, and each
 * stretch holds a root exactly when p changes sign across it. X bounds every root
 * (Fujiwara 1916, from memory: |x| ≤ 2 max |a_{n−k}/a_n|^{1/k}, the constant term halved).
 * Each root by bisection to the last bit (at most 2 100 halvings; every one keeps the sign
 * change, so it cannot fail).
 */

/** p(x) = x⁸ + a x⁶ + b x³ + c. */
export function gaussPolynomial(x: number, a: number, b: number, c: number): number {
  const x3 = x * x * x;
  return x3 * x3 * x * x + a * x3 * x3 + b * x3 + c;
}

/** Root of f in [lo, hi] where f(lo) and f(hi) differ in sign (or one is 0), by bisection to adjacent doubles. */
function bisect(f: (x: number) => number, lo: number, hi: number): number {
  let flo = f(lo);
  if (flo === 0) return lo;
  if (f(hi) === 0) return hi;
  for (let k = 0; k < 2100; k++) {
    const mid = 0.5 * (lo + hi);
    if (mid <= lo || mid >= hi) break;
    const fm = f(mid);
    if (fm === 0) return mid;
    if (Math.sign(fm) === Math.sign(flo)) {
      lo = mid;
      flo = fm;
    } else {
      hi = mid;
    }
  }
  return 0.5 * (lo + hi);
}

/**
 * Positive real roots of x⁸ + a x⁶ + b x³ + c, ascending. A double root (p touching zero
 * without a sign change) is not reported: it is a limiting case the data never give exactly.
 * RangeError for non-finite coefficients.
 */
export function gaussPolynomialRoots(a: number, b: number, c: number): number[] {
  if (!Number.isFinite(a) || !Number.isFinite(b) || !Number.isFinite(c)) {
    throw new RangeError(`gaussPolynomialRoots: non-finite coefficients a=${a} b=${b} c=${c}`);
  }
  const bound = 2 * Math.max(Math.sqrt(Math.abs(a)), Math.abs(b) ** 0.2, (Math.abs(c) / 2) ** 0.125, Number.MIN_VALUE);
  const p = (x: number) => gaussPolynomial(x, a, b, c);
  const q = (x: number) => 8 * x ** 5 + 6 * a * x ** 3 + 3 * b;
  // Turning point of q on x > 0 (only when a < 0), then q's positive roots around it.
  const qBreaks = [0];
  if (a < 0) qBreaks.push(Math.min(Math.sqrt((-18 * a) / 40), bound));
  qBreaks.push(bound);
  const pBreaks = [0];
  for (let k = 0; k + 1 < qBreaks.length; k++) {
    const lo = qBreaks[k], hi = qBreaks[k + 1];
    if (hi > lo && Math.sign(q(lo)) * Math.sign(q(hi)) < 0) pBreaks.push(bisect(q, lo, hi));
  }
  pBreaks.push(bound);
  const roots: number[] = [];
  for (let k = 0; k + 1 < pBreaks.length; k++) {
    const lo = pBreaks[k], hi = pBreaks[k + 1];
    const plo = p(lo), phi = p(hi);
    if (hi > lo && Math.sign(plo) * Math.sign(phi) < 0) roots.push(bisect(p, lo, hi));
  }
  return roots;
}
