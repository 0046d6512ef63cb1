/**
 * Which CSV/TSV header names carry which orbit field. Names are matched case-insensitively,
 * with two exceptions where the trade's symbols differ only by case (common practice):
 * - `Omega` / `omega` (node / argument of perihelion): a header whose lowercase form is
 *   `omega` is the node when its first letter is uppercase (`Omega`, `OMEGA`) and the
 *   argument of perihelion when lowercase (`omega`). Unambiguous alternatives:
 *   `om`/`node`/`raan` = node, `w`/`peri`/`argp` = peri.
 * - `q` / `Q` (perihelion / aphelion distance): only a lowercase `q` is the perihelion
 *   distance; `Q` is the aphelion distance, which no orbit field takes.
 *
 * Designation: the first header present in the order designation > desig > pdes >
 * full_name > name. A designation column (`designation`, `desig`, `pdes`: a primary
 * designation, '1' for Ceres, '2019 EU5', '1P') wins over a name column (`full_name`, which
 * writes number, name and provisional designation together, '1 Ceres (A801 AA)'; `name`, a
 * proper name alone). A name column that is not the designation is still read: `name` fills
 * OrbitRow.name, and `full_name` (field `fullName`) gives the name and the number where the
 * designation column does not (./csvRecord.ts).
 *
 * An explicit mapping (`--columns field=header,…` → `{ designation: 'objname' }`) wins over
 * the names recognised here; a mapped header that the file does not have is fatal.
 */

/** Orbit fields a CSV column can fill. */
export type CsvField =
  | 'designation' | 'name' | 'fullName' | 'epoch' | 'epochMjd' | 'a' | 'q' | 'e' | 'i' | 'node' | 'peri'
  | 'M' | 'n' | 'tp' | 'H' | 'G' | 'U' | 'nObs' | 'nOpp' | 'arcDays' | 'firstObs' | 'lastObs' | 'rms';

/** Explicit mapping from orbit field to header name, as given by the user. */
export type ColumnMapping = Partial<Record<CsvField, string>>;

/** Column index of each orbit field in a header; -1 where absent. */
export type ColumnIndex = Record<CsvField, number>;

/** Recognised names (lowercase), in order of preference within a field. */
const NAMES: Readonly<Record<CsvField, readonly string[]>> = {
  designation: ['designation', 'desig', 'pdes', 'full_name', 'name'],
  name: ['name'],
  fullName: ['full_name'],
  epoch: ['epoch', 'epoch_jd', 'epoch_tt', 'epoch_cal'],
  epochMjd: ['epoch_mjd', 'mjd'],
  a: ['a', 'a_au', 'semimajor_axis'],
  q: ['q', 'q_au', 'perihelion_distance'],
  e: ['e', 'ecc', 'eccentricity'],
  i: ['i', 'incl', 'inc', 'inclination'],
  node: ['om', 'node', 'raan', 'long_node'], // and 'Omega', see caseSensitiveField
  peri: ['w', 'peri', 'argp', 'arg_peri', 'argperi'], // and 'omega'
  M: ['m', 'ma', 'mean_anomaly'],
  n: ['n', 'mean_motion'],
  tp: ['tp', 'tp_jd', 'tp_cal'],
  H: ['h'],
  G: ['g'],
  U: ['u', 'condition_code'],
  nObs: ['n_obs', 'n_obs_used', 'nobs'],
  nOpp: ['n_opp', 'nopp'],
  arcDays: ['data_arc', 'arc'],
  firstObs: ['first_obs'],
  lastObs: ['last_obs'],
  rms: ['rms'],
};

export const CSV_FIELDS = Object.keys(NAMES) as CsvField[];

/** RangeError for a mapping that names an orbit field not in CSV_FIELDS (caller misuse). */
export function checkColumnMapping(mapping: ColumnMapping): void {
  for (const field of Object.keys(mapping)) {
    if (!(CSV_FIELDS as string[]).includes(field)) {
      throw new RangeError(`unknown orbit field '${field}' in the column mapping; known: ${CSV_FIELDS.join(', ')}`);
    }
  }
}

/**
 * The field of a header told apart by case (see the file comment): `omega` in any case →
 * node or peri by its first letter; `q` → q; `Q` → null (aphelion distance: no field);
 * undefined for every other header (matched case-insensitively).
 */
function caseSensitiveField(header: string): CsvField | null | undefined {
  if (header === 'q') return 'q';
  if (header === 'Q') return null;
  if (header.toLowerCase() !== 'omega') return undefined;
  return header[0] === 'O' ? 'node' : 'peri';
}

/**
 * Index of every field in `headers` (trimmed header names), with `mapping` applied first.
 * Returns the index, or a list of mapped headers the file lacks (for a fatal error).
 */
export function mapColumns(headers: readonly string[], mapping: ColumnMapping = {}): { index: ColumnIndex; missingMapped: string[] } {
  const index = Object.fromEntries(CSV_FIELDS.map((f) => [f, -1])) as ColumnIndex;
  const used = new Set<number>();
  const missingMapped: string[] = [];
  for (const [field, header] of Object.entries(mapping) as [CsvField, string][]) {
    let k = headers.indexOf(header);
    if (k < 0) k = headers.findIndex((h) => h.toLowerCase() === header.toLowerCase());
    if (k < 0) missingMapped.push(`${field}=${header}`);
    else {
      index[field] = k;
      used.add(k);
    }
  }
  for (const field of CSV_FIELDS) {
    if (index[field] >= 0 || field in mapping) continue;
    const k = findHeader(headers, field, used);
    if (k >= 0) {
      index[field] = k;
      if (field !== 'name') used.add(k);
    }
  }
  // a name column chosen as the designation is not read a second time
  if (index.name === index.designation) index.name = -1;
  if (index.fullName === index.designation) index.fullName = -1;
  return { index, missingMapped };
}

function findHeader(headers: readonly string[], field: CsvField, used: Set<number>): number {
  for (const name of NAMES[field]) {
    for (let k = 0; k < headers.length; k++) {
      if (used.has(k)) continue;
      const h = headers[k];
      const byCase = caseSensitiveField(h);
      if (byCase === field || (byCase === undefined && h.toLowerCase() === name)) return k;
    }
  }
  for (let k = 0; k < headers.length; k++) if (!used.has(k) && caseSensitiveField(headers[k]) === field) return k;
  return -1;
}

/**
 * What the mapped header still lacks for an orbit: designation, e, i, node, peri, a time
 * (epoch or tp), a size (a, q or n) and a position in orbit (M or tp). Empty when enough.
 */
export function missingRequired(index: ColumnIndex): string[] {
  const has = (f: CsvField) => index[f] >= 0;
  const missing: string[] = [];
  for (const f of ['designation', 'e', 'i', 'node', 'peri'] as const) if (!has(f)) missing.push(f);
  if (!has('epoch') && !has('epochMjd') && !has('tp')) missing.push('epoch or tp');
  if (!has('a') && !has('q') && !has('n')) missing.push('a, q or n');
  if (!has('M') && !has('tp')) missing.push('M or tp');
  return missing;
}

/**
 * The mapping written as `field=header,field=header` (the `--columns` option's text), e.g.
 * `designation=objname,e=ecc`. RangeError for malformed pairs, unknown fields or a field
 * given twice (the CLI turns it into its own argument error).
 */
export function parseColumnMapping(text: string): ColumnMapping {
  const mapping: ColumnMapping = {};
  for (const pair of text.split(',')) {
    const m = /^\s*([A-Za-z]+)\s*=\s*(.*?)\s*$/.exec(pair);
    if (!m || m[2] === '') throw new RangeError(`column mapping '${pair.trim()}' is not field=header`);
    const field = m[1] as CsvField;
    if (field in mapping) throw new RangeError(`column mapping gives '${field}' twice`);
    mapping[field] = m[2];
  }
  checkColumnMapping(mapping);
  return mapping;
}
