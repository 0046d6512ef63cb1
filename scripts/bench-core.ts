/**
 * Benchmarks of the dynamics core, assembled from pieces in scripts/bench/: each piece
 * prints its own figures and ratios and returns them; this script runs them in turn and
 * prints the collected figures as JSON at the end. Figures only; nothing is asserted.
 * Usage: npm run bench:core
 */
import { benchEphemeris } from './bench/ephemeris.js';
import { benchTwoBody } from './bench/twoBody.js';
import { benchIntegrator } from './bench/integrator.js';

const pieces: Array<[string, () => Promise<Record<string, number>>]> = [
  ['ephemeris', benchEphemeris],
  ['twoBody', async () => ({ ...benchTwoBody() })],
  ['integrator', () => benchIntegrator()],
];

const results: Record<string, Record<string, number>> = {};
for (const [name, run] of pieces) {
  results[name] = await run();
}
console.log(JSON.stringify(results, null, 2));
