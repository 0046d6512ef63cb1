/**
 * How constant the proper elements stay: four real asteroids ((4) Vesta, (10) Hygiea,
 * (15) Eunomia, (24) Themis; osculating elements at 2026-06-09 from the orbit-export sample
 * in test/fixtures/orbit-export/) carried back 300, 600 and 900 years by N-body integration
 * (Sun and eight planet systems from VSOP87B, src/core/propagate), and their proper e and
 * sin i computed at each date with a secular model built at that date. Prints the spread
 * of osculating and proper values per body. Figures only; about 100 s (the planetary cache
 * fill dominates). Usage: npx tsx scripts/bench/secularStability.ts
 */
import { readFileSync } from 'node:fs';
import { gunzipSync } from 'node:zlib';
import { RAD_PER_DEG } from '../../src/core/constants.js';
import { propagateOrbit } from '../../src/core/propagate/propagateOrbit.js';
import { planetarySecularModel, properElements } from '../../src/core/secular/index.js';
import { parseOrbitExportLine } from '../../src/io/orbitExportLine.js';
import { emptyOrbitRow } from '../../src/io/types.js';

const EPOCH_JD = 2_461_200.5; // 2026-06-09.0 TT (TDB − TT is below 2 ms: negligible here)
const lines = gunzipSync(readFileSync(new URL('../../test/fixtures/orbit-export/orbits-export-sample.txt.gz', import.meta.url)))
  .toString('latin1').split('\n');

const spread = (xs: number[]) => Math.max(...xs) - Math.min(...xs);

for (const num of [4, 10, 15, 24]) {
  const row = emptyOrbitRow();
  parseOrbitExportLine(lines[num - 1], row, 'orbits-export-sample.txt', num);
  const el = {
    form: 'semimajor' as const, aAu: row.aAu, e: row.e, iRad: row.iDeg * RAD_PER_DEG, nodeRad: row.nodeDeg * RAD_PER_DEG,
    periRad: row.periDeg * RAD_PER_DEG, meanAnomalyRad: row.meanAnomalyDeg * RAD_PER_DEG, epochJdTDB: EPOCH_JD,
  };
  const osc = { e: [] as number[], sinI: [] as number[] }, prop = { e: [] as number[], sinI: [] as number[] };
  for (const years of [0, -300, -600, -900]) {
    const toJd = EPOCH_JD + years * 365.25;
    let { aAu, e, iRad, nodeRad, periRad } = el;
    if (years !== 0) {
      const p = propagateOrbit(el, { toJdTDB: toJd, nbody: true, relativity: false, distances: false });
      [e, iRad, nodeRad, periRad] = [p.perihelion[1], p.perihelion[2], p.perihelion[3], p.perihelion[4]];
      aAu = p.semimajor!.aAu;
    }
    const pr = properElements(planetarySecularModel(toJd), aAu, e, iRad, nodeRad, periRad);
    osc.e.push(e); osc.sinI.push(Math.sin(iRad)); prop.e.push(pr.e); prop.sinI.push(pr.sinI);
  }
  console.log(`${row.designation.padEnd(14)} over 900 yr: e spread osculating ${spread(osc.e).toFixed(4)}, proper ${spread(prop.e).toFixed(4)}; `
    + `sin i spread osculating ${spread(osc.sinI).toFixed(4)}, proper ${spread(prop.sinI).toFixed(4)}`);
}
