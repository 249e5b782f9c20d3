import { notCsvReason, type UploadedCsv } from './csv-upload.js';

const upload = (buffer: Buffer, fields: Partial<UploadedCsv> = {}): UploadedCsv => ({
  originalname: 'plan.csv',
  mimetype: 'text/csv',
  size: buffer.length,
  buffer,
  ...fields,
});

describe('notCsvReason', () => {
  it.each(['text/csv', 'text/plain; charset=utf-8', 'application/vnd.ms-excel'])(
    'accepts UTF-8 text with a byte-order mark sent as %s',
    (mimetype) => {
      expect(notCsvReason(upload(Buffer.from('\uFEFFa,b\r\n1,\t2\r\n'), { mimetype }))).toBeNull();
    },
  );

  it('refuses a name that is not .csv and a type that is not text', () => {
    expect(notCsvReason(upload(Buffer.from('a'), { originalname: 'plan.xlsx' }))).toBe(
      '"plan.xlsx" is not a .csv file; save the sheet as CSV (UTF-8) and upload that.',
    );
    expect(notCsvReason(upload(Buffer.from('a'), { mimetype: 'image/png' }))).toBe(
      'The file was sent as image/png, not as CSV text (text/csv).',
    );
  });

  it('refuses NUL and other control bytes as binary', () => {
    const binary = 'The file holds binary data, not CSV text; save the sheet as CSV (UTF-8) and upload that.';
    expect(notCsvReason(upload(Buffer.from([0x61, 0x00, 0x62])))).toBe(binary);
    expect(notCsvReason(upload(Buffer.from([0x61, 0x1b, 0x62])))).toBe(binary);
  });

  it('refuses text that is not UTF-8', () => {
    expect(notCsvReason(upload(Buffer.from('café', 'latin1')))).toBe(
      'The file is not UTF-8 text; save the sheet as CSV (UTF-8) and upload that.',
    );
  });
});
