import { describe, expect, it } from 'vitest';
import { parseSettingTables, toDraftSettingRows, type DraftSettingRow } from './setting-tables-model.js';

const row = (extra: Partial<DraftSettingRow> = {}): DraftSettingRow => ({
  catapultNumber: '1',
  configuration: 'clean',
  recommendedExcessKt: '12',
  upToLb: '36000',
  setting: '7',
  ...extra,
});

describe('parseSettingTables', () => {
  it('gathers the rows into one table per catapult and configuration', () => {
    const parsed = parseSettingTables([
      row(),
      row({ configuration: ' Stores ', setting: '8' }),
      row({ upToLb: '38000', setting: '9' }),
    ]);
    expect(parsed).toEqual({
      tables: [
        {
          catapultNumber: 1,
          configuration: 'clean',
          recommendedExcessKt: 12,
          rows: [
            { upToLb: 36_000, setting: 7 },
            { upToLb: 38_000, setting: 9 },
          ],
        },
        { catapultNumber: 1, configuration: 'stores', recommendedExcessKt: 12, rows: [{ upToLb: 36_000, setting: 8 }] },
      ],
    });
  });

  it('reads back what it was given', () => {
    const parsed = parseSettingTables([row(), row({ upToLb: '38000', setting: '9' })]);
    expect('tables' in parsed && toDraftSettingRows(parsed.tables)).toEqual([
      row(),
      row({ upToLb: '38000', setting: '9' }),
    ]);
  });

  it.each([
    ['no catapult', [row({ catapultNumber: '' })], "Row 1: enter the catapult's number."],
    [
      'an unknown configuration',
      [row({ configuration: 'ferry' })],
      'Row 1: the configuration is one of clean, stores.',
    ],
    ['no excess', [row({ recommendedExcessKt: '' })], 'Row 1: enter the recommended excess in knots, 0 to 100.'],
    ['a fractional weight', [row({ upToLb: '36000.5' })], "Row 1: enter the row's top weight in whole pounds."],
    ['a fractional setting', [row({ setting: '7.5' })], 'Row 1: enter the setting as a whole number.'],
    [
      'two excesses in one table',
      [row(), row({ upToLb: '38000', recommendedExcessKt: '10' })],
      'Row 2: cat 1 clean already recommends 12 kt.',
    ],
    [
      'weights that do not rise',
      [row(), row({ upToLb: '36000' })],
      'Row 2: the weight must rise above 36000 lb within cat 1 clean.',
    ],
  ])('names the first problem: %s', (_case, drafts, problem) => {
    expect(parseSettingTables(drafts)).toEqual({ problem });
  });
});
