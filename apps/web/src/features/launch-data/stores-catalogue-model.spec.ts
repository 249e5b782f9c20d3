import { describe, expect, it } from 'vitest';
import { parseStoresCatalogue, toDraftStores } from './stores-catalogue-model.js';

describe('parseStoresCatalogue', () => {
  it('hands on the items as typed, trimmed, with whole-pound weights', () => {
    expect(
      parseStoresCatalogue([
        { name: ' Rocket pod ', weightEachLb: '520' },
        { name: 'Drop tank', weightEachLb: '1240' },
      ]),
    ).toEqual({
      items: [
        { name: 'Rocket pod', weightEachLb: 520 },
        { name: 'Drop tank', weightEachLb: 1_240 },
      ],
    });
  });

  it('accepts an empty catalogue', () => {
    expect(parseStoresCatalogue([])).toEqual({ items: [] });
  });

  it.each([
    ['an empty name', [{ name: ' ', weightEachLb: '10' }], 'Item 1: enter a name of up to 60 characters.'],
    [
      'a name given twice',
      [
        { name: 'Pod', weightEachLb: '10' },
        { name: 'POD', weightEachLb: '12' },
      ],
      'Item 2: POD is already in the catalogue.',
    ],
    [
      'no weight',
      [{ name: 'Pod', weightEachLb: '' }],
      'Item 1: enter the weight of one Pod in whole pounds, 1 to 20000.',
    ],
    [
      'a fractional weight',
      [{ name: 'Pod', weightEachLb: '10.5' }],
      'Item 1: enter the weight of one Pod in whole pounds, 1 to 20000.',
    ],
    [
      'a weight of zero',
      [{ name: 'Pod', weightEachLb: '0' }],
      'Item 1: enter the weight of one Pod in whole pounds, 1 to 20000.',
    ],
  ])('refuses %s', (_case, drafts, problem) => {
    expect(parseStoresCatalogue(drafts)).toEqual({ problem });
  });

  it('turns the held catalogue back into text to edit', () => {
    expect(toDraftStores([{ name: 'Pod', weightEachLb: 300 }])).toEqual([{ name: 'Pod', weightEachLb: '300' }]);
  });
});
