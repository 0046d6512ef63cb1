/**
 * Samplers of the outer asteroid classes: Hildas (3:2 resonance with Jupiter), Jupiter
 * Trojans (1:1, about L4/L5), Centaurs and trans-Neptunian objects. Shapes are common
 * practice; ranges and scales are from memory. Resonant bodies get angles that put them in
 * their resonance at the epoch, using Jupiter's mean longitude from planets.ts (mean
 * elements, see the approximation stated there).
 */
import { wrapDeg360 } from '../../src/core/math.js';
import type { Random } from './random.js';
import { normal, pickWeighted, rayleigh, uniform, uniformAngleDeg } from './random.js';
import type { DemoElements } from './types.js';

/** Sets ω and M so that the body's mean longitude is λ and its perihelion longitude ϖ. */
export function placeLongitudes(out: DemoElements, lambdaDeg: number, varpiDeg: number): void {
  out.periDeg = wrapDeg360(varpiDeg - out.nodeDeg);
  out.meanAnomalyDeg = wrapDeg360(lambdaDeg - varpiDeg);
}

/**
 * Hildas: a N(3.97, 0.02) au, e 0.05–0.28, i Rayleigh 8° below 19° (the Hilda zone a
 * screen exempts is commonly bounded at i < 20°). Resonant angle
 * σ = 3λ_J − 2λ − ϖ placed within ±30° of 0 (Hildas librate about σ = 0, so conjunctions
 * with Jupiter happen near the body's perihelion; Murray & Dermott 1999 ch. 8, from memory).
 */
export function sampleHilda(random: Random, jupiterLambdaDeg: number, out: DemoElements): void {
  out.aAu = Math.min(Math.max(normal(random, 3.97, 0.02), 3.9), 4.04);
  out.e = uniform(random, 0.05, 0.28);
  out.iDeg = Math.min(rayleigh(random, 8), 19);
  out.nodeDeg = uniformAngleDeg(random);
  const lambda = uniformAngleDeg(random);
  const sigma = uniform(random, -30, 30);
  placeLongitudes(out, lambda, 3 * jupiterLambdaDeg - 2 * lambda - sigma);
}

/**
 * Jupiter Trojans: a N(5.2026, 0.03) au in 5.12–5.29, e Rayleigh 0.06 (< 0.2), i Rayleigh
 * 12° (< 40°); mean longitude λ_J ± 60° with a libration offset N(0, 12°) clipped to ±35°.
 * L4 (leading, +60°) holds more bodies than L5 (ratio about 1.6, from memory).
 */
export function sampleJupiterTrojan(random: Random, jupiterLambdaDeg: number, out: DemoElements): void {
  out.aAu = Math.min(Math.max(normal(random, 5.2026, 0.03), 5.12), 5.29);
  out.e = Math.min(rayleigh(random, 0.06), 0.2);
  out.iDeg = Math.min(rayleigh(random, 12), 40);
  out.nodeDeg = uniformAngleDeg(random);
  const l4 = random() < 1.6 / 2.6;
  const offset = Math.min(Math.max(normal(random, 0, 12), -35), 35);
  const lambda = jupiterLambdaDeg + (l4 ? 60 : -60) + offset;
  placeLongitudes(out, lambda, uniformAngleDeg(random));
}

/** Centaurs: a 5.6–29 au, q > 5.3 au, e ≤ 0.7, i Rayleigh 12°. */
export function sampleCentaur(random: Random, out: DemoElements): void {
  const a = Math.exp(uniform(random, Math.log(5.6), Math.log(29)));
  const eMax = Math.min(0.7, 1 - 5.3 / a);
  out.aAu = a;
  out.e = uniform(random, 0.02, Math.max(eMax, 0.03));
  out.iDeg = Math.min(rayleigh(random, 12), 60);
  out.nodeDeg = uniformAngleDeg(random);
  out.periDeg = uniformAngleDeg(random);
  out.meanAnomalyDeg = uniformAngleDeg(random);
}

/**
 * Trans-Neptunian objects, four groups (weights 0.4, 0.25, 0.2, 0.15): cold classical
 * (a 42.5–47 au, i Rayleigh 2.5°), hot classical (same a, i Rayleigh 12°), plutinos
 * (3:2 with Neptune, a N(39.45, 0.1) au, e 0.05–0.3) and scattered disc (a 50–250 au
 * log-uniform, q 30–42 au, i Rayleigh 15°).
 */
export function sampleTno(random: Random, out: DemoElements): void {
  const group = pickWeighted(random, [0.4, 0.25, 0.2, 0.15]);
  if (group <= 1) {
    out.aAu = uniform(random, 42.5, 47);
    out.e = Math.min(rayleigh(random, 0.05), 0.2);
    out.iDeg = Math.min(rayleigh(random, group === 0 ? 2.5 : 12), 45);
  } else if (group === 2) {
    out.aAu = normal(random, 39.45, 0.1);
    out.e = uniform(random, 0.05, 0.3);
    out.iDeg = Math.min(rayleigh(random, 10), 40);
  } else {
    const a = Math.exp(uniform(random, Math.log(50), Math.log(250)));
    out.aAu = a;
    out.e = 1 - uniform(random, 30, 42) / a;
    out.iDeg = Math.min(rayleigh(random, 15), 60);
  }
  out.nodeDeg = uniformAngleDeg(random);
  out.periDeg = uniformAngleDeg(random);
  out.meanAnomalyDeg = uniformAngleDeg(random);
}
