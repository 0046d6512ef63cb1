/**
 * The observatory-code table (test/fixtures/astrometry/observatory-codes.txt: 2 662 codes,
 * the openly published list; README there) read by column, spot values hand-read from its
 * lines, and bad lines of files written here (invented).
 */
import { mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { fileURLToPath } from 'node:url';
import { afterAll, describe, expect, it } from 'vitest';
import { builtinObservatoryTable, GEOCENTRE_SITE, readObservatoryCodes } from '../../../src/io/index.js';

const TABLE = fileURLToPath(new URL('../../fixtures/astrometry/observatory-codes.txt', import.meta.url));

describe('observatory-code table', async () => {
  const t = await readObservatoryCodes(TABLE);
  const site = (code: string) => t.sites.get(code)!;

  it('loads every code: 2 663 lines = 1 heading + 2 662 codes, none rejected, none twice', () => {
    expect(t.skipped).toBe(1);
    expect(t.linesRead).toBe(2662);
    expect(t.loaded).toBe(2662);
    expect(t.rejected).toEqual([]);
    expect(t.duplicates).toEqual([]);
    expect(t.sites.size).toBe(2662); // 500 is in the file too
    // 24 lines leave columns 4–30 blank (awk 'NR>1 && substr($0,4,27) ~ /^ *$/')
    expect([...t.sites.values()].filter((s) => !s.fixedSite).length).toBe(24);
  });

  it('spaced lines: 000 Greenwich and the lower-precision 002 Rayleigh', () => {
    // '000   0.0000 0.62411 +0.77873 Greenwich'
    expect(site('000')).toEqual({ code: '000', longitudeDegE: 0, rhoCosPhiPrime: 0.62411, rhoSinPhiPrime: 0.77873, name: 'Greenwich', fixedSite: true });
    // '002   0.62   0.622   +0.781   Rayleigh'
    expect([site('002').longitudeDegE, site('002').rhoCosPhiPrime, site('002').rhoSinPhiPrime, site('002').name]).toEqual([0.62, 0.622, 0.781, 'Rayleigh']);
  });

  it('run-together lines are read by column', () => {
    // '413 149.066080.855595-0.516262Siding Spring Observatory'
    expect(site('413')).toEqual({ code: '413', longitudeDegE: 149.06608, rhoCosPhiPrime: 0.855595, rhoSinPhiPrime: -0.516262, name: 'Siding Spring Observatory', fixedSite: true });
    // '703 249.267360.845311+0.533211Catalina Sky Survey'
    expect([site('703').longitudeDegE, site('703').rhoCosPhiPrime, site('703').rhoSinPhiPrime]).toEqual([249.26736, 0.845311, 0.533211]);
    // 'Z99 359.978740.595468+0.800687Clixby Observatory, Cleethorpes'
    expect([site('Z99').longitudeDegE, site('Z99').rhoCosPhiPrime, site('Z99').name]).toEqual([359.97874, 0.595468, 'Clixby Observatory, Cleethorpes']);
  });

  it('space-based and roving codes have no fixed site', () => {
    for (const [code, name] of [['C51', 'WISE'], ['250', 'Hubble Space Telescope'], ['247', 'Roving Observer']]) {
      const s = site(code);
      expect([s.name, s.fixedSite]).toEqual([name, false]);
      expect(Number.isNaN(s.longitudeDegE) && Number.isNaN(s.rhoCosPhiPrime) && Number.isNaN(s.rhoSinPhiPrime)).toBe(true);
    }
  });

  it('500 as the file gives it equals the built-in geocentre', () => {
    expect(site('500')).toEqual({ ...GEOCENTRE_SITE });
  });
});

describe('observatory codes without a table, and bad lines (invented)', () => {
  const dir = mkdtempSync(join(tmpdir(), 'wayward-obscodes-'));
  afterAll(() => rmSync(dir, { recursive: true, force: true }));

  it('the geocentre 500 is built in', () => {
    const t = builtinObservatoryTable();
    expect([...t.sites.keys()]).toEqual(['500']);
    expect(t.sites.get('500')).toMatchObject({ longitudeDegE: 0, rhoCosPhiPrime: 0, rhoSinPhiPrime: 0, fixedSite: true });
  });

  it('rejects a line with some position columns blank, a bad number and a bad code; the read goes on', async () => {
    const path = join(dir, 'codes.txt');
    writeFileSync(path, [
      'Code  Long.   cos      sin    Name',
      'X01  10.0000 0.62411          Half a site',
      'X02  1x.0000 0.62411 +0.77873 Bad longitude',
      'x3   10.0000 0.62411 +0.77873 Lower-case code',
      'X04 400.0000 0.62411 +0.77873 Longitude past 360',
      'X05  10.0000 0.62411 +0.77873 Good',
      'X05  11.0000 0.62411 +0.77873 Good again',
      '',
    ].join('\n'));
    const t = await readObservatoryCodes(path);
    expect(t.rejected.map((e) => e.message)).toEqual([
      `${path}:2:22: station X01 gives some position columns and leaves others blank (columns 4–30)`,
      `${path}:3:4: longitude is not a number: '1x.0000' (columns 4–13)`,
      `${path}:4:1: observatory code is not three letters or digits: 'x3 ' (columns 1–3)`,
      `${path}:5:4: longitude 400 is not in [0, 360) degrees east (columns 4–13)`,
    ]);
    expect([t.linesRead, t.loaded, t.skipped]).toEqual([6, 2, 1]); // the heading; the final newline ends line 7, no blank line follows
    expect(t.duplicates).toEqual(['X05']);
    expect(t.sites.get('X05')!.longitudeDegE).toBe(11);
    expect(t.sites.has('500')).toBe(true);
  });
});
