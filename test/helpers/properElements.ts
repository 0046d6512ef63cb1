/**
 * Reader of the proper-element table kept under test/fixtures/proper-elements-sdss/ (CSV
 * header `ap,ep,sinip,astar,iz,H`; see its README for the source). For tests and benchmarks:
 * a cell that is not a number becomes NaN and its line is listed in `badLines` with the text,
 * so no row is dropped silently.
 */
import { readFileSync } from 'node:fs';
import { fileURLToPath } from 'node:url';

export const PROPER_ELEMENTS_SDSS_PATH = fileURLToPath(new URL('../fixtures/proper-elements-sdss/proper-elements-sdss.csv', import.meta.url));

export interface ProperElements {
  readonly aAu: Float64Array;
  readonly e: Float64Array;
  readonly sinI: Float64Array;
  readonly badLines: string[]; // "file:line: text" of each row with a cell that is not a number
}

/** Read the CSV at `path`; every data line becomes one row. */
export function readProperElements(path = PROPER_ELEMENTS_SDSS_PATH): ProperElements {
  const text = readFileSync(path, 'utf8');
  const lines = text.split(/\r?\n/);
  const header = lines[0].split(',');
  const col = (name: string): number => {
    const k = header.indexOf(name);
    if (k < 0) throw new Error(`${path}:1: no column '${name}' in the header`);
    return k;
  };
  const ca = col('ap'), ce = col('ep'), cs = col('sinip');
  const rows = lines.slice(1).filter((l) => l.trim() !== '');
  const aAu = new Float64Array(rows.length), e = new Float64Array(rows.length), sinI = new Float64Array(rows.length);
  const badLines: string[] = [];
  const num = (s: string | undefined): number => (s === undefined || s.trim() === '' ? NaN : Number(s));
  let line = 1;
  let k = 0;
  for (const raw of lines.slice(1)) {
    line++;
    if (raw.trim() === '') continue;
    const f = raw.split(',');
    aAu[k] = num(f[ca]); e[k] = num(f[ce]); sinI[k] = num(f[cs]);
    if (!(aAu[k] === aAu[k] && e[k] === e[k] && sinI[k] === sinI[k])) badLines.push(`${path}:${line}: ${raw}`);
    k++;
  }
  return { aAu, e, sinI, badLines };
}

/**
 * The rows with distinct (a, e, sin i), first occurrence kept, in file order: the table lists
 * a body once per SDSS detection, and repeats of one body would link at any cutoff.
 */
export function distinctBodies(p: ProperElements): ProperElements {
  const seen = new Set<string>();
  const keep: number[] = [];
  for (let k = 0; k < p.aAu.length; k++) {
    const key = `${p.aAu[k]},${p.e[k]},${p.sinI[k]}`;
    if (seen.has(key)) continue;
    seen.add(key);
    keep.push(k);
  }
  const take = (c: Float64Array): Float64Array => Float64Array.from(keep, (k) => c[k]);
  return { aAu: take(p.aAu), e: take(p.e), sinI: take(p.sinI), badLines: p.badLines };
}
