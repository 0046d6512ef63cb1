/**
 * Types of the astrometry readers: one observation of a body's position on the sky, the
 * observatory-code table, and what a read reports. Missing-value policy as in ../types.ts:
 * a number the input does not give is NaN, a string it does not give is ''.
 */

/** Formats of astrometry files the readers understand. */
export type AstrometryFormat = 'obs80' | 'ades-psv';

/**
 * Where the observer was: 'optical' at a fixed site of the observatory-code table,
 * 'space' on a spacecraft whose geocentric position the record gives, 'roving' at a site
 * (longitude, latitude, altitude) the record gives.
 */
export type ObserverKind = 'optical' | 'space' | 'roving';

/** A roving observer's site as the record gives it. */
export interface RovingSite {
  longitudeDegE: number; // east longitude, degrees
  latitudeDeg: number; // geodetic latitude, degrees, north positive
  altitudeM: number; // altitude, metres (NaN when not given)
}

/** One astrometric observation. Angles are J2000 equatorial (ICRF), times UTC as written. */
export interface AstrometryObservation {
  designation: string; // readable: '(12893)', '2019 EU5', 'C/1995 O1', '1P', or a temporary designation as written
  packed: string; // the designation as written (80-column: columns 1–12 trimmed; ADES: the id field used)
  number: number; // minor-planet or periodic-comet number, NaN when not given
  provisional: string; // readable provisional designation the record gives ('' when none; the designation itself for a provisional-only record; as written when beside a number it does not unpack)
  temporary: boolean; // true when the designation is an observer's temporary one (no packed form)
  timeJdUtc: number; // Julian date, UTC, as written
  timeJdTT: number; // the same instant in TT through the leap-second table; NaN before 1972 (no table entry)
  raRad: number; // right ascension, J2000
  decRad: number; // declination, J2000
  raDecimals: number; // decimals written in the last RA unit (80-column: seconds of time, or minutes when no seconds; ADES: degrees)
  decDecimals: number; // decimals written in the last Dec unit (80-column: arcseconds, or arcminutes; ADES: degrees)
  raResolutionArcsec: number; // one unit of the last written RA decimal, arcseconds of RA (not × cos δ)
  decResolutionArcsec: number; // one unit of the last written Dec decimal, arcseconds
  sigmaRaCosDecArcsec: number; // stated uncertainty of RA × cos δ (ADES rmsRA); NaN when none
  sigmaDecArcsec: number; // stated uncertainty of Dec (ADES rmsDec); NaN when none
  correlationRaDec: number; // ADES rmsCorr; NaN when none
  station: string; // observatory code, 3 characters
  kind: ObserverKind;
  observerGeocentricKm: [number, number, number] | null; // space-based: geocentre → observer, equatorial J2000, km
  rovingSite: RovingSite | null;
  mag: number; // NaN when not given
  band: string;
  note1: string; // 80-column note 1 (column 14), '' otherwise
  note2: string; // 80-column note 2 (column 15; ' ' written as ''), '' for ADES
  mode: string; // ADES mode (e.g. 'CCD'), '' for 80-column
  catalogue: string; // 80-column catalogue code (column 72) or ADES astCat; '' when none
  discovery: boolean; // 80-column discovery asterisk
  file: string;
  line: number; // 1-based line of the record (the first line of a two-line record)
  lines: number; // physical lines of the record: 1, or 2 for a space-based or roving pair
}

/** One station of the observatory-code table. */
export interface ObservatorySite {
  code: string; // 3 characters
  longitudeDegE: number; // NaN when the site is not fixed
  rhoCosPhiPrime: number; // parallax constant ρ cos φ′, Earth equatorial radii; NaN when not fixed
  rhoSinPhiPrime: number; // parallax constant ρ sin φ′, Earth equatorial radii; NaN when not fixed
  name: string;
  fixedSite: boolean; // false for space-based and roving codes (blank position columns)
}

/** Observations of one designation in a file. */
export interface DesignationCount {
  designation: string;
  observations: number;
  firstLine: number;
}
