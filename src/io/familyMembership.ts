/**
 * A user's family membership list: a CSV/TSV table with a header naming a designation column
 * (`designation` > `desig` > `pdes` > `number` > `full_name` > `name`, case-insensitive, the
 * same precedence as the orbit tables) and a family column (`family` > `family_name` >
 * `family_id`). Delimiter sniffed from the header (csvDelimiter.ts); fields may be quoted as in
 * RFC 4180 within one line. Every data line ends up a member or a reject (InputError with file
 * and line); blank lines are skipped. A designation listed twice keeps its first line; the
 * second is rejected, naming the first. A header without both columns, or an unreadable
 * file, is an UnreadableInputError.
 */
import { sniffDelimiter } from './csvDelimiter.js';
import { UnreadableInputError } from './errors.js';
import { forEachLine } from './lineSource.js';
import { InputError } from './types.js';

export interface FamilyMember {
  designation: string; // as written (trimmed); matched to catalogue bodies later
  family: string; // the family label as written (trimmed)
  line: number;
}

export interface FamilyMembership {
  file: string;
  members: FamilyMember[];
  rejects: InputError[];
  dataLines: number; // non-blank lines after the header = members + rejects
}

const DESIGNATION_HEADERS = ['designation', 'desig', 'pdes', 'number', 'full_name', 'name'];
const FAMILY_HEADERS = ['family', 'family_name', 'family_id'];

/** Fields of one line; throws a reason string on an unterminated quote. */
export function splitDelimited(line: string, delimiter: string): string[] {
  const fields: string[] = [];
  let field = '';
  let quoted = false;
  for (let k = 0; k < line.length; k++) {
    const ch = line[k];
    if (quoted) {
      if (ch === '"') {
        if (line[k + 1] === '"') { field += '"'; k++; } else quoted = false;
      } else field += ch;
    } else if (ch === '"' && field.trim() === '') { quoted = true; field = ''; }
    else if (ch === delimiter) { fields.push(field); field = ''; }
    else field += ch;
  }
  if (quoted) throw new Error('unterminated quoted field');
  fields.push(field);
  return fields;
}

function columnOf(header: readonly string[], names: readonly string[]): number {
  const lower = header.map((h) => h.trim().toLowerCase());
  for (const n of names) {
    const k = lower.indexOf(n);
    if (k >= 0) return k;
  }
  return -1;
}

/** Reads a membership list ('-' = stdin). */
export async function readFamilyMembership(path: string): Promise<FamilyMembership> {
  const out: FamilyMembership = { file: path, members: [], rejects: [], dataLines: 0 };
  let header: string[] | null = null;
  let delimiter = ',';
  let dCol = -1, fCol = -1;
  const firstLine = new Map<string, FamilyMember>();
  const reject = (line: number, reason: string, text: string): void => { out.rejects.push(new InputError(path, line, 0, reason, text)); };
  await forEachLine(path, (text, lineNo) => {
    if (text.trim() === '') return;
    if (header === null) {
      delimiter = sniffDelimiter(text);
      header = splitDelimited(text, delimiter);
      dCol = columnOf(header, DESIGNATION_HEADERS);
      fCol = columnOf(header, FAMILY_HEADERS);
      const missing = [dCol < 0 ? `a designation column (${DESIGNATION_HEADERS.join(', ')})` : '', fCol < 0 ? `a family column (${FAMILY_HEADERS.join(', ')})` : ''].filter(Boolean);
      if (missing.length > 0) throw new UnreadableInputError(path, `line ${lineNo}: the header has no ${missing.join(' and no ')}`);
      return;
    }
    out.dataLines++;
    let fields: string[];
    try {
      fields = splitDelimited(text, delimiter);
    } catch (err) {
      reject(lineNo, (err as Error).message, text);
      return;
    }
    if (fields.length !== header.length) {
      reject(lineNo, `${fields.length} fields where the header has ${header.length}`, text);
      return;
    }
    const designation = fields[dCol].trim(), family = fields[fCol].trim();
    if (designation === '') { reject(lineNo, 'designation is empty', text); return; }
    if (family === '') { reject(lineNo, 'family is empty', text); return; }
    const first = firstLine.get(designation);
    if (first !== undefined) {
      reject(lineNo, first.family === family
        ? `designation ${designation} listed again (first on line ${first.line})`
        : `designation ${designation} already in family ${first.family} (line ${first.line})`, text);
      return;
    }
    const m = { designation, family, line: lineNo };
    firstLine.set(designation, m);
    out.members.push(m);
  });
  if (header === null) throw new UnreadableInputError(path, 'empty: no header line');
  return out;
}
