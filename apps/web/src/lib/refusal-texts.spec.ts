import { REFUSAL_CODE_FAMILIES, type RefusalCode, type RefusalFamily } from '@catline/contracts';
import { describe, expect, it } from 'vitest';
import { refusalText } from './refusal-texts.js';

const said = 'The server’s own sentence.';
const textOf = (code: string, action = 'Moving 104') => refusalText(action, { code, message: said });
const changedFirst = /changed first/;

/** Per family: the codes whose notice says something changed first, and titles written out for some codes. */
const FAMILIES: Record<RefusalFamily, { changedFirst: RefusalCode[]; titles: Partial<Record<RefusalCode, string>> }> = {
  lineup: {
    changedFirst: ['stale_basis'],
    titles: {
      stale_basis: 'Moving 104 refused: the lineup changed first',
      weight_not_agreed: 'Moving 104 refused: gross weight not agreed',
      over_max_gross_weight: 'Moving 104 refused: over the type’s maximum catapult weight',
      cycle_not_executing: 'Moving 104 refused: the cycle is not executing',
      not_current_aircraft: 'Moving 104 refused: not the aircraft on the catapult',
    },
  },
  cycles: {
    changedFirst: [],
    titles: { wrong_state: 'Moving 104 refused: not possible in the cycle’s present state' },
  },
  imports: {
    changedFirst: ['import_out_of_date'],
    titles: {
      import_out_of_date: 'Moving 104 refused: the cycle changed first',
      not_csv: 'Moving 104 refused: not a CSV file',
    },
  },
  auth: { changedFirst: [], titles: { forbidden_role: 'Moving 104 refused: not allowed for your role' } },
  users: {
    changedFirst: [],
    titles: { cannot_invite: 'Moving 104 refused: the person has already chosen a password' },
  },
  passwords: { changedFirst: [], titles: { weak_password: 'Moving 104 refused: the password is too easy to guess' } },
  passwordLinks: { changedFirst: [], titles: { link_invalid: 'Moving 104 refused: the link is not valid' } },
  ships: { changedFirst: [], titles: { spot_in_use: 'Moving 104 refused: the spot is in use' } },
  aircraft: { changedFirst: [], titles: { side_number_taken: 'Moving 104 refused: the side number is taken' } },
  aircraftTypes: {
    changedFirst: [],
    titles: { aircraft_type_in_use: 'Moving 104 refused: the aircraft type is in use' },
  },
  squadrons: { changedFirst: [], titles: { code_taken: 'Moving 104 refused: the squadron code is taken' } },
  reports: { changedFirst: [], titles: { invalid_date_range: 'Moving 104 refused: the dates are not a valid range' } },
  gateway: { changedFirst: [], titles: { origin_refused: 'Moving 104 refused: this page may not connect to Catline' } },
  request: { changedFirst: [], titles: { invalid_id: 'Moving 104 refused: not a valid id' } },
  generic: {
    changedFirst: [],
    titles: {
      validation_failed: 'Moving 104 refused: some values are not valid',
      database_busy: 'Moving 104 did not go through: the database was busy',
      internal_error: 'Moving 104 did not go through: a server error',
    },
  },
};

describe.each(Object.keys(FAMILIES) as RefusalFamily[])('refusal notices of the %s family', (family) => {
  const codes = REFUSAL_CODE_FAMILIES[family];
  const expected = FAMILIES[family];

  it('say something changed first, and that the screen moved on, only for a stale basis', () => {
    for (const code of codes) {
      const text = textOf(code);
      if (expected.changedFirst.includes(code)) {
        expect(text.title, code).toMatch(changedFirst);
        expect(text.message, code).toMatch(new RegExp(`^${said} \\S`));
      } else {
        expect(text.title, code).not.toMatch(changedFirst);
        expect(text.message, code).toBe(said);
      }
    }
  });

  it('give each code its own title, naming the action', () => {
    const titles = codes.map((code) => textOf(code).title);
    expect(new Set(titles).size).toBe(codes.length);
    for (const title of titles) expect(title).toMatch(/^Moving 104 (refused|did not go through): \S/);
  });

  it('read as written for its codes', () => {
    for (const [code, title] of Object.entries(expected.titles)) expect(textOf(code).title).toBe(title);
  });
});

describe('a refusal without a known code', () => {
  it('says only that the action did not go through, with the sentence it has', () => {
    expect(refusalText('Starting', { code: 'network', message: 'Cannot reach the Catline server.' })).toEqual({
      title: 'Starting did not go through',
      message: 'Cannot reach the Catline server.',
    });
  });
});
