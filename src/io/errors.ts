/**
 * Error classes of the io layer beyond the row-level InputError of ./types.ts.
 * PackedFormError: a packed or readable designation/date that no published form matches
 * (bad data; a line parser turns it into an InputError with file, line and column).
 * UnreadableInputError: a whole input cannot be read (missing, a directory, unreadable,
 * binary, or a header that names no usable column); fatal for that file, exit code 1.
 */

/** A designation or packed date that matches no known form. `reason` is one line. */
export class PackedFormError extends Error {
  readonly reason: string;
  readonly text: string;
  constructor(reason: string, text: string) {
    super(`${reason}: '${text}'`);
    this.name = 'PackedFormError';
    this.reason = reason;
    this.text = text;
  }
}

/**
 * What the caller could give to read a file that failed: the format named ('format', when
 * the content fits no format) or a column mapping ('columns', when a CSV header lacks
 * orbit columns); '' when neither helps. The CLI turns it into the option to use.
 */
export type InputRemedy = '' | 'format' | 'columns';

/** A whole input file cannot be read. Message: `FILE: REASON`, one line. */
export class UnreadableInputError extends Error {
  readonly file: string;
  readonly reason: string;
  readonly remedy: InputRemedy;
  constructor(file: string, reason: string, remedy: InputRemedy = '') {
    super(`${file}: ${reason}`);
    this.name = 'UnreadableInputError';
    this.file = file;
    this.reason = reason;
    this.remedy = remedy;
  }
}
