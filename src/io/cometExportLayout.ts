/**
 * Columns of the one-line comet orbit export format, from the published column layout of
 * the one-line comet orbit export format. Comments: published 1-based inclusive columns;
 * constants: 0-based half-open [start, end).
 */
export const COMET_COLUMNS = {
  number: [0, 4], // 1–4 periodic comet number
  type: [4, 5], // 5 orbit type: C, P, D, X, I, A
  provisional: [5, 12], // 6–12 provisional designation, packed
  tpYear: [14, 18], // 15–18 year of perihelion passage (TT)
  tpMonth: [19, 21], // 20–21 month
  tpDay: [22, 29], // 23–29 day with fraction
  q: [30, 39], // 31–39 perihelion distance, au
  e: [41, 49], // 42–49 eccentricity
  peri: [51, 59], // 52–59 argument of perihelion, J2000, deg
  node: [61, 69], // 62–69 longitude of ascending node, J2000, deg
  incl: [71, 79], // 72–79 inclination, J2000, deg
  epochYear: [81, 85], // 82–85 epoch year (TT, 0h)
  epochMonth: [85, 87], // 86–87 epoch month
  epochDay: [87, 89], // 88–89 epoch day
  H: [91, 95], // 92–95 absolute magnitude M1
  G: [96, 100], // 97–100 slope parameter K1 (stored as G)
  readable: [102, 158], // 103–158 designation and name
  reference: [159, 168], // 160–168 reference (real lines run longer: read to the end)
} as const satisfies Record<string, readonly [number, number]>;
/** Orbit type letters of the format. */
export const COMET_ORBIT_TYPES = 'CPDXIA';
