/**
 * Eigenmodes of a secular matrix (A or B of secularMatrices.ts) and their amplitudes and
 * phases fitted to the planets' (h, k) or (p, q) at one epoch.
 *
 * Solution (Murray & Dermott 1999, ch. 7, from memory): with g_i the eigenvalues and E the
 * eigenvector matrix (column i = mode i),
 *   h_j(t) = Σ_i E_ji S_i sin(g_i t + β_i),  k_j(t) = Σ_i E_ji S_i cos(g_i t + β_i),
 * so at the epoch (t = 0) x_i = S_i sin β_i and y_i = S_i cos β_i solve E x = h, E y = k.
 * Modes are numbered as the trade numbers them (g_1…g_8, s_1…s_8, common practice): mode i
 * is the one whose eigenvector is dominated by planet i, found as the assignment that
 * maximises the product of |E_ji| / max_j |E_ji| over planets; for B the zero-frequency
 * mode (the whole system's plane, s_5 = 0 by convention) is given to Jupiter first.
 * Eigenvalues of these matrices are real (A and B are similar to symmetric matrices).
 */
import { EigenvalueDecomposition, Matrix, inverse } from 'ml-matrix';

/** The modes of one matrix, numbered like the planets. */
export interface SecularModes {
  frequencyArcsecPerYear: Float64Array; // g_i or s_i
  vectors: Float64Array; // row-major N×N: vectors[j*N + i] = E_ji, column i = mode i
  sinPhaseAmplitude: Float64Array; // x_i = S_i sin β_i at the epoch (E scaled as stored)
  cosPhaseAmplitude: Float64Array; // y_i = S_i cos β_i
}

function permutations(items: number[]): number[][] {
  if (items.length <= 1) return [items.slice()];
  const out: number[][] = [];
  for (let k = 0; k < items.length; k++) {
    const rest = items.slice(0, k).concat(items.slice(k + 1));
    for (const p of permutations(rest)) out.push([items[k], ...p]);
  }
  return out;
}

/** mode index for each planet: planetMode[j] = column of E assigned to planet j. */
function assignModes(E: Matrix, n: number, fixed: Map<number, number>): number[] {
  const score = (j: number, col: number): number => {
    let max = 0;
    for (let r = 0; r < n; r++) max = Math.max(max, Math.abs(E.get(r, col)));
    return Math.log(Math.abs(E.get(j, col)) / max + 1e-300);
  };
  const freePlanets = [...Array(n).keys()].filter((j) => !fixed.has(j));
  const usedCols = new Set(fixed.values());
  const freeCols = [...Array(n).keys()].filter((c) => !usedCols.has(c));
  let best: number[] = freeCols, bestScore = -Infinity;
  for (const p of permutations(freeCols)) {
    let sc = 0;
    for (let k = 0; k < freePlanets.length; k++) sc += score(freePlanets[k], p[k]);
    if (sc > bestScore) { bestScore = sc; best = p; }
  }
  const planetMode = new Array<number>(n);
  for (const [j, c] of fixed) planetMode[j] = c;
  freePlanets.forEach((j, k) => { planetMode[j] = best[k]; });
  return planetMode;
}

/**
 * Modes of the row-major N×N `matrix` fitted to the planets' vectors at the epoch
 * (sinComponent = h or p, cosComponent = k or q). zeroModePlanet: the planet that takes a
 * zero eigenvalue (B: Jupiter), or −1.
 */
export function secularModes(
  matrix: Float64Array, n: number, sinComponent: readonly number[], cosComponent: readonly number[], zeroModePlanet = -1,
): SecularModes {
  const m = new Matrix(n, n);
  for (let j = 0; j < n; j++) for (let k = 0; k < n; k++) m.set(j, k, matrix[j * n + k]);
  const evd = new EigenvalueDecomposition(m);
  const re = evd.realEigenvalues, im = evd.imaginaryEigenvalues;
  const E = evd.eigenvectorMatrix;
  const scale = Math.max(...re.map(Math.abs));
  for (let i = 0; i < n; i++) {
    if (Math.abs(im[i]) > 1e-9 * scale) throw new Error(`secular modes: complex eigenvalue ${re[i]} ± ${im[i]}i (matrix not of the secular form)`);
  }
  const fixed = new Map<number, number>();
  if (zeroModePlanet >= 0) {
    let z = 0;
    for (let i = 1; i < n; i++) if (Math.abs(re[i]) < Math.abs(re[z])) z = i;
    fixed.set(zeroModePlanet, z);
  }
  const planetMode = assignModes(E, n, fixed);
  const freq = new Float64Array(n), vectors = new Float64Array(n * n);
  const Es = new Matrix(n, n);
  for (let i = 0; i < n; i++) {
    const c = planetMode[i];
    freq[i] = zeroModePlanet === i ? 0 : re[c]; // the zero mode is exactly 0 (conservation of angular momentum); numerically ~1e-15
    for (let j = 0; j < n; j++) { vectors[j * n + i] = E.get(j, c); Es.set(j, i, E.get(j, c)); }
  }
  const inv = inverse(Es);
  const x = inv.mmul(Matrix.columnVector([...sinComponent])), y = inv.mmul(Matrix.columnVector([...cosComponent]));
  return {
    frequencyArcsecPerYear: freq, vectors,
    sinPhaseAmplitude: Float64Array.from(x.getColumn(0)), cosPhaseAmplitude: Float64Array.from(y.getColumn(0)),
  };
}
