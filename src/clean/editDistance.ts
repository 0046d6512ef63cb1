/**
 * Edit distance between two short strings (insertions, deletions and substitutions of one
 * UTF-16 code unit each cost 1), by the dynamic programme of Wagner & Fischer 1974 (J. ACM
 * 21, 168), one row at a time. Bounded: once every entry of a row exceeds the bound the
 * answer cannot come back under it, so the programme stops (common practice), which keeps a
 * scan of a whole catalogue for near spellings cheap.
 */

let rowScratch = new Int32Array(64);

/**
 * Edit distance between `a` and `b` when it is at most `maxDistance`, else maxDistance + 1.
 * `maxDistance` must be a non-negative integer (RangeError otherwise).
 */
export function boundedEditDistance(a: string, b: string, maxDistance: number): number {
  if (!Number.isInteger(maxDistance) || maxDistance < 0) {
    throw new RangeError(`boundedEditDistance: maxDistance ${maxDistance} is not a non-negative integer`);
  }
  const over = maxDistance + 1;
  if (Math.abs(a.length - b.length) > maxDistance) return over;
  const n = b.length;
  if (rowScratch.length < n + 1) rowScratch = new Int32Array(2 * (n + 1));
  const row = rowScratch; // row[j]: distance between a[0, i) and b[0, j)
  for (let j = 0; j <= n; j++) row[j] = j;
  for (let i = 1; i <= a.length; i++) {
    const ca = a.charCodeAt(i - 1);
    let diagonal = row[0]; // distance of a[0, i-1) and b[0, j-1)
    row[0] = i;
    let rowMin = i;
    for (let j = 1; j <= n; j++) {
      const above = row[j];
      const cost = ca === b.charCodeAt(j - 1) ? 0 : 1;
      const d = Math.min(above + 1, row[j - 1] + 1, diagonal + cost);
      row[j] = d;
      diagonal = above;
      if (d < rowMin) rowMin = d;
    }
    if (rowMin > maxDistance) return over;
  }
  return row[n] > maxDistance ? over : row[n];
}
