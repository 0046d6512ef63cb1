/**
 * A family member's proper elements from its ejection velocity at the break-up: Gauss's
 * perturbation equations for a small velocity change δV = (δV_R radial, δV_T transverse,
 * δV_W normal to the orbit plane), in the form used to relate family spreads to ejection
 * velocities (Zappalà, Cellino, Dell'Oro, Migliorini & Paolicchi 1996, Icarus 124, 156;
 * Morbidelli, Zappalà, Moons, Cellino & Gonczi 1995, Icarus 118, 132; equations as written
 * there, numbering from memory), with η = √(1 − e²) and n·a the parent's orbital speed:
 *
 *   δa/a = 2 / (n a η) · [ (1 + e cos f) δV_T + e sin f δV_R ]
 *   δe   = η / (n a)   · [ (e + 2 cos f + e cos² f) / (1 + e cos f) · δV_T + sin f δV_R ]
 *   δi   = η / (n a)   · cos(ω + f) / (1 + e cos f) · δV_W
 *
 * f is the true anomaly and ω + f the argument of latitude of the parent at the break-up. The
 * parent's proper elements stand in for its osculating ones (common practice in those papers).
 */
import { orbitalSpeedMPerS } from '../../src/detect/families/metricVelocity.js';

/** Changes of a (au), e and i (rad) from an ejection velocity (m/s). */
export interface GaussChange { daAu: number; de: number; diRad: number }

export function gaussChange(
  aAu: number, e: number, trueAnomalyRad: number, argLatitudeRad: number,
  dvRadialMPerS: number, dvTransverseMPerS: number, dvNormalMPerS: number, out: GaussChange,
): GaussChange {
  if (!(aAu > 0) || !(e >= 0 && e < 1)) throw new RangeError(`gaussChange: need a > 0 and 0 ≤ e < 1, got a=${aAu}, e=${e}`);
  const na = orbitalSpeedMPerS(aAu);
  const eta = Math.sqrt(1 - e * e);
  const cf = Math.cos(trueAnomalyRad), sf = Math.sin(trueAnomalyRad);
  const r = 1 + e * cf;
  out.daAu = ((2 * aAu) / (na * eta)) * (r * dvTransverseMPerS + e * sf * dvRadialMPerS);
  out.de = (eta / na) * (((e + 2 * cf + e * cf * cf) / r) * dvTransverseMPerS + sf * dvRadialMPerS);
  out.diRad = (eta / na) * (Math.cos(argLatitudeRad) / r) * dvNormalMPerS;
  return out;
}
