// Observations as the readers give them → the observer the model places: fixed site from the
// real observatory-code table, the roving and space-based positions the records carry
// (test/fixtures/astrometry/README.md says where the files come from).
import { describe, expect, it } from 'vitest';
import { readAstrometryFile } from '../../src/io/astrometry/readAstrometryFile.js';
import { readObservatoryCodes } from '../../src/io/astrometry/observatoryCodes.js';
import { checkStations } from '../../src/io/astrometry/observationStations.js';
import { observerPlaceOf } from '../../src/fit/observerPlace.js';

const dir = new URL('../fixtures/astrometry/', import.meta.url).pathname;

describe('observerPlaceOf', () => {
  it('places fixed, roving and space-based observers as their records and the table give them', async () => {
    const table = await readObservatoryCodes(`${dir}observatory-codes.txt`);
    const read = await readAstrometryFile(`${dir}obs80-invented.txt`);
    const { placed } = checkStations(read.observations, table);
    const fixed = placed.find((o) => o.kind === 'optical' && o.station === 'G96')!;
    // The table's line for G96: 249.21128 0.845107 +0.533611 (Mt. Lemmon Survey).
    expect(observerPlaceOf(fixed, table.sites)).toEqual({ kind: 'site', longitudeDegE: 249.21128, rhoCosPhiPrime: 0.845107, rhoSinPhiPrime: 0.533611 });
    const roving = placed.find((o) => o.kind === 'roving')!;
    const r = observerPlaceOf(roving, table.sites);
    expect(r.kind).toBe('geodetic');
    if (r.kind === 'geodetic') expect(r.latitudeDeg).toBe(roving.rovingSite!.latitudeDeg);
    const space = placed.find((o) => o.kind === 'space')!;
    expect(observerPlaceOf(space, table.sites)).toEqual({ kind: 'space', geocentricKm: space.observerGeocentricKm });
  });

  it('refuses a station without a fixed site (caller skipped checkStations)', async () => {
    const table = await readObservatoryCodes(`${dir}observatory-codes.txt`);
    const read = await readAstrometryFile(`${dir}obs80-invented.txt`);
    const o = { ...read.observations.find((x) => x.kind === 'optical')!, station: 'ZZZ' };
    expect(() => observerPlaceOf(o, table.sites)).toThrow(/station ZZZ .* has no fixed site/);
  });
});
