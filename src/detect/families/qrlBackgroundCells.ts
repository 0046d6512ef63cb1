/**
 * A smooth random background from a coarse-grid density, for the quasi-random level
 * (qrlCutoff.ts): space is cut into boxes of `cell` (a, e, sin i) and each body is moved to a
 * uniform random place inside its own box. The counts per box — the density at the scale of
 * the boxes — stay exactly as observed; every structure smaller than a box (families among
 * them, where they are smaller) is smoothed away. Our construction, after the quasi-random
 * populations of Zappalà et al. 1995 (Icarus 116, 291); qrlBackground.ts keeps the marginals
 * instead. Rows with a NaN element keep their values.
 */
import type { Random } from '../../core/random.js';
import { copyColumns, type Background } from './qrlBackground.js';

/** Box edges of the coarse grid. */
export interface CoarseCell {
  readonly aAu: number;
  readonly e: number;
  readonly sinI: number;
}

/** One background from `random`: each body uniform in its box of the coarse grid. */
export function coarseCellBackground(aAu: ArrayLike<number>, e: ArrayLike<number>, sinI: ArrayLike<number>, cell: CoarseCell, random: Random): Background {
  const out = copyColumns('coarseCellBackground', aAu, e, sinI);
  if (!(cell.aAu > 0 && cell.e > 0 && cell.sinI > 0)) throw new RangeError(`coarseCellBackground: box edges must be positive, got ${cell.aAu}, ${cell.e}, ${cell.sinI}`);
  for (let k = 0; k < aAu.length; k++) {
    if (!(aAu[k] === aAu[k] && e[k] === e[k] && sinI[k] === sinI[k])) continue;
    out.aAu[k] = (Math.floor(aAu[k] / cell.aAu) + random()) * cell.aAu;
    out.e[k] = (Math.floor(e[k] / cell.e) + random()) * cell.e;
    out.sinI[k] = (Math.floor(sinI[k] / cell.sinI) + random()) * cell.sinI;
  }
  return out;
}
