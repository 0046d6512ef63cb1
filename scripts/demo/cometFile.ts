/**
 * Writes the demo comet file (one-line comet orbit export format): natural comets with the
 * planted ones inserted at random places. Designations are invented provisional comet
 * designations of 2030–2032 ('P/' for periods under 200 years, else 'C/'), each with an
 * invented discoverer-style name.
 */
import { calendarToJd, jdToCalendar } from '../../src/core/time/julian.js';
import { formatCometExportLine } from '../../src/io/index.js';
import { emptyOrbitRow } from '../../src/io/types.js';
import { INVENTED_COMET_NAMES, pickCometClass, sampleNaturalComet } from './cometPopulation.js';
import type { DesignationAllocator } from './designations.js';
import { halfMonthIndex } from './designations.js';
import { LineWriter } from './lineWriter.js';
import type { CometElements } from './orbitRows.js';
import { cometSemimajorAxisAu, emptyCometElements, fillCometRow, roundCometElements } from './orbitRows.js';
import type { PlantedComet } from './plantedComets.js';
import type { Random } from './random.js';
import { uniform, uniformInt } from './random.js';
import { DEMO_CUT_JD_TT, DEMO_EPOCH_JD_TT } from './scenario.js';
import { tisserandJupiter } from './tisserand.js';
import type { TruthRow } from './types.js';

export interface CometFileSpec {
  path: string;
  random: Random;
  comets: number; // natural comets
  plants: readonly PlantedComet[];
  allocator: DesignationAllocator;
  truth: TruthRow[];
  classCounts: Record<string, number>;
}

const FIRST_DISCOVERY_JD = calendarToJd(2030, 1, 1);

function designationFor(spec: CometFileSpec, c: CometElements): string {
  const d = jdToCalendar(uniform(spec.random, FIRST_DISCOVERY_JD, DEMO_CUT_JD_TT));
  const a = cometSemimajorAxisAu(c);
  const periodic = c.e < 1 && a ** 1.5 < 200;
  return spec.allocator.comet(periodic ? 'P' : 'C', d.year, halfMonthIndex(d.month, Math.floor(d.day)));
}

/** Writes the comet file; returns the number of lines written. */
export function writeCometFile(spec: CometFileSpec): number {
  const positions = spec.plants.map(() => uniformInt(spec.random, 0, spec.comets));
  const order = positions.map((p, k) => k).sort((x, y) => positions[x] - positions[y] || x - y);
  const w = new LineWriter(spec.path);
  const row = emptyOrbitRow();
  const c = emptyCometElements();
  let next = 0;
  let nameIndex = 0;
  const write = (el: CometElements): { designation: string; line: number } => {
    const designation = designationFor(spec, el);
    const name = INVENTED_COMET_NAMES[nameIndex++ % INVENTED_COMET_NAMES.length];
    fillCometRow(row, el, designation, name, DEMO_EPOCH_JD_TT);
    return { designation, line: w.write(formatCometExportLine(row)) };
  };
  for (let j = 0; j <= spec.comets; j++) {
    while (next < order.length && positions[order[next]] === j) {
      const p = spec.plants[order[next++]];
      const written = write(p.c);
      const a = cometSemimajorAxisAu(p.c);
      spec.truth.push({
        designation: written.designation, file: 'comets.txt', line: written.line, plantedClass: p.plantedClass,
        detector: p.detector, aAu: a, e: p.c.e, iDeg: p.c.iDeg, tisserandJ: tisserandJupiter(a, p.c.e, p.c.iDeg), note: p.note,
      });
    }
    if (j === spec.comets) break;
    const cls = pickCometClass(spec.random);
    sampleNaturalComet(spec.random, cls, c);
    roundCometElements(c);
    spec.classCounts[cls] = (spec.classCounts[cls] ?? 0) + 1;
    write(c);
  }
  w.close();
  return w.lines;
}
