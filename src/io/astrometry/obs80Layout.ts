/**
 * Columns of the 80-column optical astrometry record. Sources: the IAU Minor Planet Center's
 * published format description for optical astrometric observations of comets, minor
 * planets and natural satellites (columns 1–13 of minor planets and comets: checked); its
 * description of the satellite-based format (date 16–32 and observatory code 78–80, the same
 * in both lines; `s` line: column 33 units flag, X 35–45, Y 47–57, Z 59–69, sign in the first
 * column of each: checked). From memory, and matched on every line of the real sample: note 1
 * 14, note 2 15, RA 33–44, Dec 45–56, magnitude 66–70, band 71, and in published records the
 * catalogue code 72 and publication reference 73–77 (e.g. `Vca3812566`: band V, catalogue c,
 * reference a3812, station 566). The roving observer's `v` line (longitude 35–44, latitude
 * 46–55, altitude 57–61): format description, from memory; no real line at hand.
 * Comments give the published 1-based inclusive columns; the constants are 0-based
 * half-open [start, end) pairs.
 */
export const OBS80 = {
  number: [0, 5], // 1–5 packed minor-planet number; comets: 1–4 number, 5 orbit type
  provisional: [5, 12], // 6–12 packed provisional designation, or a temporary designation
  designation: [0, 12], // 1–12 both
  discovery: [12, 13], // 13 discovery asterisk
  note1: [13, 14], // 14 note 1 (publishable note, or a program code)
  note2: [14, 15], // 15 note 2: how the observation was made (./obs80NoteTwo.ts)
  date: [15, 32], // 16–32 'YYYY MM DD.dddddd', UTC
  year: [15, 19], // 16–19
  month: [20, 22], // 21–22
  day: [23, 32], // 24–32 day with its fraction
  ra: [32, 44], // 33–44 'hh mm ss.sss', J2000
  dec: [44, 56], // 45–56 'sdd mm ss.ss', J2000
  mag: [65, 70], // 66–70 magnitude
  band: [70, 71], // 71 band
  catalogue: [71, 72], // 72 catalogue code (published records)
  reference: [72, 77], // 73–77 publication reference (published records)
  station: [77, 80], // 78–80 observatory code
  // second line of a space-based pair ('s' in column 15)
  units: [32, 33], // 33 '1' km, '2' au; geocentric, equatorial J2000
  x: [34, 45], // 35–45 X, sign in 35
  y: [46, 57], // 47–57 Y, sign in 47
  z: [58, 69], // 59–69 Z, sign in 59
  // second line of a roving pair ('v' in column 15)
  longitude: [34, 44], // 35–44 east longitude, degrees
  latitude: [45, 55], // 46–55 latitude, degrees, sign in 46
  altitude: [56, 61], // 57–61 altitude, metres
} as const satisfies Record<string, readonly [number, number]>;

/** Length of a record. */
export const OBS80_LINE_LENGTH = 80;
