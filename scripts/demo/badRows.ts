/**
 * Malformed lines planted in the asteroid file to show the reject accounting: each is a
 * valid line with one field spoiled (or plain garbage). Columns are those of the published
 * column layout of the one-line minor-planet orbit export format (1-based, inclusive, noted
 * beside each 0-based half-open pair below).
 */

export type BadRowKind =
  | 'truncated' | 'e-not-numeric' | 'e-negative' | 'inclination-200'
  | 'bad-epoch' | 'garbage' | 'a-not-numeric' | 'mean-anomaly-not-numeric';

/** Every kind, in the order the demo plants them, with the reason a reader should give. */
export const BAD_ROWS: readonly { kind: BadRowKind; reason: string }[] = [
  { kind: 'truncated', reason: 'line ends at column 58, before the inclination, e and a' },
  { kind: 'e-not-numeric', reason: 'eccentricity (columns 71-79) is not a number' },
  { kind: 'e-negative', reason: 'eccentricity (columns 71-79) is negative' },
  { kind: 'inclination-200', reason: 'inclination (columns 60-68) is 200 deg, outside 0-180' },
  { kind: 'bad-epoch', reason: 'packed epoch (columns 21-25) has month code Z, which does not exist' },
  { kind: 'garbage', reason: 'free text where an orbit line should be' },
  { kind: 'a-not-numeric', reason: 'semimajor axis (columns 93-103) is not a number' },
  { kind: 'mean-anomaly-not-numeric', reason: 'mean anomaly (columns 27-35) is not a number' },
];

const EPOCH: readonly [number, number] = [20, 25]; // 21–25
const MEAN_ANOMALY: readonly [number, number] = [26, 35]; // 27–35
const INCLINATION: readonly [number, number] = [59, 68]; // 60–68
const ECCENTRICITY: readonly [number, number] = [70, 79]; // 71–79
const SEMIMAJOR_AXIS: readonly [number, number] = [92, 103]; // 93–103

/** The garbage line: the project's own words, not an orbit and not a header separator. */
export const GARBAGE_LINE = '?? export interrupted here: the remainder of this block was lost in transfer ??';

function replaceField(line: string, [start, end]: readonly [number, number], text: string): string {
  if (text.length !== end - start) throw new RangeError(`replaceField: '${text}' does not fill columns ${start + 1}-${end}`);
  return line.slice(0, start) + text + line.slice(end);
}

/** The spoiled version of a valid orbit-export line. */
export function spoilLine(kind: BadRowKind, line: string): string {
  switch (kind) {
    case 'truncated': return line.slice(0, 58);
    case 'e-not-numeric': return replaceField(line, ECCENTRICITY, '0.1x3o56 ');
    case 'e-negative': return replaceField(line, ECCENTRICITY, '-0.123456');
    case 'inclination-200': return replaceField(line, INCLINATION, '200.00000');
    case 'bad-epoch': return replaceField(line, EPOCH, 'K32Z9');
    case 'garbage': return GARBAGE_LINE;
    case 'a-not-numeric': return replaceField(line, SEMIMAJOR_AXIS, '  2.7x55526');
    case 'mean-anomaly-not-numeric': return replaceField(line, MEAN_ANOMALY, '  ???.???');
  }
}
