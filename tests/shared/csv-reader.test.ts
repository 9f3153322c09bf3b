/**
 * The CSV reader against RFC 4180 (IETF, "Common Format and MIME Type for Comma-Separated Values
 * Files", section 2: quoted fields may hold commas, line breaks and doubled quotes; CRLF ends a
 * record) and its round trip with the CSV writer.
 */
import { describe, expect, it } from 'vitest';
import { parseCsv } from '../../shared/csv/csv-reader';
import { csvText } from '../../shared/csv/csv-writer';

describe('parseCsv', () => {
  it('reads the RFC 4180 cases: quotes, doubled quotes, commas and line breaks in a field, CRLF', () => {
    const text = 'a,b,c\r\n"x, y","say ""hi""","two\r\nlines"\r\nlast,,end';
    expect(parseCsv(text)).toEqual([
      ['a', 'b', 'c'],
      ['x, y', 'say "hi"', 'two\r\nlines'],
      ['last', '', 'end'],
    ]);
  });

  it('drops a leading byte order mark and accepts LF line ends', () => {
    expect(parseCsv('\uFEFFlabel,W\nW12X26,26\n')).toEqual([
      ['label', 'W'],
      ['W12X26', '26'],
    ]);
  });

  it('keeps blank lines as rows so row numbers stay the file lines', () => {
    expect(parseCsv('h\n\nv\n')).toEqual([['h'], [''], ['v']]);
  });

  it('reads back what the writer wrote, cell for cell', () => {
    const cells = [
      ['name', 'note'],
      ['Deck, east', 'quote " inside'],
      ['multi\nline', 'plain'],
    ];
    expect(parseCsv(csvText(cells))).toEqual(cells);
  });
});
