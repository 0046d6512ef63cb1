/**
 * Validity rules for one parsed row. A row that breaks one is rejected with the reason
 * returned here; the run goes on. The rules: every element finite; e ≥ 0 (and below the
 * limit); a > 0 when e < 1; q > 0; angles in range; a plausible epoch; H in range;
 * enough to place the body on its orbit (mean anomaly or perihelion time).
 */
import type { OrbitRow } from '../io/types.js';
import type { ValidityLimits } from './thresholds.js';

function outOfRange(v: number, lo: number, hi: number): boolean {
  return !(v >= lo && v <= hi);
}

function fmt(v: number): string {
  return Number.isFinite(v) ? String(v) : Number.isNaN(v) ? 'missing' : String(v);
}

/**
 * True when a row plainly passes every rule: the common case, tested with comparisons only
 * (NaN fails every comparison, so missing values fall through to the detailed checks).
 */
function plainlyValid(row: OrbitRow, limits: ValidityLimits): boolean {
  return (
    row.e >= 0 && row.e < 1 && row.aAu > 0 && row.aAu < Infinity &&
    row.epochJdTT >= limits.epochMinJdTT && row.epochJdTT <= limits.epochMaxJdTT &&
    row.iDeg >= 0 && row.iDeg <= 180 && row.nodeDeg >= 0 && row.nodeDeg <= 360 &&
    row.periDeg >= 0 && row.periDeg <= 360 && row.meanAnomalyDeg >= 0 && row.meanAnomalyDeg <= 360 &&
    (Number.isNaN(row.qAu) || (row.qAu > 0 && row.qAu < Infinity)) &&
    (Number.isNaN(row.H) || (row.H >= limits.hMin && row.H <= limits.hMax)) &&
    row.designation.length > 0 && row.designation.charCodeAt(0) > 32
  );
}

/** Reason the row is invalid, or null when it passes every rule. Does not modify the row. */
export function invalidReason(row: OrbitRow, limits: ValidityLimits): string | null {
  return plainlyValid(row, limits) ? null : ruleByRule(row, limits);
}

/** The rules one by one, naming the first that fails (exported for its equivalence test). */
export function ruleByRule(row: OrbitRow, limits: ValidityLimits): string | null {
  if (row.designation.trim() === '') return 'no designation';
  if (!Number.isFinite(row.e)) return `eccentricity is ${fmt(row.e)}`;
  if (row.e < 0) return `eccentricity ${row.e} is negative`;
  if (row.e > limits.eMax) return `eccentricity ${row.e} above ${limits.eMax}`;
  if (!Number.isFinite(row.epochJdTT)) return `epoch is ${fmt(row.epochJdTT)}`;
  if (outOfRange(row.epochJdTT, limits.epochMinJdTT, limits.epochMaxJdTT)) {
    return `epoch JD ${row.epochJdTT} outside ${limits.epochMinJdTT}..${limits.epochMaxJdTT}`;
  }
  if (outOfRange(row.iDeg, 0, 180)) return `inclination ${fmt(row.iDeg)} deg outside 0..180`;
  if (outOfRange(row.nodeDeg, 0, 360)) return `node ${fmt(row.nodeDeg)} deg outside 0..360`;
  if (outOfRange(row.periDeg, 0, 360)) {
    return `argument of perihelion ${fmt(row.periDeg)} deg outside 0..360`;
  }
  const hasA = !Number.isNaN(row.aAu);
  const hasQ = !Number.isNaN(row.qAu);
  if (hasA && !Number.isFinite(row.aAu)) return `semimajor axis is ${row.aAu}`;
  if (hasQ && !(Number.isFinite(row.qAu) && row.qAu > 0)) {
    return `perihelion distance ${row.qAu} is not positive`;
  }
  if (!hasA && !hasQ) return 'neither semimajor axis nor perihelion distance given';
  if (row.e < 1 && hasA && !(row.aAu > 0)) return `semimajor axis ${row.aAu} not positive with e = ${row.e} < 1`;
  if (row.e > 1 && hasA && !hasQ && row.aAu > 0) {
    return `semimajor axis ${row.aAu} positive with hyperbolic e = ${row.e} (expected a < 0)`;
  }
  if (row.e === 1 && !hasQ) return 'parabolic orbit without perihelion distance';
  const hasM = !Number.isNaN(row.meanAnomalyDeg);
  if (hasM && outOfRange(row.meanAnomalyDeg, 0, 360)) {
    return `mean anomaly ${fmt(row.meanAnomalyDeg)} deg outside 0..360`;
  }
  if (!hasM && !Number.isFinite(row.tpJdTT)) return 'neither mean anomaly nor perihelion time given';
  if (hasM && row.e >= 1 && !Number.isFinite(row.tpJdTT)) {
    return `mean anomaly given for a non-elliptic orbit (e = ${row.e}) without perihelion time`;
  }
  if (!Number.isNaN(row.H) && outOfRange(row.H, limits.hMin, limits.hMax)) {
    return `absolute magnitude ${row.H} outside ${limits.hMin}..${limits.hMax}`;
  }
  return null;
}
