import 'reflect-metadata';
import { STORES_ITEM_NAME_MAX_LENGTH } from '@catline/contracts';
import { plainToInstance } from 'class-transformer';
import { validate } from 'class-validator';
import { StoresItemNameField } from './stores-item-name.field.js';

class CatalogueItem {
  @StoresItemNameField('each stores item needs a name', { example: 'Practice bomb' })
  name: string;
}

/** What a person reads for a name, as the global pipe checks it (after the trim). */
async function nameCheck(name: unknown) {
  const item = plainToInstance(CatalogueItem, { name });
  const errors = await validate(item);
  return { name: item.name, messages: errors.flatMap((error) => Object.values(error.constraints ?? {})) };
}

describe('StoresItemNameField, the stores item name of the catalogue and of a slot’s load', () => {
  it('says the request’s own words for a blank name', async () => {
    expect((await nameCheck('   ')).messages).toEqual(['each stores item needs a name']);
  });

  it('trims the name and takes it up to the shared length, and refuses one longer or not text', async () => {
    const longest = 'x'.repeat(STORES_ITEM_NAME_MAX_LENGTH);
    expect(await nameCheck(` ${longest} `)).toEqual({ name: longest, messages: [] });
    expect((await nameCheck(`${longest}x`)).messages).toHaveLength(1);
    expect((await nameCheck(12)).messages).not.toEqual([]);
  });

  it('refuses control characters in a name', async () => {
    expect((await nameCheck('Practice\u0007bomb')).messages).toHaveLength(1);
  });
});
