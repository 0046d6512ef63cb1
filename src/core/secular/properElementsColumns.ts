/**
 * Proper elements for catalogue columns: one model per epoch, then typed-array columns in,
 * typed-array columns out, no per-row objects. Inputs as the Catalogue stores them
 * (src/clean/types.ts): a in au, e, and i, node, peri in radians (J2000 ecliptic).
 * Rows [start, end) are filled; other rows of the outputs are left as they are.
 */
import { newProperScratch, properElementsKernel } from './properElementsKernel.js';
import type { SecularModel } from './types.js';

export interface OsculatingColumns {
  a: Float64Array; e: Float64Array; i: Float64Array; node: Float64Array; peri: Float64Array;
}

/** Caller-owned outputs, each at least as long as the inputs. */
export interface ProperColumns {
  aAu: Float64Array; // proper a (= osculating a in linear theory); NaN when not computed
  e: Float64Array; // proper e; NaN when not computed
  sinI: Float64Array; // proper sin i
  gArcsecPerYear: Float64Array;
  sArcsecPerYear: Float64Array;
  reliability: Uint8Array; // bits of reliability.ts; 0 = no reason found to distrust
}

export function newProperColumns(size: number): ProperColumns {
  return {
    aAu: new Float64Array(size), e: new Float64Array(size), sinI: new Float64Array(size),
    gArcsecPerYear: new Float64Array(size), sArcsecPerYear: new Float64Array(size), reliability: new Uint8Array(size),
  };
}

export function properElementsColumns(
  model: SecularModel, cols: OsculatingColumns, out: ProperColumns, start = 0, end = cols.a.length,
): void {
  const n = cols.a.length;
  if (cols.e.length !== n || cols.i.length !== n || cols.node.length !== n || cols.peri.length !== n) {
    throw new RangeError('properElementsColumns: input columns differ in length');
  }
  if (!(Number.isInteger(start) && Number.isInteger(end) && 0 <= start && start <= end && end <= n)) {
    throw new RangeError(`properElementsColumns: bad row range [${start}, ${end}) for ${n} rows`);
  }
  for (const [name, col] of Object.entries(out)) {
    if ((col as ArrayLike<number>).length < end) throw new RangeError(`properElementsColumns: output ${name} shorter than ${end}`);
  }
  const sc = newProperScratch(model);
  for (let r = start; r < end; r++) {
    const code = properElementsKernel(model, sc, cols.a[r], cols.e[r], cols.i[r], cols.node[r], cols.peri[r]);
    out.reliability[r] = code;
    out.aAu[r] = Number.isNaN(sc.eProper) ? NaN : cols.a[r];
    out.e[r] = sc.eProper;
    out.sinI[r] = sc.sinIProper;
    out.gArcsecPerYear[r] = sc.secular.gArcsecPerYear;
    out.sArcsecPerYear[r] = sc.secular.sArcsecPerYear;
  }
}
