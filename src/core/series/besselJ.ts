/**
 * Bessel functions of the first kind J_0(x) … J_{count−1}(x) of integer order, all at once,
 * by Miller's backward recurrence: Abramowitz & Stegun (1964), Handbook of Mathematical
 * Functions, §9.12 (example 1) with the recurrence 9.1.27,
 *   J_{j−1}(x) = (2j / x) J_j(x) − J_{j+1}(x),
 * started from (0, 1) at an order where J is negligible and normalised by the identity
 * 9.1.46, 1 = J_0(x) + 2 Σ_{k≥1} J_{2k}(x). Backward recurrence is stable for every order
 * (J_j is the minimal solution); the start order only has to lie past both x and `count`.
 * Negative x: J_j(−x) = (−1)^j J_j(x) (A&S 9.1.5).
 */

/** Relative size of J at the start order below which the start is far enough (≈ 1e-20). */
const LOG_START_SMALLNESS = -46;

/**
 * Start order for Miller's recurrence at |x| = ax giving `count` orders to full double
 * precision: even, > count and > ax, with (e·ax / 2N)^N < 1e-20 (a bound on J_N(ax) from
 * J_N(x) ≤ (x/2)^N / N!, A&S 9.1.62, and N! ≥ (N/e)^N).
 */
export function besselMillerStart(ax: number, count: number): number {
  let n = Math.max(count + 2, Math.ceil(ax) + 8);
  if (ax > 0) {
    while (n * Math.log((Math.E * ax) / (2 * n)) > LOG_START_SMALLNESS) n++;
  }
  return n + (n & 1);
}

/**
 * J_0(x) … J_{count−1}(x) into out[0 .. count−1]. `start` (optional) is the recurrence's
 * start order from besselMillerStart(|x|, count), passed in by callers that reuse it.
 */
export function besselJSequence(x: number, count: number, out: Float64Array, start?: number): void {
  if (!Number.isInteger(count) || count < 1 || count > out.length) {
    throw new RangeError(`besselJSequence: count must be an integer in [1, ${out.length}], got ${count}`);
  }
  if (!Number.isFinite(x)) throw new RangeError(`besselJSequence: x must be finite, got ${x}`);
  const ax = Math.abs(x);
  if (ax === 0) {
    out.fill(0, 0, count);
    out[0] = 1;
    return;
  }
  const n0 = start ?? besselMillerStart(ax, count);
  if (n0 < count || n0 < ax || (n0 & 1) !== 0) {
    throw new RangeError(`besselJSequence: start order ${n0} must be even and exceed count ${count} and |x| ${ax}`);
  }
  const twoOverX = 2 / ax;
  let jNext = 0; // J_{j+1}, unnormalised
  let j = 1; // J_j, unnormalised, j = n0
  let evenSum = 0; // Σ J_{2k}, k ≥ 1, unnormalised
  for (let order = n0; order > 0; order--) {
    const jPrev = order * twoOverX * j - jNext;
    jNext = j;
    j = jPrev; // now J_{order−1}
    if (Math.abs(j) > 1e250) {
      // Rescale everything kept so far (A&S §9.12 notes the free scale of the recurrence).
      j *= 1e-250;
      jNext *= 1e-250;
      evenSum *= 1e-250;
      for (let m = order; m < count; m++) out[m] *= 1e-250;
    }
    const m = order - 1;
    if (m < count) out[m] = j;
    if (m > 0 && (m & 1) === 0) evenSum += j;
  }
  const norm = 1 / (j + 2 * evenSum); // j is J_0 here
  for (let m = 0; m < count; m++) {
    out[m] *= x < 0 && (m & 1) === 1 ? -norm : norm;
  }
}
