import { describe, expect, it } from 'vitest';
import { csvField, csvRecord } from '../../src/report/csvField.js';

// RFC 4180 §2, rules 5–7: quote fields with commas, quotes or line breaks; double inner quotes.
describe('CSV fields (RFC 4180)', () => {
  it('leaves plain fields alone', () => {
    expect(csvField('2019 EU5')).toBe('2019 EU5');
    expect(csvField(3.5)).toBe('3.5');
  });
  it('quotes commas, quotes and line breaks', () => {
    expect(csvField('a,b')).toBe('"a,b"');
    expect(csvField('say "hi"')).toBe('"say ""hi"""');
    expect(csvField('two\nlines')).toBe('"two\nlines"');
    expect(csvField('cr\r')).toBe('"cr\r"');
  });
  it('writes NaN as an empty field and joins records', () => {
    expect(csvRecord(['x', Number.NaN, 2])).toBe('x,,2');
  });
});
