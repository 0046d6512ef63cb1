/**
 * Options of the co-orbital detector and its defaults. The N-body budget is a number of
 * CPU-seconds turned into a number of bodies at a fixed nominal cost (below), so that the
 * bodies confirmed — and so every output — do not depend on the machine's speed, its load or
 * the number of threads.
 */
import type { PlanetName } from '../core/constants.js';

export interface CoorbitalOptions {
  planets: readonly PlanetName[]; // planets whose 1:1 zones are screened
  zoneHalfWidth: number | null; // relative half-width of every zone; null: per planet (coorbitalZone.ts)
  windowYears: number; // the N-body window is the epoch ± this
  confirm: 'resonant' | 'all'; // confirm bodies predicted resonant (scan) or every screened body (coorbitals)
  budgetCpuSeconds: number; // N-body budget, as a body count at NOMINAL_CPU_SECONDS_PER_1000_YEARS
  threads: number; // worker threads for the predictions and the N-body confirmations (output identical for any count)
  series?: boolean; // keep thinned φ and rotating-frame series for plots (default false: scan pays nothing)
}

export const COORBITAL_DEFAULTS: Readonly<CoorbitalOptions> = {
  planets: ['earth'],
  zoneHalfWidth: null,
  windowYears: 500,
  confirm: 'resonant',
  budgetCpuSeconds: 300,
  threads: 2,
};

/**
 * Nominal CPU cost of confirming one body over 1 000 years (eight planets, 1PN, the cached
 * ephemeris), from `npm run bench:coorbital` on this project's reference machine class
 * (2 cores); a body with close approaches costs more, one far from every planet less.
 */
export const NOMINAL_CPU_SECONDS_PER_1000_YEARS = 1;

/** How many bodies the budget pays for (at least one when the budget is positive). */
export function bodiesWithinBudget(o: Pick<CoorbitalOptions, 'budgetCpuSeconds' | 'windowYears'>): number {
  if (!(o.budgetCpuSeconds > 0)) return 0;
  const perBody = NOMINAL_CPU_SECONDS_PER_1000_YEARS * (2 * o.windowYears) / 1000;
  return Math.max(1, Math.floor(o.budgetCpuSeconds / perBody));
}
