/**
 * The positions of non-negative values (tail probabilities) in ascending order of value, ties
 * in ascending position: the order `idx.sort((x, y) => p[x] − p[y] || x − y)` gives, found by a
 * least-significant-digit radix sort (common practice) on the values' IEEE 754 bit patterns in
 * four 16-bit digits. For non-negative doubles the bit pattern read as an unsigned integer
 * orders as the value does; −0 is read as +0. A stable radix sort of positions given in
 * ascending order keeps tied values in that order. A comparison sort with a callback over a
 * million positions took about a second; this is at most four passes over them.
 */

const LITTLE_ENDIAN = new Uint8Array(new Uint16Array([1]).buffer)[0] === 1;
const DIGIT_BITS = 16;
const DIGITS = 1 << DIGIT_BITS;
const MASK = DIGITS - 1;

/** `positions` (ascending) reordered by ascending value of `values` at them, ties by position; a new array. Every value must be ≥ 0 or −0 (not NaN). */
export function ascendingOrderOfNonNegative(values: ArrayLike<number>, positions: Uint32Array): Uint32Array {
  const m = positions.length;
  // the keys travel with the positions, so every pass reads its inputs in order
  let low = new Uint32Array(m), high = new Uint32Array(m), order = Uint32Array.from(positions);
  let low2 = new Uint32Array(m), high2 = new Uint32Array(m), order2 = new Uint32Array(m);
  const f = new Float64Array(1);
  const u = new Uint32Array(f.buffer);
  const lw = LITTLE_ENDIAN ? 0 : 1, hw = 1 - lw;
  for (let t = 0; t < m; t++) {
    f[0] = values[positions[t]] + 0; // −0 + 0 = +0
    low[t] = u[lw];
    high[t] = u[hw];
  }
  const count = new Uint32Array(DIGITS + 1);
  for (let pass = 0; pass < 4; pass++) {
    const shift = (pass & 1) * DIGIT_BITS;
    const keys = pass < 2 ? low : high;
    count.fill(0);
    for (let t = 0; t < m; t++) count[((keys[t] >>> shift) & MASK) + 1]++;
    if (m === 0 || count[((keys[0] >>> shift) & MASK) + 1] === m) continue; // one digit for all: the pass moves nothing
    for (let d = 0; d < DIGITS; d++) count[d + 1] += count[d];
    for (let t = 0; t < m; t++) {
      const w = count[(keys[t] >>> shift) & MASK]++;
      low2[w] = low[t];
      high2[w] = high[t];
      order2[w] = order[t];
    }
    [low, low2] = [low2, low];
    [high, high2] = [high2, high];
    [order, order2] = [order2, order];
  }
  return order;
}
