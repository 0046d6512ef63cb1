/**
 * Note 2 of the 80-column record (column 15): how the observation was made. Codes and
 * meanings: published format description for optical astrometric observations, from memory
 * (blank or P photographic, e encoder, C CCD, T meridian or transit circle, M micrometer,
 * V/v roving observer, R/r radar, S/s satellite-based, c corrected-without-republication
 * CCD, E occultation-derived, O offset (natural satellites only), H Hipparcos geocentric,
 * N normal place, n mini-normal place from video frames, A converted from B1950.0, X/x
 * replaced or deleted observation).
 *
 * What the readers do with each (a decision of this project): a position on the sky
 * measured from a known place is read ('read'); the first line of a two-line record waits
 * for its second ('pair-first'), which must follow it ('pair-second'); everything that is
 * not an optical position for an orbit fit is rejected with the reason given here.
 */

export type NoteTwoUse = 'read' | 'pair-first' | 'pair-second' | 'reject';

export interface NoteTwoEntry {
  use: NoteTwoUse;
  meaning: string;
  reason?: string; // why a rejected kind is not read
}

const TABLE: Readonly<Record<string, NoteTwoEntry>> = {
  ' ': { use: 'read', meaning: 'photographic' },
  P: { use: 'read', meaning: 'photographic' },
  e: { use: 'read', meaning: 'encoder' },
  C: { use: 'read', meaning: 'CCD' },
  c: { use: 'read', meaning: 'CCD, corrected without republication' },
  T: { use: 'read', meaning: 'meridian or transit circle' },
  M: { use: 'read', meaning: 'micrometer' },
  E: { use: 'read', meaning: 'occultation-derived' },
  H: { use: 'read', meaning: 'Hipparcos geocentric' },
  N: { use: 'read', meaning: 'normal place' },
  n: { use: 'read', meaning: 'mini-normal place from video frames' },
  A: { use: 'read', meaning: 'converted from B1950.0' },
  S: { use: 'pair-first', meaning: 'space-based (first line)' },
  s: { use: 'pair-second', meaning: 'space-based (observer position line)' },
  V: { use: 'pair-first', meaning: 'roving observer (first line)' },
  v: { use: 'pair-second', meaning: 'roving observer (site line)' },
  R: { use: 'reject', meaning: 'radar', reason: 'radar observation (note 2 R): a delay or Doppler record, not an optical position' },
  r: { use: 'reject', meaning: 'radar', reason: 'radar observation (note 2 r): a delay or Doppler record, not an optical position' },
  O: { use: 'reject', meaning: 'offset', reason: 'offset observation (note 2 O): relative to a planet, used for natural satellites only' },
  X: { use: 'reject', meaning: 'replaced', reason: 'replaced observation (note 2 X): superseded by a remeasured one, not used in a fit' },
  x: { use: 'reject', meaning: 'deleted', reason: 'deleted observation (note 2 x): not used in a fit' },
};

/** The entry for a note 2 character, or undefined for a code this table does not know. */
export function noteTwoEntry(code: string): NoteTwoEntry | undefined {
  return Object.hasOwn(TABLE, code) ? TABLE[code] : undefined;
}
