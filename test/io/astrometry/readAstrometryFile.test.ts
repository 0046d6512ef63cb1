/**
 * One entry point for both astrometry formats: detection from content, forcing a format,
 * gzip input, counts; and the sexagesimal fields of the 80-column record. Lines are
 * invented unless a source is named.
 */
import { mkdtempSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { fileURLToPath } from 'node:url';
import { gzipSync } from 'node:zlib';
import { afterAll, describe, expect, it } from 'vitest';
import { detectAstrometryFormat, parseDeclination, parseRightAscension, readAstrometryFile } from '../../../src/io/index.js';

const SAMPLE = fileURLToPath(new URL('../../fixtures/astrometry/astrometry-80col-sample.txt', import.meta.url));

describe('readAstrometryFile', () => {
  const dir = mkdtempSync(join(tmpdir(), 'wayward-astrometry-'));
  afterAll(() => rmSync(dir, { recursive: true, force: true }));

  it('detects the format from the first line that is not blank', () => {
    expect(detectAstrometryFormat('# version=2017')).toBe('ades-psv');
    expect(detectAstrometryFormat('permID|obsTime|ra|dec|stn')).toBe('ades-psv');
    expect(detectAstrometryFormat('12893         C2000 01 05.40026 09 36 12.46 +11 27 19.3          18.7  aa9750704')).toBe('obs80');
  });

  it('reads the real sample gzip-compressed, after two blank lines, with the same observations', async () => {
    const plain = await readAstrometryFile(SAMPLE);
    const path = join(dir, 'sample.txt.gz');
    writeFileSync(path, gzipSync(Buffer.concat([Buffer.from('\n\n'), readFileSync(SAMPLE)])));
    const gz = await readAstrometryFile(path);
    expect([gz.format, gz.lines, gz.skipped, gz.linesRead, gz.observations.length]).toEqual(['obs80', 149, 2, 147, 143]);
    expect(gz.observations.map((o) => [o.line - 2, o.raRad, o.decRad, o.timeJdTT])).toEqual(plain.observations.map((o) => [o.line, o.raRad, o.decRad, o.timeJdTT]));
  });

  it('a forced format is not second-guessed: ADES text read as 80-column records is rejected line by line', async () => {
    const path = join(dir, 'ades.psv');
    writeFileSync(path, 'permID|obsTime|ra|dec|stn\n433|2020-01-01T12:00:00Z|10.25|-5.5|500\n');
    const read = await readAstrometryFile(path, { format: 'obs80' });
    expect(read.format).toBe('obs80');
    expect(read.rejected.map((e) => e.line)).toEqual([1, 2]);
    expect(read.rejected[0].reason).toBe('line ends at column 25; an 80-column record has exactly 80');
  });

  it('an empty file reads as no observations', async () => {
    const path = join(dir, 'empty.txt');
    writeFileSync(path, '');
    const read = await readAstrometryFile(path);
    expect([read.format, read.lines, read.linesRead, read.observations.length, read.designations.mixed]).toEqual(['obs80', 0, 0, 0, false]);
  });
});

describe('sexagesimal fields of the 80-column record', () => {
  it('keeps the decimals as written and the resolution they mean', () => {
    expect(parseRightAscension('23 59 59.999')).toEqual({ value: 23 + 59 / 60 + 59.999 / 3600, decimals: 3, resolutionArcsec: 0.015 });
    expect(parseRightAscension('12 00 00')).toEqual({ value: 12, decimals: 0, resolutionArcsec: 15 });
    expect(parseDeclination('+90 00 00.0')).toEqual({ value: 90, decimals: 1, resolutionArcsec: 0.1 });
    expect(parseDeclination('-00 30 00.00')).toEqual({ value: -0.5, decimals: 2, resolutionArcsec: 0.01 });
    expect(parseDeclination('-00 30.25')).toEqual({ value: -(30.25 / 60), decimals: 2, resolutionArcsec: 0.6 });
  });

  it('refuses what is out of range or in no form', () => {
    expect(parseRightAscension('12 60 00.0')).toBe("right ascension out of range: '12 60 00.0'");
    expect(parseRightAscension('12h00m00s')).toBe("right ascension is not 'hh mm ss.sss': '12h00m00s'");
    expect(parseDeclination('+90 00 00.1')).toBe("declination out of range: '+90 00 00.1'");
    expect(parseDeclination('+10 00 60.0')).toBe("declination out of range: '+10 00 60.0'");
  });
});
