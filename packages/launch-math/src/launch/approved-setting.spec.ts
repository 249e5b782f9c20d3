import { knots, pounds } from '../units/units.js';
import { approvedSetting, type ApprovedSettingTable } from './approved-setting.js';

// The row read is the next weight at or above the agreed weight, never interpolated: common practice, no source.
// The table itself is invented.
const table: ApprovedSettingTable = {
  recommendedExcess: knots(12),
  rows: [
    { upToWeight: pounds(34_000), setting: 11 },
    { upToWeight: pounds(40_000), setting: 14 },
    { upToWeight: pounds(46_000), setting: 18 },
  ],
};

describe('the approved setting for an agreed weight', () => {
  it('is the first row when the weight is at or below its bound', () => {
    expect(approvedSetting(table, pounds(20_000))).toEqual({ kind: 'setting', setting: 11, upToWeight: 34_000 });
    expect(approvedSetting(table, pounds(34_000))).toEqual({ kind: 'setting', setting: 11, upToWeight: 34_000 });
  });

  it('is the row of the next weight above when the weight falls between rows', () => {
    expect(approvedSetting(table, pounds(34_001))).toEqual({ kind: 'setting', setting: 14, upToWeight: 40_000 });
    expect(approvedSetting(table, pounds(45_999))).toEqual({ kind: 'setting', setting: 18, upToWeight: 46_000 });
  });

  it('is no setting above the last row, naming the highest weight the table covers', () => {
    expect(approvedSetting(table, pounds(46_001))).toEqual({ kind: 'above_table', highest: 46_000 });
  });

  it('is no setting at all from a table without rows', () => {
    expect(approvedSetting({ ...table, rows: [] }, pounds(30_000))).toEqual({ kind: 'above_table', highest: 0 });
  });

  it('refuses a weight that is not positive', () => {
    expect(() => approvedSetting(table, pounds(0))).toThrow(/Gross weight/);
  });
});
