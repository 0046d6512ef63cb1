/**
 * A body's orbit seen from a planet's orbit, for the co-orbital problem: the planet's
 * osculating semimajor axis and mean longitude at an epoch (from its ephemeris state), and
 * the body's inclination and argument of perihelion measured from the planet's orbital
 * plane (the averaged problem puts the planet in its reference plane: types.ts
 * AveragedOrbitShape).
 *
 * Geometry (common practice): with W = (sin i sin Ω, −sin i cos Ω, cos i) the orbit normal
 * and P = the unit vector to perihelion (Murray & Dermott 1999, eq. 2.122 for the rotation
 * from orbital to reference frame), the inclination to the planet's plane is the angle
 * between the normals, the ascending node on that plane lies along N = W_P × W, and the
 * argument of perihelion is the angle from N to P measured in the body's plane.
 */
import type { PlanetName } from '../constants.js';
import { acosClamped, wrapPi, wrapTwoPi } from '../math.js';
import { stateToSemimajorElements } from '../orbit/stateToElements.js';
import { planetKeplerGmAu3PerDay2 } from './resonantAngle.js';
import type { AveragedOrbitShape } from './types.js';

/** The planet's osculating orbit at one epoch, as the co-orbital screen needs it. */
export interface PlanetOrbitAtEpoch {
  aAu: number; // osculating semimajor axis (GM_sun + GM_planet: its heliocentric Kepler constant)
  meanLongitudeRad: number; // λ_P = Ω + ω + M, J2000 ecliptic, in [0, 2π)
  normal: [number, number, number]; // unit normal of the planet's orbital plane (ecliptic frame)
}

const EL = new Float64Array(6);

/** Mean longitude Ω + ω + M in [0, 2π) (Murray & Dermott 1999, eq. 2.86; common practice). */
export function meanLongitudeFromElementsRad(nodeRad: number, periRad: number, meanAnomalyRad: number): number {
  return wrapTwoPi(nodeRad + periRad + meanAnomalyRad);
}

/** Unit normal of an orbit of inclination i and node Ω (J2000 ecliptic frame). */
export function orbitNormal(iRad: number, nodeRad: number): [number, number, number] {
  const si = Math.sin(iRad);
  return [si * Math.sin(nodeRad), -si * Math.cos(nodeRad), Math.cos(iRad)];
}

/** The planet's orbit at the epoch of `state` (heliocentric J2000 ecliptic, au, au/day). */
export function planetOrbitAtEpoch(planet: PlanetName, state: Float64Array): PlanetOrbitAtEpoch {
  stateToSemimajorElements(state, planetKeplerGmAu3PerDay2(planet), EL);
  return { aAu: EL[0], meanLongitudeRad: meanLongitudeFromElementsRad(EL[3], EL[4], EL[5]), normal: orbitNormal(EL[2], EL[3]) };
}

/** Unit vector to perihelion of an orbit (i, Ω, ω) in the ecliptic frame (M&D eq. 2.122, first column). */
function perihelionDirection(iRad: number, nodeRad: number, periRad: number): [number, number, number] {
  const cO = Math.cos(nodeRad), sO = Math.sin(nodeRad), cw = Math.cos(periRad), sw = Math.sin(periRad), ci = Math.cos(iRad);
  return [cO * cw - sO * sw * ci, sO * cw + cO * sw * ci, sw * Math.sin(iRad)];
}

function cross(a: readonly number[], b: readonly number[]): [number, number, number] {
  return [a[1] * b[2] - a[2] * b[1], a[2] * b[0] - a[0] * b[2], a[0] * b[1] - a[1] * b[0]];
}

function dot(a: readonly number[], b: readonly number[]): number {
  return a[0] * b[0] + a[1] * b[1] + a[2] * b[2];
}

/**
 * The body's e, inclination and argument of perihelion relative to the plane with unit
 * normal `planeNormal`. A body in that plane has no node there: ω is then measured from the
 * plane's ascending node on the ecliptic (or from the x axis when the plane is the
 * ecliptic); the averaged problem does not depend on that choice when i = 0.
 */
export function shapeRelativeToPlane(
  e: number, iRad: number, nodeRad: number, periRad: number, planeNormal: readonly number[],
): AveragedOrbitShape {
  const w = orbitNormal(iRad, nodeRad);
  const p = perihelionDirection(iRad, nodeRad, periRad);
  const iRel = acosClamped(dot(w, planeNormal));
  let node = cross(planeNormal, w);
  let len = Math.hypot(node[0], node[1], node[2]);
  if (len < 1e-12) {
    // coplanar: measure from the plane's ecliptic node, or from x when it is the ecliptic
    node = cross([0, 0, 1], planeNormal);
    len = Math.hypot(node[0], node[1], node[2]);
    if (len < 1e-12) {
      node = [1, 0, 0];
      len = 1;
    }
  }
  const n: [number, number, number] = [node[0] / len, node[1] / len, node[2] / len];
  // angle from n to p about w: atan2((n × p)·w, n·p)
  const periRel = wrapTwoPi(Math.atan2(dot(cross(n, p), w), dot(n, p)));
  return { e, iRad: iRel, periRad: periRel };
}

/** φ = λ − λ_P wrapped to (−π, π] (types.ts). */
export function phiFromLongitudesRad(bodyMeanLongitudeRad: number, planetMeanLongitudeRad: number): number {
  return -wrapPi(planetMeanLongitudeRad - bodyMeanLongitudeRad);
}
