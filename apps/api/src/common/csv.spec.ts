import { LAUNCH_CAUTION } from '@catline/contracts';
import { CAUTION_LINE, guardText, toCsv } from './csv.js';

const BOM = '\uFEFF';
const OPENING = `${BOM}${CAUTION_LINE}\r\n`;

describe('toCsv', () => {
  it('opens with the launch caution as one # line that a spreadsheet shows in one cell', () => {
    expect(CAUTION_LINE).toBe(`# ${LAUNCH_CAUTION}`);
    expect(LAUNCH_CAUTION).not.toMatch(/[,"\r\n]/);
  });

  it('writes a header and rows with CRLF line ends after a byte-order mark', () => {
    // RFC 4180 §2: records end with CRLF.
    expect(toCsv(['side', 'weight'], [['C21', 44_000]])).toBe(`${OPENING}side,weight\r\nC21,44000\r\n`);
  });

  it('quotes commas, quotes and line breaks inside a cell', () => {
    // RFC 4180 §2.6 and §2.7: such fields are enclosed in quotes, inner quotes doubled.
    expect(toCsv(['summary'], [['D33 moved to cat 2, place 3'], ['said "go"'], ['two\nlines']])).toBe(
      `${OPENING}summary\r\n"D33 moved to cat 2, place 3"\r\n"said ""go"""\r\n"two\nlines"\r\n`,
    );
  });

  it('writes booleans as true/false and null as an empty cell', () => {
    expect(
      toCsv(
        ['spare', 'pilot', 'delta'],
        [
          [true, null, -2.5],
          [false, 'Kit Marrowby', 0],
        ],
      ),
    ).toBe(`${OPENING}spare,pilot,delta\r\ntrue,,-2.5\r\nfalse,Kit Marrowby,0\r\n`);
  });
});

describe('guardText', () => {
  it('defuses text a spreadsheet would run as a formula', () => {
    // OWASP "CSV Injection": cells starting with = + - @ tab or carriage return.
    expect(['=1+1', '+1', '-1', '@SUM(A1)', '\tx', '\rx'].map(guardText)).toEqual([
      "'=1+1",
      "'+1",
      "'-1",
      "'@SUM(A1)",
      "'\tx",
      "'\rx",
    ]);
  });

  it('leaves other text alone', () => {
    expect(['Strike training', 'C21', 'a=b'].map(guardText)).toEqual(['Strike training', 'C21', 'a=b']);
  });
});
