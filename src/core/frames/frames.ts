/**
 * Rotation between the J2000 ecliptic frame (the core's dynamics frame) and the ICRF /
 * J2000 mean equatorial frame: a rotation about the x axis (the equinox) by the J2000
 * obliquity ε0 = 84 381.406″ (IAU 2006, Capitaine et al. 2003; constants.ts).
 *   equatorial = R1(−ε0) · ecliptic:  y_eq = y cos ε0 − z sin ε0,  z_eq = y sin ε0 + z cos ε0
 * The ~23 mas frame bias between the J2000 mean equator and the ICRF is left out
 * (0.11 µrad: about 17 km at 1 au, i.e. 23 mas in direction as seen from the Sun).
 *
 * All functions work in place on caller-owned Float64Array buffers.
 */
import { OBLIQUITY_J2000_RAD } from '../constants.js';

const COS_EPS = Math.cos(OBLIQUITY_J2000_RAD);
const SIN_EPS = Math.sin(OBLIQUITY_J2000_RAD);

/** Rotate the 3-vector at v[offset..offset+2] from J2000 ecliptic to ICRF equatorial, in place. */
export function eclipticToEquatorialInPlace(v: Float64Array, offset = 0): void {
  const y = v[offset + 1];
  const z = v[offset + 2];
  v[offset + 1] = y * COS_EPS - z * SIN_EPS;
  v[offset + 2] = y * SIN_EPS + z * COS_EPS;
}

/** Rotate the 3-vector at v[offset..offset+2] from ICRF equatorial to J2000 ecliptic, in place. */
export function equatorialToEclipticInPlace(v: Float64Array, offset = 0): void {
  const y = v[offset + 1];
  const z = v[offset + 2];
  v[offset + 1] = y * COS_EPS + z * SIN_EPS;
  v[offset + 2] = -y * SIN_EPS + z * COS_EPS;
}

/**
 * Rotate `count` consecutive 6-element states (x, y, z, vx, vy, vz) starting at `offset`
 * from J2000 ecliptic to ICRF equatorial, in place. The rotation is constant, so velocities
 * rotate like positions.
 */
export function eclipticStatesToEquatorialInPlace(states: Float64Array, count = 1, offset = 0): void {
  checkRange(states, count, offset);
  for (let k = 0; k < 2 * count; k++) eclipticToEquatorialInPlace(states, offset + 3 * k);
}

/** Inverse of eclipticStatesToEquatorialInPlace. */
export function equatorialStatesToEclipticInPlace(states: Float64Array, count = 1, offset = 0): void {
  checkRange(states, count, offset);
  for (let k = 0; k < 2 * count; k++) equatorialToEclipticInPlace(states, offset + 3 * k);
}

function checkRange(states: Float64Array, count: number, offset: number): void {
  if (!Number.isInteger(count) || !Number.isInteger(offset) || count < 0 || offset < 0 || offset + 6 * count > states.length) {
    throw new RangeError(`state rotation: ${count} states at offset ${offset} do not fit a buffer of ${states.length}`);
  }
}
