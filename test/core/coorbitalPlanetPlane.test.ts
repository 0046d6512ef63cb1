import { describe, expect, it } from 'vitest';
import { DEG_PER_RAD, RAD_PER_DEG } from '../../src/core/constants.js';
import { meanLongitudeFromElementsRad, orbitNormal, phiFromLongitudesRad, planetOrbitAtEpoch, shapeRelativeToPlane } from '../../src/core/coorbital/planetPlane.js';
import { Vsop87Ephemeris } from '../../src/core/ephemeris/vsop87Ephemeris.js';

const J2000 = 2_451_545.0;

describe('a body seen from a planet\'s orbital plane', () => {
  const eph = new Vsop87Ephemeris();
  const state = new Float64Array(6);

  it("Jupiter's osculating orbit from the VSOP87B state matches the published mean elements at J2000", () => {
    eph.helioState('jupiter', J2000, state);
    const j = planetOrbitAtEpoch('jupiter', state);
    // Standish & Williams, "Keplerian elements for approximate positions of the major planets"
    // (JPL), Table 1 at J2000: a = 5.20288700 au, i = 1.30439695°, L = 34.39644051°.
    // Osculating and mean elements differ by Jupiter's short-period terms (Saturn's pull).
    // Measured: a 0.0014 au, L 0.020°, i 0.00022° off; bounds about 10× those.
    expect(Math.abs(j.aAu - 5.202887)).toBeLessThan(0.015);
    expect(Math.abs(j.meanLongitudeRad * DEG_PER_RAD - 34.39644051)).toBeLessThan(0.2);
    const iDeg = Math.acos(j.normal[2]) * DEG_PER_RAD;
    expect(Math.abs(iDeg - 1.30439695)).toBeLessThan(0.002);
    // A body in the ecliptic is inclined to Jupiter's plane by Jupiter's own inclination.
    const shape = shapeRelativeToPlane(0.1, 0, 0, 1, j.normal);
    expect(Math.abs(shape.iRad * DEG_PER_RAD - iDeg)).toBeLessThan(1e-9);
  });

  it('a body in the planet\'s own plane has i = 0 there; the ecliptic as the plane changes nothing', () => {
    const iRad = 12 * RAD_PER_DEG, nodeRad = 80 * RAD_PER_DEG, periRad = 73 * RAD_PER_DEG;
    expect(shapeRelativeToPlane(0.2, iRad, nodeRad, periRad, orbitNormal(iRad, nodeRad)).iRad).toBeLessThan(1e-7);
    const same = shapeRelativeToPlane(0.2, iRad, nodeRad, periRad, [0, 0, 1]);
    expect(same.iRad).toBeCloseTo(iRad, 12);
    expect(same.periRad).toBeCloseTo(periRad, 12); // node on the ecliptic is the ecliptic node
    expect(same.e).toBe(0.2);
  });

  it('ω relative to a tilted plane: a polar orbit crossing it along its perihelion line has ω = 0 (common practice geometry)', () => {
    // Plane tilted 30° about x; body polar (i = 90°) with node Ω = 0 and ω = 0: perihelion on
    // +x, which lies in both planes, so the node on the tilted plane is +x and ω there is 0.
    const tilt = 30 * RAD_PER_DEG;
    const planeNormal = [0, -Math.sin(tilt), Math.cos(tilt)];
    const s = shapeRelativeToPlane(0.3, 90 * RAD_PER_DEG, 0, 0, planeNormal);
    expect(s.iRad * DEG_PER_RAD).toBeCloseTo(60, 9);
    expect(Math.min(s.periRad, 2 * Math.PI - s.periRad)).toBeLessThan(1e-12);
  });

  it('mean longitude and resonant angle wrap as stated', () => {
    expect(meanLongitudeFromElementsRad(3, 3, 3)).toBeCloseTo(9 - 2 * Math.PI, 14);
    expect(phiFromLongitudesRad(0.1, 2 * Math.PI - 0.1)).toBeCloseTo(0.2, 14);
    expect(phiFromLongitudesRad(Math.PI, 0)).toBe(Math.PI); // (−π, π]: +π, not −π
    expect(phiFromLongitudesRad(0, Math.PI)).toBe(Math.PI);
  });
});
