/**
 * Right ascension and declination written as the 80-column record writes them: the inverse
 * of ./sexagesimal.ts for the forms it reads ('hh mm ss.sss' / 'hh mm.mmm', 'sdd mm ss.ss' /
 * 'sdd mm.mm', one space between the parts). The angle is rounded once, in whole units of the
 * last written decimal, and carried upwards with integers, so no '60.00' is ever written.
 */

/** Last written part: seconds (of time or of arc) or minutes. */
export type SexagesimalUnit = 'seconds' | 'minutes';

function pad2(n: number): string {
  return String(n).padStart(2, '0');
}

/** `units` (whole units of 10^-decimals of the last part) as 'aa bb cc.ddd' or 'aa bb.ddd'. */
function threeParts(units: number, unit: SexagesimalUnit, decimals: number): string {
  const scale = 10 ** decimals;
  const lastPerMinute = unit === 'seconds' ? 60 * scale : scale; // units in one minute
  const perFirst = 60 * lastPerMinute; // units in one hour or degree
  const first = Math.floor(units / perFirst);
  let rest = units - first * perFirst;
  const minutes = Math.floor(rest / lastPerMinute);
  rest -= minutes * lastPerMinute;
  const frac = (n: number): string => (decimals > 0 ? '.' + String(n).padStart(decimals, '0') : '');
  if (unit === 'minutes') return `${pad2(first)} ${pad2(minutes)}${frac(rest)}`;
  const seconds = Math.floor(rest / scale);
  return `${pad2(first)} ${pad2(minutes)} ${pad2(seconds)}${frac(rest - seconds * scale)}`;
}

function checkDecimals(decimals: number, what: string): void {
  if (!Number.isInteger(decimals) || decimals < 0 || decimals > 9) throw new RangeError(`${what}: decimals ${decimals} not an integer 0..9`);
}

/** RA in hours [0, 24) as 'hh mm ss.sss' (unit 'seconds') or 'hh mm.mmm'; 24h wraps to 00. */
export function formatRightAscension(hours: number, decimals: number, unit: SexagesimalUnit = 'seconds'): string {
  checkDecimals(decimals, 'formatRightAscension');
  if (!Number.isFinite(hours)) throw new RangeError(`formatRightAscension: non-finite RA ${hours} h`);
  const perHour = (unit === 'seconds' ? 3600 : 60) * 10 ** decimals;
  const day = 24 * perHour;
  const units = ((Math.round(hours * perHour) % day) + day) % day;
  return threeParts(units, unit, decimals);
}

/** Dec in degrees [−90, 90] as 'sdd mm ss.ss' (unit 'seconds') or 'sdd mm.mm'; a zero that rounds from below is written '+'. */
export function formatDeclination(degrees: number, decimals: number, unit: SexagesimalUnit = 'seconds'): string {
  checkDecimals(decimals, 'formatDeclination');
  if (!Number.isFinite(degrees) || Math.abs(degrees) > 90) throw new RangeError(`formatDeclination: declination ${degrees}° not in [−90, 90]`);
  const perDegree = (unit === 'seconds' ? 3600 : 60) * 10 ** decimals;
  const units = Math.round(Math.abs(degrees) * perDegree);
  const sign = degrees < 0 && units > 0 ? '-' : '+';
  return sign + threeParts(units, unit, decimals);
}
