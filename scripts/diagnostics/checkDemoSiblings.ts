/**
 * Is the demo body's low C_R·A/m noise or bias? `npx tsx scripts/diagnostics/checkDemoSiblings.ts
 * [--siblings N] [--seed S] [--weights record|stations]`. Prints figures only; asserts nothing.
 * Invented data throughout (the demo body of scripts/demo/checkBody.ts).
 *
 * The demo body's observations are made once (the demo seed: the same times, stations and
 * outliers as data/demo/check/). Then:
 *   - noise-free: every place at its true astrometric place (the generator's own), the outliers
 *     too: a fit whose model is the generator's must return the planted C_R·A/m to far below σ;
 *   - sibling 0: the demo's own noise (the data/demo/check/ places, unrounded);
 *   - siblings 1 … N: the same instants, stations, σ and outliers, the Gaussian noise drawn anew
 *     from a stream of its own (seededRandom of the seed mixed with the sibling number).
 * Each is fitted with the srp model alone from the truth elements (the elements row), with
 * outlier rejection, as `check` fits its srp model: the comparison set is the srp fit's own kept
 * set when srp is the model that rejects fewest, which it is on this body. Weights: 'record' —
 * the places carry their σ (as the ADES file does) and `check`'s per-night factor applies;
 * 'stations' — no σ on the records, the default per-station table (as the 80-column file).
 * Pull = (fitted − planted)/σ; for noise alone the pulls have mean 0 and spread 1.
 */
import { Command, Option } from 'commander';
import { RAD_PER_ARCSEC } from '../../src/core/constants.js';
import { planetaryEphemerisOver } from '../../src/core/propagate/propagateOrbit.js';
import { normalDeviate, seededRandom } from '../../src/core/random.js';
import { fitOptionsOf } from '../../src/fit/check/modelFits.js';
import { fitOrbit } from '../../src/fit/fitOrbit.js';
import { NONGRAV_MODELS } from '../../src/fit/models/index.js';
import { observationSigmas } from '../../src/fit/observationWeights.js';
import { OrbitFitError } from '../../src/fit/orbitFitTypes.js';
import { generateSyntheticAstrometry } from '../../src/fit/synthetic/index.js';
import type { AstrometryObservation, ObservatorySite } from '../../src/io/astrometry/types.js';
import { CHECK_BODY_DESIGNATION, checkBodyRequest } from '../demo/checkBody.js';
import { trialSeed } from '../injection/injectionRecovery.js';
import { int } from './checkOptions.js';

const program = new Command('checkDemoSiblings')
  .option('--siblings <n>', 'siblings with new noise', int, 20)
  .option('--seed <n>', 'demo seed', int, 20320510)
  .addOption(new Option('--weights <w>', 'σ the fit gives the places').choices(['record', 'stations']).default('record'))
  .exitOverride((err) => process.exit(err.exitCode === 0 ? 0 : 2))
  .parse();
const o = program.opts();

const { request } = checkBodyRequest(o.seed);
const gen = generateSyntheticAstrometry(CHECK_BODY_DESIGNATION, request);
const planted = request.truth.areaToMassM2PerKg * request.truth.radiationPressureCoefficient;
const sites = new Map<string, ObservatorySite>(request.stations.map((s) => [s.site.code, s.site]));
const times = gen.observations.map((x) => x.observation.timeJdTT);
const elements = request.truth.elements;
const ephemeris = planetaryEphemerisOver(Math.min(...times, elements.epochJdTDB) - 2, Math.max(...times, elements.epochJdTDB) + 2);
const model = NONGRAV_MODELS.srp;

/** The observations with noise (Δα cos δ, Δδ in arcsec) added to the true places. */
function withNoise(noise: (k: number) => [number, number]): AstrometryObservation[] {
  return gen.observations.map((s, k) => {
    const [nx, ny] = noise(k);
    const decRad = s.trueDecRad + ny * RAD_PER_ARCSEC;
    const raRad = s.trueRaRad + (nx * RAD_PER_ARCSEC) / Math.cos(s.trueDecRad);
    const obs = { ...s.observation, raRad, decRad };
    return o.weights === 'stations' ? { ...obs, sigmaRaCosDecArcsec: NaN, sigmaDecArcsec: NaN } : obs;
  });
}

function fit(label: string, obs: AstrometryObservation[]): number {
  try {
    const f = fitOrbit(obs, sites, { kind: 'elements', elements }, { ...fitOptionsOf(model), sigmas: observationSigmas(obs, sites), ephemeris });
    const m = f.columns.length;
    const value = f.params[model.params[0].forceIndex];
    const sigma = Math.sqrt(f.covariance[6 * m + 6]);
    const pull = (value - planted) / sigma;
    console.log(`${label}: C_R·A/m ${value.toFixed(6)} ± ${sigma.toFixed(6)} m²/kg, pull ${pull.toFixed(2)}, χ²/dof ${(f.chi2 / f.degreesOfFreedom).toFixed(3)}, ${f.rejected} rejected`);
    return pull;
  } catch (e) {
    if (!(e instanceof OrbitFitError)) throw e;
    console.log(`${label}: failed ${e.message.split('\n')[0]}`);
    return NaN;
  }
}

console.log(`demo body ${CHECK_BODY_DESIGNATION}, seed ${o.seed}: ${gen.observations.length} observations, planted C_R·A/m ${planted} m²/kg, weights ${o.weights}`);
fit('noise-free', withNoise(() => [0, 0]));
const pulls: number[] = [fit('sibling 0 (the demo noise)', withNoise((k) => [gen.observations[k].noiseRaCosDecArcsec, gen.observations[k].noiseDecArcsec]))];
for (let j = 1; j <= o.siblings; j++) {
  const r = seededRandom(trialSeed(o.seed, 'srp', 100000 + j));
  const noise = gen.observations.map((s): [number, number] => {
    const sigma = request.stations.find((t) => t.site.code === s.observation.station)!.sigmaArcsec;
    const nx = sigma * normalDeviate(r);
    const ny = sigma * normalDeviate(r);
    return s.outlier ? [s.noiseRaCosDecArcsec, s.noiseDecArcsec] : [nx, ny];
  });
  pulls.push(fit(`sibling ${j}`, withNoise((k) => noise[k])));
}
const f = pulls.filter(Number.isFinite);
const mean = f.reduce((a, b) => a + b, 0) / f.length;
const sd = Math.sqrt(f.reduce((a, b) => a + (b - mean) ** 2, 0) / (f.length - 1));
console.log(`pulls of ${f.length} fits: mean ${mean.toFixed(2)} ± ${(sd / Math.sqrt(f.length)).toFixed(2)}, spread ${sd.toFixed(2)}, within 1σ ${f.filter((p) => Math.abs(p) <= 1).length}/${f.length}`);
