/**
 * Packed ↔ readable designations of minor planets and comets: one entry point over the
 * published packed forms (permanent numbers: ./packedNumber.ts; provisional, extended and
 * survey designations: ./packedProvisional.ts; comets: ./packedComet.ts).
 * Text in no known form → PackedFormError with a one-line reason (a line parser turns it
 * into an InputError naming file, line and column).
 */
import { PackedFormError } from './errors.js';
import { packComet, unpackComet } from './packedComet.js';
import { MAX_PACKED_NUMBER, packNumber, unpackNumber } from './packedNumber.js';
import { packProvisional, unpackProvisional } from './packedProvisional.js';

/**
 * Readable designation of a packed one: `00001` → `(1)`, `A0000` → `(100000)`,
 * `~0000` → `(620000)`, `K19E05U` → `2019 EU5`, `_EW002J` → `2014 WT625`,
 * `PLS2040` → `2040 P-L`, `CJ95O010` → `C/1995 O1`, `0001P` → `1P`, `0073P      b` → `73P-B`.
 */
export function unpackDesignation(packed: string): string {
  if (packed.length === 5) {
    const n = unpackNumber(packed);
    if (!Number.isNaN(n)) return `(${n})`;
  }
  const out = packed.length === 7 ? unpackProvisional(packed) : unpackComet(packed);
  if (out === '') throw new PackedFormError('unknown packed designation form', packed);
  return out;
}

/**
 * Packed form of a readable designation: `(1)`, `(1) Ceres` or `1` → `00001`;
 * `2019 EU5` → `K19E05U`; `2014 WT625` → `_EW002J`; `2040 P-L` → `PLS2040`;
 * `C/1995 O1` → `CJ95O010`; `1P` or `1P/Halley` → `0001P`.
 */
export function packDesignation(readable: string): string {
  const text = readable.trim();
  const num = /^\((\d+)\)(?: .*)?$/.exec(text) ?? /^(\d+)$/.exec(text);
  if (num) {
    const n = Number(num[1]);
    if (n < 1 || n > MAX_PACKED_NUMBER) {
      throw new PackedFormError(`number outside the packed range 1..${MAX_PACKED_NUMBER}`, readable);
    }
    return packNumber(n);
  }
  const out = text.includes('/') || /^\d{1,4}[PDI](-[A-Z]{1,2})?$/.test(text) ? packComet(text) : packProvisional(text);
  if (out === '') throw new PackedFormError('designation in no packable form', readable);
  return out;
}
