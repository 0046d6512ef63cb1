/** The one-line message of an unreadable input, with the option that can fix it named. */
import type { UnreadableInputError } from '../io/errors.js';
import { INPUT_FORMATS } from './optionParsers.js';

export function inputErrorLine(err: UnreadableInputError): string {
  if (err.remedy === 'format') return `${err.message} (option --input-format: ${INPUT_FORMATS.join(', ')})`;
  if (err.remedy === 'columns') return `${err.message} (map headers with --columns field=header,…)`;
  return err.message;
}
