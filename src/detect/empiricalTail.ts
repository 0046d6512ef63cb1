/**
 * Empirical calibration: the fraction of a reference sample at least as extreme as a value.
 * With the sample sorted once, each query is a binary search. The estimate for a value
 * beyond every sample member is 1/(n+1) rather than 0 (the usual plus-one rule for
 * empirical p-values: Davison & Hinkley 1997, Bootstrap Methods, eq. 4.11, where the n
 * reference values do not include the observed one). For a value that is itself one of the
 * sample's members, the rule applied to the other n − 1 members gives
 * (1 + #{others as extreme})/n = #{members as extreme, itself included}/n: the member
 * functions below; the plain ones would count the value twice.
 */

/** Number of entries of ascending `sorted` that are ≤ x. */
export function countAtMost(sorted: Float64Array, x: number): number {
  let lo = 0;
  let hi = sorted.length;
  while (lo < hi) {
    const mid = (lo + hi) >>> 1;
    if (sorted[mid] <= x) lo = mid + 1;
    else hi = mid;
  }
  return lo;
}

/** (1 + #{s ≤ x}) / (n + 1): how often the reference sample is at least this low. */
export function lowerTailFraction(sorted: Float64Array, x: number): number {
  return (1 + countAtMost(sorted, x)) / (sorted.length + 1);
}

/** Number of entries of ascending `sorted` that are ≥ x. */
export function countAtLeast(sorted: Float64Array, x: number): number {
  let lo = 0;
  let hi = sorted.length;
  while (lo < hi) {
    const mid = (lo + hi) >>> 1;
    if (sorted[mid] < x) lo = mid + 1;
    else hi = mid;
  }
  return sorted.length - lo;
}

/** (1 + #{s ≥ x}) / (n + 1): how often the reference sample is at least this high. */
export function upperTailFraction(sorted: Float64Array, x: number): number {
  return (1 + countAtLeast(sorted, x)) / (sorted.length + 1);
}

/** #{s ≤ x} / n for x a member of `sorted`: the plus-one rule over the other members. */
export function memberLowerTailFraction(sorted: Float64Array, x: number): number {
  return memberFraction(countAtMost(sorted, x), sorted.length, x);
}

/** #{s ≥ x} / n for x a member of `sorted`: the plus-one rule over the other members. */
export function memberUpperTailFraction(sorted: Float64Array, x: number): number {
  return memberFraction(countAtLeast(sorted, x), sorted.length, x);
}

function memberFraction(count: number, n: number, x: number): number {
  if (count === 0) throw new RangeError(`tail fraction of a sample member: ${x} is not in the sample of ${n}`);
  return count / n;
}
