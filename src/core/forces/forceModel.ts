/**
 * The force model for N massless test bodies, as a second-order system for the Gauss–Radau
 * integrator, with optional variational equations.
 *
 * Frame: heliocentric J2000 ecliptic, au, au/day, time JD (TDB). Heliocentric rather than
 * barycentric because the Ephemeris answers heliocentric states directly (no Sun state to
 * compute at every substep), and the Sun-centred forces (relativity, non-gravitational,
 * radiation pressure) need the heliocentric position anyway. The price is the indirect term
 * −Σ μ_j r_j/|r_j|³ (Murray & Dermott 1999, eq. 6.8), computed once per substep for all bodies.
 *
 * Layout of the integrated vector (dim numbers in x and in v):
 *   [0, 3N)        body positions (velocities in v);
 *   [3N, 3N + 30N) with variational equations on: for body k, 10 deviation vectors at
 *                  3N + 3(10k + j): j = 0..5 the columns of the 6×6 state transition matrix
 *                  (initial deviation = unit vector j of (r, v)), j = 6..9 the partials with
 *                  respect to A1, A2, A3 (au/day²) and A/m (m²/kg) (initial deviation 0).
 * Variational equations (common practice, e.g. Milani & Gronchi 2010, Theory of Orbit
 * Determination, sec. 5.1 (section from memory)):
 *   δr'' = (∂a/∂r) δr + (∂a/∂v) δv + ∂a/∂p.
 *
 * Per-body parameters, 4 numbers per body: A1, A2, A3 (au/day²) and A/m (m²/kg).
 */
import type { Ephemeris, EphemerisBody } from '../types.js';
import { C_AU_PER_DAY, GM_SUN_AU3_PER_DAY2, planetGmAu3PerDay2, type PlanetName } from '../constants.js';
import type { SecondOrderSystem } from '../integrate/gaussRadau.js';
import { addPointMassAcceleration } from './gravity.js';
import { addSchwarzschildAcceleration } from './relativity.js';
import { addNonGravAcceleration, NONGRAV_SCRATCH } from './nonGrav.js';
import type { NonGravLaw } from './nonGravLaw.js';
import { addRadiationPressure } from './radiationPressure.js';

/** Distinct times whose planet states are kept (the eight substep times of a step). */
const PLANET_SLOTS = 8;

/** Number of per-body parameters: A1, A2, A3, A/m. */
export const PARAMS_PER_BODY = 4;
/** Deviation vectors per body when variational equations are on: 6 STM columns + 4 params. */
export const VARIATIONS_PER_BODY = 6 + PARAMS_PER_BODY;

export interface ForceModelOptions {
  /** Perturbing planets (Newtonian point masses). Default none. */
  planets?: readonly PlanetName[];
  /** Planet positions; required when `planets` is not empty. */
  ephemeris?: Ephemeris | null;
  /** The Sun's first post-Newtonian term. Default false. */
  relativity?: boolean;
  /** Radial law of the A1, A2, A3 acceleration. Default 'comet-water'. */
  nonGravLaw?: NonGravLaw;
  /** Radiation pressure coefficient C_R (1 = absorber). Default 1. */
  radiationPressureCoefficient?: number;
  /** Integrate the variational equations alongside. Default false. */
  variational?: boolean;
  /** GM of the Sun, au³/day². Default GM_SUN_AU3_PER_DAY2. */
  sunGm?: number;
}

export class TestBodyForceModel implements SecondOrderSystem {
  readonly dim: number;
  readonly errorDim: number;
  readonly nBodies: number;
  readonly variational: boolean;
  readonly planets: readonly PlanetName[];
  private readonly planetBodies: EphemerisBody[];
  private readonly planetGm: Float64Array;
  private readonly eph: Ephemeris | null;
  private readonly relativity: boolean;
  private readonly law: NonGravLaw;
  private readonly cr: number;
  private readonly params: Float64Array;
  private readonly hasNonGrav: Uint8Array; // per body
  private readonly hasRadiation: Uint8Array;
  private readonly sunGm: number;
  private readonly gradR = new Float64Array(9);
  private readonly gradV = new Float64Array(9);
  private readonly partials = new Float64Array(3 * PARAMS_PER_BODY);
  private readonly scratch = new Float64Array(NONGRAV_SCRATCH);
  // Planet states and indirect terms at the last PLANET_SLOTS distinct times: the
  // predictor–corrector revisits the same eight substep times 2–12 times per step.
  private readonly slotTimes = new Float64Array(PLANET_SLOTS).fill(NaN);
  private readonly slotStates: Float64Array;
  private readonly slotIndirect = new Float64Array(3 * PLANET_SLOTS);
  private nextSlot = 0;

  constructor(nBodies: number, params: Float64Array | null, options: ForceModelOptions = {}) {
    if (!Number.isInteger(nBodies) || nBodies < 1) throw new RangeError(`force model: bad body count ${nBodies}`);
    this.nBodies = nBodies;
    this.variational = options.variational ?? false;
    this.errorDim = 3 * nBodies;
    this.dim = this.errorDim * (this.variational ? 1 + VARIATIONS_PER_BODY : 1);
    this.planets = [...(options.planets ?? [])];
    this.eph = options.ephemeris ?? null;
    if (this.planets.length > 0 && this.eph === null) {
      throw new TypeError('force model: planets requested but no ephemeris given');
    }
    // The 'earth' GM is that of the Earth–Moon system, so it acts from the barycentre.
    this.planetBodies = this.planets.map((p) => (p === 'earth' ? 'emb' : p));
    this.planetGm = Float64Array.from(this.planets.map((p) => planetGmAu3PerDay2(p)));
    this.slotStates = new Float64Array(PLANET_SLOTS * 6 * this.planets.length);
    this.relativity = options.relativity ?? false;
    this.law = options.nonGravLaw ?? 'comet-water';
    this.cr = options.radiationPressureCoefficient ?? 1;
    this.sunGm = options.sunGm ?? GM_SUN_AU3_PER_DAY2;
    if (!(this.sunGm > 0 && Number.isFinite(this.sunGm))) throw new RangeError(`force model: bad sunGm ${this.sunGm}`);
    this.planets.forEach((p, j) => {
      if (!(this.planetGm[j] > 0)) throw new RangeError(`force model: unknown planet '${p}'`);
    });
    if (!(this.cr >= 0) || !Number.isFinite(this.cr)) throw new RangeError(`force model: bad C_R ${this.cr}`);
    this.params = new Float64Array(PARAMS_PER_BODY * nBodies);
    if (params !== null) {
      if (params.length !== this.params.length) {
        throw new RangeError(`force model: ${params.length} parameters, expected ${this.params.length}`);
      }
      for (let i = 0; i < params.length; i++) {
        if (!Number.isFinite(params[i])) throw new RangeError(`force model: non-finite parameter ${i}: ${params[i]}`);
      }
      this.params.set(params);
    }
    this.hasNonGrav = new Uint8Array(nBodies);
    this.hasRadiation = new Uint8Array(nBodies);
    for (let k = 0; k < nBodies; k++) {
      const o = PARAMS_PER_BODY * k;
      // With variational equations on, the terms stay on (their partials are wanted at 0).
      this.hasNonGrav[k] = this.variational || this.params[o] !== 0 || this.params[o + 1] !== 0 || this.params[o + 2] !== 0 ? 1 : 0;
      this.hasRadiation[k] = this.variational || this.params[o + 3] !== 0 ? 1 : 0;
    }
  }

  /**
   * Planet positions and the indirect term at time t: the slot holding them is returned
   * (positions of planet j at slotStates[6·(slot·planets + j)], the indirect term at
   * slotIndirect[3·slot]), read again when t was seen among the last PLANET_SLOTS times, else
   * filled from the ephemeris (all planets once per time, shared by all bodies; positions
   * only when the ephemeris offers helioPositions, bit for bit those of helioState).
   */
  private updatePlanets(tJd: number): number {
    for (let k = 0; k < PLANET_SLOTS; k++) if (this.slotTimes[k] === tJd) return k;
    const k = this.nextSlot;
    this.nextSlot = (k + 1) % PLANET_SLOTS;
    const np = this.planetBodies.length;
    const ps = this.slotStates;
    const base = 6 * np * k;
    const eph = this.eph!;
    if (eph.helioPositions) eph.helioPositions(this.planetBodies, tJd, ps, base, 6);
    else for (let j = 0; j < np; j++) eph.helioState(this.planetBodies[j], tJd, ps, base + 6 * j);
    let ix = 0, iy = 0, iz = 0;
    for (let j = 0; j < np; j++) {
      const o = base + 6 * j;
      const x = ps[o], y = ps[o + 1], z = ps[o + 2];
      const r2 = x * x + y * y + z * z;
      const f = this.planetGm[j] / (r2 * Math.sqrt(r2));
      ix -= f * x; iy -= f * y; iz -= f * z;
    }
    this.slotTimes[k] = tJd;
    this.slotIndirect[3 * k] = ix; this.slotIndirect[3 * k + 1] = iy; this.slotIndirect[3 * k + 2] = iz;
    return k;
  }

  accel(tJd: number, x: Float64Array, v: Float64Array, out: Float64Array): void {
    const np = this.planetBodies.length;
    const slot = np > 0 ? this.updatePlanets(tJd) : 0;
    const ps = this.slotStates;
    const pBase = 6 * np * slot;
    const ind = this.slotIndirect;
    const indX = ind[3 * slot], indY = ind[3 * slot + 1], indZ = ind[3 * slot + 2];
    const variational = this.variational;
    const gradR = variational ? this.gradR : null;
    const gradV = variational ? this.gradV : null;
    const partials = variational ? this.partials : null;
    const nb = this.nBodies;
    for (let k = 0; k < nb; k++) {
      if (!variational && this.hasNonGrav[k] === 0 && this.hasRadiation[k] === 0) {
        this.gravityOnly(k, x, v, out, ps, pBase, indX, indY, indZ);
        continue;
      }
      const o = 3 * k;
      const rx = x[o], ry = x[o + 1], rz = x[o + 2];
      out[o] = 0; out[o + 1] = 0; out[o + 2] = 0;
      if (variational) { this.gradR.fill(0); this.gradV.fill(0); this.partials.fill(0); }
      addPointMassAcceleration(this.sunGm, rx, ry, rz, out, o, gradR);
      for (let j = 0; j < np; j++) {
        const q = pBase + 6 * j;
        addPointMassAcceleration(this.planetGm[j], rx - ps[q], ry - ps[q + 1], rz - ps[q + 2], out, o, gradR);
      }
      if (np > 0) {
        out[o] += indX; out[o + 1] += indY; out[o + 2] += indZ;
      }
      if (this.relativity) {
        addSchwarzschildAcceleration(this.sunGm, C_AU_PER_DAY, rx, ry, rz, v[o], v[o + 1], v[o + 2],
          out, o, gradR, gradV);
      }
      const pp = PARAMS_PER_BODY * k;
      if (this.hasNonGrav[k]) {
        addNonGravAcceleration(this.law, this.params[pp], this.params[pp + 1], this.params[pp + 2],
          x, v, o, out, o, gradR, gradV, partials, 0, this.scratch);
      }
      if (this.hasRadiation[k]) {
        addRadiationPressure(this.params[pp + 3], this.cr, x, o, out, o, gradR, partials, 9);
      }
      if (variational) this.variationalAccel(k, x, v, out);
    }
  }

  /**
   * Body k with gravity (and the 1PN term) only, no gradients: the same operations in the
   * same order as addPointMassAcceleration and addSchwarzschildAcceleration on out[], summed
   * in locals and stored once (bit for bit the same accelerations, tested).
   */
  private gravityOnly(k: number, x: Float64Array, v: Float64Array, out: Float64Array, ps: Float64Array, pBase: number,
    indX: number, indY: number, indZ: number): void {
    const o = 3 * k;
    const rx = x[o], ry = x[o + 1], rz = x[o + 2];
    let ax = 0, ay = 0, az = 0;
    {
      const d2 = rx * rx + ry * ry + rz * rz;
      const d = Math.sqrt(d2);
      const f = this.sunGm / (d2 * d);
      ax -= f * rx; ay -= f * ry; az -= f * rz;
    }
    const np = this.planetBodies.length;
    const gm = this.planetGm;
    for (let j = 0; j < np; j++) {
      const q = pBase + 6 * j;
      const dx = rx - ps[q], dy = ry - ps[q + 1], dz = rz - ps[q + 2];
      const d2 = dx * dx + dy * dy + dz * dz;
      const d = Math.sqrt(d2);
      const f = gm[j] / (d2 * d);
      ax -= f * dx; ay -= f * dy; az -= f * dz;
    }
    if (np > 0) {
      ax += indX; ay += indY; az += indZ;
    }
    if (this.relativity) {
      // addSchwarzschildAcceleration (relativity.ts), written out.
      const vx = v[o], vy = v[o + 1], vz = v[o + 2];
      const r2 = rx * rx + ry * ry + rz * rz;
      const r = Math.sqrt(r2);
      const v2 = vx * vx + vy * vy + vz * vz;
      const s = rx * vx + ry * vy + rz * vz;
      const mu = this.sunGm;
      const kk = mu / (C_AU_PER_DAY * C_AU_PER_DAY * r2 * r);
      const f = (4 * mu) / r - v2;
      ax += kk * (f * rx + 4 * s * vx);
      ay += kk * (f * ry + 4 * s * vy);
      az += kk * (f * rz + 4 * s * vz);
    }
    out[o] = ax; out[o + 1] = ay; out[o + 2] = az;
  }

  /** δa = (∂a/∂r) δr + (∂a/∂v) δv (+ ∂a/∂p for the parameter columns). */
  private variationalAccel(k: number, x: Float64Array, v: Float64Array, out: Float64Array): void {
    const gr = this.gradR, gv = this.gradV, pa = this.partials;
    const base = this.errorDim + 3 * VARIATIONS_PER_BODY * k;
    for (let j = 0; j < VARIATIONS_PER_BODY; j++) {
      const o = base + 3 * j;
      const dx = x[o], dy = x[o + 1], dz = x[o + 2];
      const dvx = v[o], dvy = v[o + 1], dvz = v[o + 2];
      for (let i = 0; i < 3; i++) {
        out[o + i] = gr[3 * i] * dx + gr[3 * i + 1] * dy + gr[3 * i + 2] * dz
          + gv[3 * i] * dvx + gv[3 * i + 1] * dvy + gv[3 * i + 2] * dvz;
      }
      if (j >= 6) {
        const q = 3 * (j - 6);
        out[o] += pa[q]; out[o + 1] += pa[q + 1]; out[o + 2] += pa[q + 2];
      }
    }
  }

  /** Initial deviation vectors: identity for the STM columns, zero for the parameters. */
  initialVariations(x: Float64Array, v: Float64Array): void {
    if (!this.variational) return;
    x.fill(0, this.errorDim);
    v.fill(0, this.errorDim);
    for (let k = 0; k < this.nBodies; k++) {
      const base = this.errorDim + 3 * VARIATIONS_PER_BODY * k;
      for (let j = 0; j < 3; j++) {
        x[base + 3 * j + j] = 1; // column j: δr = e_j
        v[base + 3 * (j + 3) + j] = 1; // column j+3: δv = e_j
      }
    }
  }

  /**
   * Reads body k's 6×6 state transition matrix (row-major, ∂(r,v)(t)/∂(r,v)(t0)) and its
   * 6×4 parameter partials (row-major, ∂(r,v)(t)/∂(A1,A2,A3,A/m)) from an integrated vector.
   */
  readVariations(k: number, x: Float64Array, v: Float64Array, stm: Float64Array, paramPartials: Float64Array | null): void {
    if (!this.variational) throw new RangeError('force model: variational equations are off');
    const base = this.errorDim + 3 * VARIATIONS_PER_BODY * k;
    for (let j = 0; j < VARIATIONS_PER_BODY; j++) {
      const o = base + 3 * j;
      for (let i = 0; i < 3; i++) {
        if (j < 6) {
          stm[6 * i + j] = x[o + i];
          stm[6 * (i + 3) + j] = v[o + i];
        } else if (paramPartials !== null) {
          paramPartials[PARAMS_PER_BODY * i + (j - 6)] = x[o + i];
          paramPartials[PARAMS_PER_BODY * (i + 3) + (j - 6)] = v[o + i];
        }
      }
    }
  }
}
