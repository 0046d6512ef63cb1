// Tisserand parameter against Murray & Dermott 1999 eq. 3.49 (the a-form) and T_J values
// published for real bodies, each source named at its check (or marked "from memory").
// The real elements of P/2013 R3 are read from the stored comet export sample
// (test/fixtures/comet-export/, provenance there) with the project's line parser.
import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { tisserandParameter } from '../../src/core/orbit/tisserand.js';
import { PLANET_MEAN_A_AU, RAD_PER_DEG } from '../../src/core/constants.js';
import { emptyOrbitRow, parseCometExportLine } from '../../src/io/index.js';
import { readFixtureText } from '../io/fixtureCases.js';

const aJ = PLANET_MEAN_A_AU.jupiter;
const COMETS = new URL('../fixtures/comet-export/comets-export-sample.txt.gz', import.meta.url);

/** Elements of one body of the real comet export sample, read by the project's parser. */
function cometSampleElements(designation: string): { qAu: number; e: number; iDeg: number } {
  const lines = readFixtureText(COMETS).split('\n');
  for (let k = 0; k < lines.length; k++) {
    const row = emptyOrbitRow();
    if (lines[k].trim() === '' || parseCometExportLine(lines[k], row, 'sample', k + 1) !== 'row') continue;
    if (row.designation === designation) return { qAu: row.qAu, e: row.e, iDeg: row.iDeg };
  }
  throw new Error(`${designation} not in the comet export sample`);
}

/** Textbook a-form, Murray & Dermott 1999 eq. 3.49, for comparison with the q-form. */
function tisserandAForm(aP: number, a: number, e: number, iRad: number): number {
  return aP / a + 2 * Math.cos(iRad) * Math.sqrt((a / aP) * (1 - e * e));
}

describe('Tisserand parameter w.r.t. Jupiter', () => {
  it('P/2013 R3 and its fragments A and B from the real comet export sample: T_J = 3.184 as published', () => {
    // Source of the value: the encyclopedia article "P/2013 R3 (Catalina–PanSTARRS)"
    // (en.wikipedia.org/wiki/P/2013_R3_(Catalina%E2%80%93PanSTARRS)), whose infobox states
    // TJupiter 3.184 with osculating elements of epoch 2013-10-13 (JD 2456578.5):
    // a 3.033 au, e 0.2734, i 0.899°. Our elements are the sample's own, epoch 2026-06-23.
    const published = 3.184;
    const fromPage = tisserandParameter(aJ, 3.033 * (1 - 0.2734), 0.2734, 0.899 * RAD_PER_DEG);
    const worst = ['P/2013 R3', 'P/2013 R3-A', 'P/2013 R3-B'].map((d) => {
      const el = cometSampleElements(d);
      return Math.abs(tisserandParameter(aJ, el.qAu, el.e, el.iDeg * RAD_PER_DEG) - published);
    }).reduce((m, x) => Math.max(m, x), 0);
    console.log(`P/2013 R3 (+A, B), sample elements of 2026 vs published 3.184: worst ${worst.toFixed(4)}; `
      + `the page's own 2013 elements give ${fromPage.toFixed(4)}`);
    // The page's rounded elements reproduce its printed value (±0.0005 of its last digit).
    expect(Math.abs(fromPage - published)).toBeLessThan(0.0006);
    // T_J changes slowly (it approximates the Jacobi constant of the Sun–Jupiter problem):
    // computed from the 2013 and 2026 elements it moves by 0.0009 (measured); allowed: that
    // change twice over plus the half unit of the printed value.
    expect(worst).toBeLessThan(0.0025);
  });

  it('2P/Encke: T_J = 3.026 as published with its elements', () => {
    // Source: the encyclopedia article "Comet Encke" as copied at piglix.com/piglix/Comet_Encke:
    // epoch 2006-09-22 (JD 2454000.5), a 2.2178 au, e 0.8471, i 11.76°, TJupiter 3.026.
    const a = 2.2178, e = 0.8471;
    const t = tisserandParameter(aJ, a * (1 - e), e, 11.76 * RAD_PER_DEG);
    console.log(`2P/Encke from the published elements: ${t.toFixed(4)} (published 3.026)`);
    // Measured 0.0007. Allowed 0.002: the printed value's half unit (0.0005), the rounding of
    // the printed e (1e-4 moves T by 2e-4), and Jupiter's a, which the source does not state
    // (ours is the mean 5.2029 au; 0.002 au moves T by 8e-4).
    expect(Math.abs(t - 3.026)).toBeLessThan(0.002);
  });

  it('67P/Churyumov–Gerasimenko: T_J ≈ 2.744 from its osculating elements', () => {
    // Elements: the JPL Horizons API's text output for DES=67P (solution JPL#K213/6), osculating
    // at 2015-10-10 TDB: EC 0.6409081306555051, QR 1.243265641416762 au, IN 7.040294906760007°.
    // T_J 2.744: as quoted in /work/shared/data/README.md among "published check values",
    // which does not name its original source.
    const t = tisserandParameter(aJ, 1.243265641416762, 0.6409081306555051, 7.040294906760007 * RAD_PER_DEG);
    console.log(`67P from Horizons elements of 2015: ${t.toFixed(4)} (quoted 2.744)`);
    // Measured 0.0017. Allowed 0.003: the quoted value's epoch and Jupiter's a are not stated
    // (0.002 au of Jupiter's a moves T by 5e-4; T drifts slowly between element sets).
    expect(Math.abs(t - 2.744)).toBeLessThan(0.003);
  });

  it('(1) Ceres from its real exported elements: T_J ≈ 3.31 (from memory)', () => {
    // a, e, i from the first line of /work/shared/data/orbits-export-sample.txt (real data).
    const a = 2.7655526, e = 0.0796923;
    const t = tisserandParameter(aJ, a * (1 - e), e, 10.58803 * RAD_PER_DEG);
    expect(Math.abs(t - 3.31)).toBeLessThan(0.01);
  });

  it('q-form equals the textbook a-form for every elliptic orbit (Murray & Dermott eq. 3.49)', () => {
    fc.assert(
      fc.property(
        fc.double({ min: 0.1, max: 100, noNaN: true }),
        fc.double({ min: 0, max: 0.999, noNaN: true }),
        fc.double({ min: 0, max: Math.PI, noNaN: true }),
        (a, e, i) => {
          const q = a * (1 - e);
          const diff = Math.abs(tisserandParameter(aJ, q, e, i) - tisserandAForm(aJ, a, e, i));
          return diff < 1e-9 * Math.max(1, aJ / a);
        },
      ),
    );
  });

  it('is continuous through e = 1 (parabolic limit 2 cos i sqrt(2q/aP))', () => {
    const q = 1.3, i = 0.4;
    const limit = 2 * Math.cos(i) * Math.sqrt((2 * q) / aJ);
    expect(tisserandParameter(aJ, q, 1, i)).toBeCloseTo(limit, 12);
    expect(Math.abs(tisserandParameter(aJ, q, 1 - 1e-9, i) - limit)).toBeLessThan(1e-8);
    expect(Math.abs(tisserandParameter(aJ, q, 1 + 1e-9, i) - limit)).toBeLessThan(1e-8);
  });

  it('rejects impossible arguments', () => {
    expect(() => tisserandParameter(aJ, -1, 0.5, 0)).toThrow(RangeError);
    expect(() => tisserandParameter(aJ, 1, Number.NaN, 0)).toThrow(RangeError);
  });
});
