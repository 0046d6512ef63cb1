/**
 * Fixed facts of the demo scenario: the common osculation epoch, the date the catalogue is
 * cut, the invented designation ranges, and the default seed and sizes.
 */
import { calendarToJd } from '../../src/core/time/julian.js';

/** Common osculation epoch of every orbit in the demo: 2032 May 10.0 TT. */
export const DEMO_EPOCH = { year: 2032, month: 5, day: 10 } as const;
export const DEMO_EPOCH_JD_TT = calendarToJd(DEMO_EPOCH.year, DEMO_EPOCH.month, DEMO_EPOCH.day);

/** The catalogue is cut (last observations end) on 2032 May 28.0 TT. */
export const DEMO_CUT_JD_TT = calendarToJd(2032, 5, 28);

/** Invented provisional designations use these years only (no real body carries them). */
export const PROVISIONAL_YEARS = [2030, 2031, 2032] as const;

/**
 * Invented permanent numbers start here: far above any number assigned so far, and inside
 * the range of the tilde-prefixed packed form (620 000 + 62^4 − 1 = 15 396 335).
 * The letter-prefixed packed range (100 000–619 999) is not used: every number in it
 * already belongs to a real body.
 */
export const FIRST_INVENTED_NUMBER = 9_000_001;
export const LAST_TILDE_NUMBER = 620_000 + 62 ** 4 - 1;

/** Defaults of the demo catalogue. */
export const DEFAULT_SEED = 20320510;
export const DEFAULT_BODIES = 20_000;
export const DEFAULT_COMETS = 300;

/** Shares of the asteroid file by section (numbered, multi-opposition, one-opposition). */
export const SECTION_SHARES = { numbered: 0.55, multiOpposition: 0.37, oneOpposition: 0.08 } as const;
export type Section = keyof typeof SECTION_SHARES;
export const SECTIONS: readonly Section[] = ['numbered', 'multiOpposition', 'oneOpposition'];

/** Slope parameter G written on every asteroid line (the customary default 0.15). */
export const DEFAULT_SLOPE_G = 0.15;

/** Publication reference written on every line: the project's own wording. */
export const DEMO_REFERENCE_ASTEROID = 'WWDEMO-32';
export const DEMO_REFERENCE_COMET = 'WWDEMO-32C';
