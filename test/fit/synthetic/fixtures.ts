/**
 * Shared requests of the synthetic-astrometry tests (invented bodies, real station sites from
 * the observatory-code table in test/fixtures/astrometry/). Not a test file itself.
 */
import { calendarToJd } from '../../../src/core/time/julian.js';
import { jdTTToTDB } from '../../../src/fit/observerPosition.js';
import type { SyntheticRequest, SyntheticStation } from '../../../src/fit/synthetic/types.js';
import { parseObservatoryCodeLine } from '../../../src/io/astrometry/observatoryCodes.js';
import type { ObservatorySite } from '../../../src/io/astrometry/types.js';

const DEG = Math.PI / 180;

/** Sites as lines of the published observatory-code table (test/fixtures/astrometry/observatory-codes.txt). */
export function site(line: string): ObservatorySite {
  const s = parseObservatoryCodeLine(line, 'fixture', 0);
  if (s === 'skip') throw new Error(line);
  return s;
}

export const F51 = site('F51 203.744090.936241+0.351543Pan-STARRS 1, Haleakala');
export const W84 = site('W84 289.193580.865572-0.499793Cerro Tololo-DECam');
export const I41 = site('I41 243.140220.836322+0.546875Palomar Mountain--ZTF');

export function station(s: ObservatorySite, sigmaArcsec: number): SyntheticStation {
  return { site: s, sigmaArcsec, note2: 'C', fromJdUtc: -Infinity, toJdUtc: Infinity };
}

/** An invented main-belt body observed over `years` from 2030 Jan 1, epoch 2030 Jul 1.0 (TT → TDB). */
export function mainBeltRequest(over: Partial<SyntheticRequest> = {}, years = 2): SyntheticRequest {
  const start = calendarToJd(2030, 1, 1);
  return {
    truth: {
      elements: { form: 'semimajor', aAu: 2.6, e: 0.12, iRad: 8 * DEG, nodeRad: 80 * DEG, periRad: 130 * DEG, meanAnomalyRad: 30 * DEG, epochJdTDB: jdTTToTDB(calendarToJd(2030, 7, 1)) },
      nonGravAuPerDay2: null, nonGravLaw: 'inverse-square', areaToMassM2PerKg: 0, radiationPressureCoefficient: 1, relativity: true,
    },
    stations: [station(F51, 0.2), station(W84, 0.5), station(I41, 0.8)],
    startJdUtc: start, endJdUtc: start + 365.25 * years, count: 200, seed: 7, outlierRate: 0.05, outlierArcsec: [3, 20],
    ...over,
  };
}
