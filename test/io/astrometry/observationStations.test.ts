/**
 * Observations joined to the observatory-code table: the real sample of (12893) against the
 * real table (both in test/fixtures/astrometry, README there), and invented records.
 */
import { mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { fileURLToPath } from 'node:url';
import { afterAll, describe, expect, it } from 'vitest';
import { builtinObservatoryTable, checkStations, readAstrometryFile, readObservatoryCodes } from '../../../src/io/index.js';

const FIXTURES = new URL('../../fixtures/astrometry/', import.meta.url);
const SAMPLE = fileURLToPath(new URL('astrometry-80col-sample.txt', FIXTURES));
const TABLE = fileURLToPath(new URL('observatory-codes.txt', FIXTURES));

describe('checkStations', () => {
  const dir = mkdtempSync(join(tmpdir(), 'wayward-stations-'));
  afterAll(() => rmSync(dir, { recursive: true, force: true }));

  it('places every observation of the real sample with the real table (20 stations, C51 space-based with its position)', async () => {
    const read = await readAstrometryFile(SAMPLE);
    const check = checkStations(read.observations, await readObservatoryCodes(TABLE));
    expect(check.placed.length).toBe(143);
    expect(check.rejected).toEqual([]);
    // cut -c78-80 | sort -u: 20 codes
    expect(new Set(read.observations.map((o) => o.station)).size).toBe(20);
  });

  it('without a table only the geocentre is known: each ground-based observation is rejected naming its station', async () => {
    const read = await readAstrometryFile(SAMPLE);
    const check = checkStations(read.observations, builtinObservatoryTable());
    expect(check.placed.map((o) => o.line)).toEqual([79, 81, 83, 85]); // the space-based pairs carry their position
    expect(check.rejected.length).toBe(139);
    expect(check.rejected[0].message).toBe(`${SAMPLE}:1: observatory code 413 is not in the built-in table (500 only; give an observatory-code table)`);
    expect(check.unknownStations.length).toBe(19);
  });

  it('rejects a ground-based record at a code without a fixed site; keeps a roving one with its site', async () => {
    const path = join(dir, 'mixed.psv');
    writeFileSync(path, [
      'permID|obsTime|ra|dec|stn|sys|ctr|pos1|pos2|pos3',
      '433|2020-01-01T12:00:00Z|10.25|-5.5|C51|||||',
      '433|2020-01-01T13:00:00Z|10.25|-5.5|247|WGS84||10.5|50.25|100',
      '433|2020-01-01T14:00:00Z|10.25|-5.5|500|||||',
    ].join('\n'));
    const read = await readAstrometryFile(path);
    const check = checkStations(read.observations, await readObservatoryCodes(TABLE));
    expect(check.placed.map((o) => o.line)).toEqual([3, 4]);
    expect(check.rejected.map((e) => e.message)).toEqual([`${path}:2: observatory code C51 (WISE) has no fixed site and the record gives no observer position`]);
  });
});
