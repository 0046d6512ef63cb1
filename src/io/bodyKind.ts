/**
 * Asteroid or comet: how a CSV/TSV row is classed. The fixed-width export formats say it by
 * their format (one for minor-planet orbits, one for comet orbits); a CSV table does not, so
 * its rows are classed by the shape of the designation unless the caller forces one kind.
 *
 * The rule (`'designation-pattern'`): a row is a comet when its readable designation has a
 * comet form of the IAU designation system (common practice):
 * - a periodic-comet number followed by P, D or I, alone or before '/' or a fragment '-'
 *   ('1P', '1P/Halley', '73P-B', '2I/Borisov');
 * - a prefix P/, C/, D/, X/, I/ or A/ before a provisional designation ('C/1995 O1',
 *   'P/2004 V5-A'; A/ marks a body first designated as a comet that proved asteroidal, and
 *   is classed with the comets because its orbit was published as one).
 * Every other designation ('(1) Ceres', '2019 EU5', '433') is an asteroid. A comet table
 * whose designation column holds only names, or numbers without the letter, is therefore
 * read as asteroids: force the kind for such a table.
 */
import type { BodyKind } from './types.js';

/** How the rows of a CSV input are classed: by designation, or all one kind. */
export type CsvKindChoice = 'auto' | BodyKind;

export const CSV_KIND_CHOICES: readonly CsvKindChoice[] = ['auto', 'asteroid', 'comet'];

/** Which rule classed the rows of one input, for the run summary. */
export type BodyKindRule = 'format' | 'designation-pattern' | 'forced';

/** The comet forms of the file comment, on a readable designation. */
export const COMET_DESIGNATION = /^(\d+[PDI](\/|$|-)|[PCDXIA]\/)/;

/** Kind of a readable designation by the designation pattern. */
export function kindOfDesignation(designation: string): BodyKind {
  return COMET_DESIGNATION.test(designation) ? 'comet' : 'asteroid';
}
