/**
 * Columns of the one-line minor-planet orbit export format, from the published column
 * layout of the one-line minor-planet orbit export format. The comments give the published
 * 1-based inclusive columns; the constants are 0-based half-open [start, end) pairs.
 */
export const ORBIT_COLUMNS = {
  packed: [0, 7], // 1–7 packed designation
  H: [8, 13], // 9–13 absolute magnitude H
  G: [14, 19], // 15–19 slope parameter G
  epoch: [20, 25], // 21–25 packed epoch (TT, 0h)
  M: [26, 35], // 27–35 mean anomaly at epoch, deg
  peri: [37, 46], // 38–46 argument of perihelion, J2000, deg
  node: [48, 57], // 49–57 longitude of ascending node, J2000, deg
  incl: [59, 68], // 60–68 inclination, J2000, deg
  e: [70, 79], // 71–79 eccentricity
  n: [80, 91], // 81–91 mean daily motion, deg/day
  a: [92, 103], // 93–103 semimajor axis, au
  U: [105, 106], // 106 uncertainty parameter U, or a letter code
  reference: [107, 116], // 108–116 reference
  nObs: [117, 122], // 118–122 number of observations
  nOpp: [123, 126], // 124–126 number of oppositions
  arc: [127, 136], // 128–136 'YYYY-YYYY' (multi-opposition) or 'NNNN days'
  rms: [137, 141], // 138–141 rms residual, arcsec
  coarsePerturbers: [142, 145], // 143–145
  precisePerturbers: [146, 149], // 147–149
  computer: [150, 160], // 151–160 orbit computer
  flags: [161, 165], // 162–165 four hexadecimal digits of flags
  readable: [166, 194], // 167–194 readable designation
  lastObs: [194, 202], // 195–202 date of last observation, YYYYMMDD
} as const satisfies Record<string, readonly [number, number]>;
