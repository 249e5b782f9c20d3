import { definedFields } from './defined-fields.js';

class PatchBody {
  name?: string;
  pairGapS?: number;
  note?: string | null;
}

describe('definedFields', () => {
  it('drops declared fields the request left out and keeps nulls', () => {
    const body = Object.assign(new PatchBody(), { pairGapS: 12, note: null });
    expect(Object.keys(body)).toContain('name'); // the trap: an own property holding undefined
    expect(definedFields(body)).toEqual({ pairGapS: 12, note: null });
  });
});
