import { toCsv } from '../common/csv.js';
import { type CsvLayout, readCsvTable } from './csv-table.js';

type Column = 'side_number' | 'stores';
const LAYOUT: CsvLayout<Column> = { columns: ['side_number', 'stores'], maxRows: 10, rowNoun: 'aircraft' };

describe('readCsvTable on what toCsv writes', () => {
  it('reads back cells with commas, quotes and line breaks, on the line where each record starts', () => {
    // Line 1 is the caution, a # line the reader skips; line 2 the header.
    // RFC 4180 §2.6 and §2.7: such fields are quoted, inner quotes doubled; the reader undoes both.
    const text = toCsv(LAYOUT.columns, [
      ['C21', '2 tanks, 4 bombs'],
      ['C22', 'pod "A"'],
      ['C23', 'two\nlines'],
      ['C24', 'none'],
    ]);
    expect(readCsvTable(text, LAYOUT)).toEqual({
      ok: true,
      problems: [],
      records: [
        { line: 3, cells: { side_number: 'C21', stores: '2 tanks, 4 bombs' } },
        { line: 4, cells: { side_number: 'C22', stores: 'pod "A"' } },
        { line: 5, cells: { side_number: 'C23', stores: 'two\nlines' } },
        { line: 7, cells: { side_number: 'C24', stores: 'none' } },
      ],
    });
  });

  it('reads a cell a spreadsheet would run as a formula as the defused text that was written', () => {
    // OWASP "CSV Injection": the writer prefixes an apostrophe; nothing strips it on the way back.
    const text = toCsv(LAYOUT.columns, [['C21', '=HYPERLINK("http://127.0.0.1")']]);
    expect(text).toContain(`"'=HYPERLINK(""http://127.0.0.1"")"`);
    expect(readCsvTable(text, LAYOUT)).toMatchObject({
      ok: true,
      records: [{ cells: { stores: `'=HYPERLINK("http://127.0.0.1")` } }],
    });
  });

  it('skips # note lines anywhere but keeps a # inside a line, and counts the header on its own line', () => {
    const text = '# filled in on deck\nside_number,stores\nC21,pod #2\n# C22 is down\nC23,none\n';
    expect(readCsvTable(text, LAYOUT)).toEqual({
      ok: true,
      problems: [],
      records: [
        { line: 3, cells: { side_number: 'C21', stores: 'pod #2' } },
        { line: 5, cells: { side_number: 'C23', stores: 'none' } },
      ],
    });
    expect(readCsvTable('# note\nside_number,tanks\nC21,2\n', LAYOUT)).toMatchObject({
      ok: false,
      problems: [
        { row: 2, value: 'tanks' },
        { row: 2, column: 'stores' },
      ],
    });
  });
});
