/**
 * Writes the demo asteroid file (one-line orbit export format): header, then the numbered,
 * multi-opposition and one-opposition blocks of natural bodies with the planted bodies and
 * bad rows inserted at random places, then a block of older re-submitted orbits (duplicate
 * designations), then, when given, one more row (the demo body for check: no random draws,
 * so every row before it is as without it). The natural rows come from a stream of their own (spec.naturalRandom), so
 * the same bodies can be drawn ahead of writing (naturalTrusted.ts). Streams: natural rows are drawn, written and forgotten, so 1.5 M rows
 * need no more memory than 20 000. One scratch OrbitRow, DemoElements and DemoQuality serve
 * every natural row.
 */
import { formatOrbitExportLine, packEpochJd } from '../../src/io/index.js';
import { emptyOrbitRow } from '../../src/io/types.js';
import type { OrbitRow } from '../../src/io/types.js';
import { BAD_ROWS, spoilLine } from './badRows.js';
import type { BadRowKind } from './badRows.js';
import type { DesignationAllocator } from './designations.js';
import { planDuplicate } from './duplicates.js';
import { asteroidFileHeader } from './header.js';
import { LineWriter } from './lineWriter.js';
import type { FamiliesTruthWriter } from './familiesTruthTable.js';
import { drawNaturalRow } from './naturalRows.js';
import { fillAsteroidRow } from './orbitRows.js';
import type { PlantedAsteroid } from './plantedAsteroids.js';
import type { CoorbitalTruthRow } from './coorbitalTruthTable.js';
import { emptyNaturalPlant, type NaturalPlant, type PopulationContext } from './population.js';
import type { Random } from './random.js';
import { uniformInt } from './random.js';
import type { Section } from './scenario.js';
import { DEMO_EPOCH_JD_TT, SECTION_SHARES, SECTIONS } from './scenario.js';
import { tisserandJupiter } from './tisserand.js';
import type { DemoElements, DemoQuality, TrailingRow, TruthRow } from './types.js';
import { emptyElements, emptyQuality } from './types.js';

export interface AsteroidFileSpec {
  path: string;
  seed: number;
  random: Random; // plants' places, bad rows, duplicates
  naturalRandom: Random; // the natural rows only (naturalRows.ts), so they can be drawn again ahead
  population: PopulationContext;
  familiesTruth: FamiliesTruthWriter | null; // families-truth.csv, appended to
  bodies: number; // natural rows (planted, bad and duplicate rows come on top)
  plants: readonly PlantedAsteroid[];
  badRows: boolean;
  duplicates: number;
  allocator: DesignationAllocator;
  truth: TruthRow[]; // appended to
  classCounts: Record<string, number>; // natural rows per class, appended to
  coorbitals: CoorbitalTruthRow[]; // co-orbital plants as written, appended to
  trailing?: TrailingRow | null; // a last block of one row after the re-submitted orbits (the demo body for check)
}

type Special =
  | { pos: number; kind: 'plant'; plant: PlantedAsteroid }
  | { pos: number; kind: 'bad'; bad: BadRowKind; reason: string }
  | { pos: number; kind: 'duplicate-source' };

interface Written { designation: string; line: number }

/** Natural rows per section: shares of `bodies`, the last section takes the remainder. */
export function sectionSizes(bodies: number): Record<Section, number> {
  const numbered = Math.round(bodies * SECTION_SHARES.numbered);
  const multiOpposition = Math.round(bodies * SECTION_SHARES.multiOpposition);
  return { numbered, multiOpposition, oneOpposition: bodies - numbered - multiOpposition };
}

function scheduleSpecials(spec: AsteroidFileSpec, sizes: Record<Section, number>): Record<Section, Special[]> {
  const out: Record<Section, Special[]> = { numbered: [], multiOpposition: [], oneOpposition: [] };
  const r = spec.random;
  for (const plant of spec.plants) out[plant.section].push({ pos: uniformInt(r, 0, sizes[plant.section]), kind: 'plant', plant });
  if (spec.badRows) {
    BAD_ROWS.forEach(({ kind, reason }, k) => {
      const section: Section = k % 2 === 0 ? 'numbered' : 'multiOpposition';
      out[section].push({ pos: uniformInt(r, 0, sizes[section]), kind: 'bad', bad: kind, reason });
    });
  }
  for (let k = 0; k < spec.duplicates; k++) {
    out.multiOpposition.push({ pos: uniformInt(r, 0, sizes.multiOpposition - 1), kind: 'duplicate-source' });
  }
  for (const s of SECTIONS) out[s].sort((x, y) => x.pos - y.pos); // stable: ties keep plan order
  return out;
}

/** Fills `row` with a newly allocated designation: a number in the numbered block. */
function fillNewBody(spec: AsteroidFileSpec, row: OrbitRow, el: DemoElements, q: DemoQuality, section: Section): string {
  if (section === 'numbered') {
    const number = spec.allocator.number();
    fillAsteroidRow(row, el, q, `(${number})`, number, DEMO_EPOCH_JD_TT);
  } else {
    const designation = spec.allocator.provisional(q.designationYear, q.designationHalfMonth);
    fillAsteroidRow(row, el, q, designation, NaN, DEMO_EPOCH_JD_TT);
  }
  return row.designation;
}

function writeBody(
  spec: AsteroidFileSpec, w: LineWriter, row: OrbitRow, el: DemoElements, q: DemoQuality, section: Section,
): Written {
  const designation = fillNewBody(spec, row, el, q, section);
  return { designation, line: w.write(formatOrbitExportLine(row)) };
}

function truthOf(file: TruthRow['file'], w: Written, cls: string, detector: string, el: DemoElements | null, note: string): TruthRow {
  return {
    designation: w.designation, file, line: w.line, plantedClass: cls, detector,
    aAu: el ? el.aAu : NaN, e: el ? el.e : NaN, iDeg: el ? el.iDeg : NaN,
    tisserandJ: el ? tisserandJupiter(el.aAu, el.e, el.iDeg) : NaN, note,
  };
}


function writeSpecial(spec: AsteroidFileSpec, w: LineWriter, row: OrbitRow, s: Special, section: Section): void {
  if (s.kind === 'plant') {
    const p = s.plant;
    const written = writeBody(spec, w, row, p.el, p.q, section);
    spec.truth.push(truthOf('orbits.txt', written, p.plantedClass, p.detector, p.el, p.note));
    if (p.coorbital) spec.coorbitals.push({ designation: written.designation, line: written.line, plant: p.coorbital });
    if (p.outlier) spec.familiesTruth?.outlier(written.designation, written.line, p.el.H, p.outlier);
  } else if (s.kind === 'bad') {
    if (s.bad === 'garbage') {
      const line = w.write(spoilLine('garbage', ''));
      spec.truth.push(truthOf('orbits.txt', { designation: '', line }, 'bad-row', 'clean', null, s.reason));
      return;
    }
    const el = emptyElements();
    const q = emptyQuality();
    drawNaturalRow(spec.random, section, spec.population, el, q, emptyNaturalPlant());
    const designation = fillNewBody(spec, row, el, q, section);
    const line = w.write(spoilLine(s.bad, formatOrbitExportLine(row)));
    spec.truth.push(truthOf('orbits.txt', { designation, line }, 'bad-row', 'clean', null, s.reason));
  }
}

interface DuplicateSource { written: Written; el: DemoElements; q: DemoQuality }

/** The trailing block of older re-submitted orbits, one per duplicate source. */
function writeDuplicates(spec: AsteroidFileSpec, w: LineWriter, row: OrbitRow, sources: readonly DuplicateSource[]): void {
  if (sources.length === 0) return;
  w.write('');
  for (const src of sources) {
    const dup = planDuplicate(spec.random, src.el);
    fillAsteroidRow(row, dup.el, src.q, src.written.designation, NaN, dup.epochJdTT);
    const line = w.write(formatOrbitExportLine(row));
    spec.truth.push(truthOf('orbits.txt', { designation: src.written.designation, line }, 'duplicate', 'clean', dup.el,
      `same designation as line ${src.written.line} with an older epoch (${dup.epochText}); the newer orbit should be kept`));
  }
}

/** Writes the asteroid file; returns the number of lines written. */
export function writeAsteroidFile(spec: AsteroidFileSpec, populationOnly: boolean): number {
  const sizes = sectionSizes(spec.bodies);
  const specials = scheduleSpecials(spec, sizes);
  const w = new LineWriter(spec.path);
  const row = emptyOrbitRow();
  const el = emptyElements();
  const q = emptyQuality();
  const plant: NaturalPlant = emptyNaturalPlant();
  const duplicateSources: DuplicateSource[] = [];
  for (const line of asteroidFileHeader(spec.seed, packEpochJd(DEMO_EPOCH_JD_TT), populationOnly, Boolean(spec.trailing))) w.write(line);
  SECTIONS.forEach((section, k) => {
    if (k > 0) w.write('');
    const list = specials[section];
    let next = 0;
    for (let j = 0; j <= sizes[section]; j++) {
      let dupHere = false;
      while (next < list.length && list[next].pos === j) {
        const s = list[next++];
        if (s.kind === 'duplicate-source') dupHere = true;
        else writeSpecial(spec, w, row, s, section);
      }
      if (j === sizes[section]) break;
      const cls = drawNaturalRow(spec.naturalRandom, section, spec.population, el, q, plant);
      spec.classCounts[cls] = (spec.classCounts[cls] ?? 0) + 1;
      const written = writeBody(spec, w, row, el, q, section);
      spec.familiesTruth?.natural(written.designation, written.line, el.H, plant);
      if (dupHere) duplicateSources.push({ written, el: { ...el }, q: { ...q } });
    }
  });
  writeDuplicates(spec, w, row, duplicateSources);
  if (spec.trailing) {
    w.write('');
    spec.truth.push({ ...spec.trailing.truth, line: w.write(spec.trailing.line) });
  }
  w.close();
  return w.lines;
}
