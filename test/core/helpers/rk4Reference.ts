/**
 * An independent reference integration for tests, written without the project's force model
 * or integrator: the heliocentric equation of motion of a massless body under the Sun and
 * point-mass planets,
 *   r̈ = −μ r/r³ + Σ_j μ_j [ (r_j − r)/|r_j − r|³ − r_j/r_j³ ]
 * (direct and indirect terms of each planet; Murray & Dermott 1999, Solar System Dynamics,
 * §6.2 — section from memory), integrated by the classical fourth-order Runge–Kutta method
 * with a fixed step (common practice). Planet positions come from any Ephemeris, so a test
 * can give both sides the same planets and compare only the dynamics. Tests halve the step
 * to show the reference has converged far below what they assert.
 */
import { planetGmAu3PerDay2, type PlanetName } from '../../../src/core/constants.js';
import type { Ephemeris, EphemerisBody } from '../../../src/core/types.js';

export interface Rk4Problem {
  muSun: number; // au³/day²
  planets: readonly PlanetName[]; // 'earth' is read as the Earth–Moon barycentre ('emb')
  ephemeris: Ephemeris | null;
  epochJd: number; // TDB
  state: Float64Array; // x, y, z (au), vx, vy, vz (au/day) at epochJd
}

/** State at `targetJd` by RK4 with about `stepDays` per step (the span is cut in equal steps). */
export function rk4Propagate(p: Rk4Problem, targetJd: number, stepDays: number): Float64Array {
  const bodies: EphemerisBody[] = p.planets.map((q) => (q === 'earth' ? 'emb' : q));
  const gm = p.planets.map((q) => planetGmAu3PerDay2(q));
  const ps = new Float64Array(6);
  const deriv = (t: number, y: Float64Array, out: Float64Array): void => {
    const r = Math.hypot(y[0], y[1], y[2]);
    const c = -p.muSun / (r * r * r);
    for (let i = 0; i < 3; i++) {
      out[i] = y[3 + i];
      out[3 + i] = c * y[i];
    }
    for (let j = 0; j < bodies.length; j++) {
      p.ephemeris!.helioState(bodies[j], t, ps, 0);
      const dx = ps[0] - y[0], dy = ps[1] - y[1], dz = ps[2] - y[2];
      const d3 = Math.hypot(dx, dy, dz) ** 3;
      const rj3 = Math.hypot(ps[0], ps[1], ps[2]) ** 3;
      out[3] += gm[j] * (dx / d3 - ps[0] / rj3);
      out[4] += gm[j] * (dy / d3 - ps[1] / rj3);
      out[5] += gm[j] * (dz / d3 - ps[2] / rj3);
    }
  };
  const n = Math.max(1, Math.round(Math.abs(targetJd - p.epochJd) / stepDays));
  const h = (targetJd - p.epochJd) / n;
  const y = Float64Array.from(p.state);
  const k1 = new Float64Array(6), k2 = new Float64Array(6), k3 = new Float64Array(6), k4 = new Float64Array(6);
  const tmp = new Float64Array(6);
  for (let s = 0; s < n; s++) {
    const t = p.epochJd + s * h;
    deriv(t, y, k1);
    for (let i = 0; i < 6; i++) tmp[i] = y[i] + (h / 2) * k1[i];
    deriv(t + h / 2, tmp, k2);
    for (let i = 0; i < 6; i++) tmp[i] = y[i] + (h / 2) * k2[i];
    deriv(t + h / 2, tmp, k3);
    for (let i = 0; i < 6; i++) tmp[i] = y[i] + h * k3[i];
    deriv(t + h, tmp, k4);
    for (let i = 0; i < 6; i++) y[i] += (h / 6) * (k1[i] + 2 * k2[i] + 2 * k3[i] + k4[i]);
  }
  return y;
}
