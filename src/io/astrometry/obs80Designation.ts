/**
 * The designation columns of an 80-column record (1–12), read into a readable designation
 * through the project's one packed-designation code (../packedDesignation.ts and its parts).
 * Published format description, checked: minor planets 1–5 packed number, 6–12 packed
 * provisional or temporary designation; comets 1–4 periodic number, 5 orbit type (P, C, D,
 * X, I, A), 6–12 packed provisional designation. A temporary designation is the observer's
 * own, alphanumeric, up to seven characters: kept as written and marked temporary.
 * Natural satellites (planet letter in column 1, 'S' in column 5) are not handled.
 */
import { unpackComet } from '../packedComet.js';
import { unpackNumber } from '../packedNumber.js';
import { unpackProvisional } from '../packedProvisional.js';

export interface Obs80Designation {
  designation: string;
  packed: string; // columns 1–12 trimmed
  number: number; // NaN when none
  provisional: string; // see AstrometryObservation.provisional (./types.ts)
  temporary: boolean;
}

const COMET_TYPES = 'PCDXIA';

function isDigitsOrBlank(text: string): boolean {
  return /^[ 0-9]*$/.test(text);
}

function cometDesignation(line: string, packed: string): Obs80Designation | string {
  const type = line[4];
  const numberText = line.slice(0, 4).trim();
  const prov = line.slice(5, 12).trim();
  const provisional = prov === '' ? '' : unpackComet(type + prov);
  if (prov !== '' && provisional === '') return `comet provisional designation '${type}${prov}' in no packed form (columns 5–12)`;
  if (numberText === '') return { designation: provisional, packed, number: NaN, provisional: '', temporary: false };
  const number = Number(numberText);
  if (!Number.isInteger(number) || number < 1) return `comet number '${numberText}' is not a periodic comet number (columns 1–4)`;
  return { designation: `${number}${type}`, packed, number, provisional, temporary: false };
}

/** Designation of `line` (columns 1–12), or a one-line reason when it is in no known form. */
export function parseObs80Designation(line: string): Obs80Designation | string {
  const packed = line.slice(0, 12).trim();
  if (packed === '') return 'blank designation (columns 1–12)';
  const numberField = line.slice(0, 5);
  const prov = line.slice(5, 12).trim();
  if (COMET_TYPES.includes(line[4]) && isDigitsOrBlank(line.slice(0, 4)) && (prov !== '' || numberField.trim().length > 1)) {
    return cometDesignation(line, packed);
  }
  if (/^[JSUN]\d{3}S$/.test(numberField)) return `natural satellite designation '${numberField}' is not handled (columns 1–5)`;
  if (numberField.trim() !== '') {
    const number = unpackNumber(numberField);
    if (Number.isNaN(number)) return `'${numberField}' is not a packed minor-planet number (columns 1–5)`;
    const provisional = prov === '' ? '' : unpackProvisional(prov) || prov;
    return { designation: `(${number})`, packed, number, provisional, temporary: false };
  }
  const provisional = unpackProvisional(prov);
  if (provisional !== '') return { designation: provisional, packed, number: NaN, provisional, temporary: false };
  if (!/^[A-Za-z0-9]{1,7}$/.test(prov)) return `designation '${prov}' is neither a packed provisional designation nor an alphanumeric temporary one (columns 6–12)`;
  return { designation: prov, packed, number: NaN, provisional: '', temporary: true };
}
