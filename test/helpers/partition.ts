/**
 * Comparing two labelings of the same points, independently of how each numbers its groups:
 * a canonical relabeling (groups numbered by first appearance; negative labels are one "no
 * group" class of singletons) and the adjusted Rand index (Hubert & Arabie 1985, J.
 * Classification 2, 193, eq. 5), where each noise point counts as a group of its own.
 */

/** Groups renumbered 0, 1, … in order of first appearance; noise (negative) stays −1. */
export function canonicalLabels(labels: ArrayLike<number>): Int32Array {
  const map = new Map<number, number>();
  const out = new Int32Array(labels.length);
  for (let k = 0; k < labels.length; k++) {
    const l = labels[k];
    if (l < 0) { out[k] = -1; continue; }
    let c = map.get(l);
    if (c === undefined) { c = map.size; map.set(l, c); }
    out[k] = c;
  }
  return out;
}

/** Adjusted Rand index of two labelings (1 for the same partition); noise points are singletons. */
export function adjustedRandIndex(p: ArrayLike<number>, q: ArrayLike<number>): number {
  const n = p.length;
  if (q.length !== n) throw new RangeError('adjustedRandIndex: labelings differ in length');
  const cp = canonicalLabels(p), cq = canonicalLabels(q);
  // Noise points become their own groups, numbered past the real ones.
  let nextP = cp.reduce((m, v) => Math.max(m, v), -1) + 1, nextQ = cq.reduce((m, v) => Math.max(m, v), -1) + 1;
  for (let k = 0; k < n; k++) {
    if (cp[k] < 0) cp[k] = nextP++;
    if (cq[k] < 0) cq[k] = nextQ++;
  }
  const pairs2 = (m: number): number => (m * (m - 1)) / 2;
  const joint = new Map<number, number>();
  const rowSum = new Float64Array(nextP), colSum = new Float64Array(nextQ);
  for (let k = 0; k < n; k++) {
    const key = cp[k] * nextQ + cq[k];
    joint.set(key, (joint.get(key) ?? 0) + 1);
    rowSum[cp[k]]++; colSum[cq[k]]++;
  }
  let index = 0;
  for (const m of joint.values()) index += pairs2(m);
  let a = 0, b = 0;
  for (const m of rowSum) a += pairs2(m);
  for (const m of colSum) b += pairs2(m);
  const expected = (a * b) / pairs2(n);
  const max = 0.5 * (a + b);
  return max === expected ? 1 : (index - expected) / (max - expected);
}
