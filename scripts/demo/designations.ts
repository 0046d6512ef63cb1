/**
 * Invented designations for the demo scenario, in the readable forms; the packed forms are
 * made by the project's own packer (src/io). Numbered bodies get permanent numbers far above
 * any real one (tilde-packed range); provisional designations use the years 2030–2032 only;
 * comets get provisional comet designations in the same years.
 *
 * Provisional designation: year, half-month letter (A–Y without I, 24 letters, one per half
 * month), second letter (A–Z without I, 25 letters) and cycle count (omitted when 0): the
 * published scheme of provisional minor-planet designations (common practice).
 */
import { FIRST_INVENTED_NUMBER, LAST_TILDE_NUMBER, PROVISIONAL_YEARS } from './scenario.js';

export const HALF_MONTH_LETTERS = 'ABCDEFGHJKLMNOPQRSTUVWXY';
export const SECOND_LETTERS = 'ABCDEFGHJKLMNOPQRSTUVWXYZ';
/**
 * Designations per half month: cycle counts past 619 are written in the extended packed
 * form (underscore-prefixed; the count of designations past cycle 619 in four base-62
 * digits), so a half month holds 620·25 + 62^4 of them. Only the 1.5 M-row benchmark dumps
 * get past cycle 619.
 */
const PER_HALF_MONTH = 620 * SECOND_LETTERS.length + 62 ** 4;

/**
 * Bare two-letter designations (cycle count 0) never handed out: they read as common
 * abbreviations in running text, where a search for the abbreviation would find the demo's
 * files. The allocator steps over them (our choice).
 */
export const SKIPPED_BARE_PAIRS: readonly (readonly [halfMonthLetter: string, secondLetter: string])[] = [['F', 'O']];

/** Half-month index 0..23 of a calendar date (day 1–15 → first half). */
export function halfMonthIndex(month: number, day: number): number {
  return (month - 1) * 2 + (day >= 16 ? 1 : 0);
}

/**
 * Hands out designations in order, never the same twice. One allocator per generated
 * catalogue: its counters are its own (re-entrant, no module state).
 */
export class DesignationAllocator {
  private nextNumber = FIRST_INVENTED_NUMBER;
  private readonly provisionalCount = new Uint32Array(PROVISIONAL_YEARS.length * 24);
  private readonly cometCount = new Uint32Array(PROVISIONAL_YEARS.length * 24);

  /** Next invented permanent number. */
  number(): number {
    if (this.nextNumber > LAST_TILDE_NUMBER) {
      throw new RangeError(`DesignationAllocator: invented numbers exhausted at ${this.nextNumber}`);
    }
    return this.nextNumber++;
  }

  /** Next provisional designation of a half month, e.g. '2031 AB123'. */
  provisional(year: number, halfMonth: number): string {
    const slot = this.slot(year, halfMonth);
    let n = this.provisionalCount[slot];
    while (n < PER_HALF_MONTH && isSkipped(halfMonth, n)) n++;
    if (n >= PER_HALF_MONTH) {
      throw new RangeError(`DesignationAllocator: provisional designations of ${year} half month ${halfMonth} exhausted`);
    }
    this.provisionalCount[slot] = n + 1;
    return provisionalText(year, halfMonth, n);
  }

  /** Next comet designation of a half month, e.g. 'P/2031 C2'. */
  comet(orbitType: 'C' | 'P', year: number, halfMonth: number): string {
    const slot = this.slot(year, halfMonth);
    const n = ++this.cometCount[slot];
    return `${orbitType}/${year} ${HALF_MONTH_LETTERS[halfMonth]}${n}`;
  }

  private slot(year: number, halfMonth: number): number {
    const y = PROVISIONAL_YEARS.indexOf(year as (typeof PROVISIONAL_YEARS)[number]);
    if (y < 0 || !(halfMonth >= 0 && halfMonth < 24)) {
      throw new RangeError(`DesignationAllocator: no invented designations for ${year}, half month ${halfMonth}`);
    }
    return y * 24 + halfMonth;
  }
}

/** Whether the n-th designation of a half month is a skipped bare pair. */
function isSkipped(halfMonth: number, n: number): boolean {
  return n < SECOND_LETTERS.length && SKIPPED_BARE_PAIRS.some(([h, l]) => h === HALF_MONTH_LETTERS[halfMonth] && l === SECOND_LETTERS[n]);
}

/** Readable provisional designation of the n-th body (0-based) of a half month. */
export function provisionalText(year: number, halfMonth: number, n: number): string {
  const cycle = Math.floor(n / SECOND_LETTERS.length);
  const letter = SECOND_LETTERS[n % SECOND_LETTERS.length];
  return `${year} ${HALF_MONTH_LETTERS[halfMonth]}${letter}${cycle > 0 ? cycle : ''}`;
}
