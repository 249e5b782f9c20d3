import { expect, test } from '@playwright/test';
import type { ShipView } from '@catline/contracts';
import { axeViolations } from './support/axe.js';
import { apiAs } from './support/demo-api.js';
import { expectNoSidewaysOverflow, openAs } from './support/screens.js';

test('the admin changes a taxi time on a 1024×768 tablet, is told beside the spot what the server refuses, and saves', async ({
  browser,
}) => {
  const api = await apiAs('admin');
  const before = (await (await api.get('/api/ships/1')).json()) as ShipView;
  const putBack = async () => {
    const { deckSpots, deckLayout } = before;
    expect((await api.put('/api/ships/1/deck-layout', { data: { deckSpots, ...deckLayout } })).status()).toBe(200);
  };
  try {
    const admin = await openAs(browser, 'admin', '/fleet', { width: 1024, height: 768 });
    await admin.getByRole('tab', { name: 'Deck layout' }).click();
    const bow = admin.getByRole('region', { name: 'Deck area Bow' });
    const bow1ToCat1 = bow.getByLabel('Taxi from bow-1 to catapult 1, seconds');
    await expect(bow1ToCat1).toHaveValue('70');
    await expectNoSidewaysOverflow(admin);
    expect(await axeViolations(admin)).toEqual([]);

    await bow1ToCat1.fill('-5');
    await admin.getByRole('button', { name: 'Save deck layout' }).click();
    await expect(
      bow.getByText('The taxi time from the spot bow-1 to catapult 1 is -5 s; it cannot be below 0.'),
    ).toBeVisible();

    await bow1ToCat1.fill('55');
    await admin.getByRole('button', { name: 'Save deck layout' }).click();
    await expect(admin.getByRole('status').filter({ hasText: 'Saved.' })).toBeVisible();
    const after = (await (await api.get('/api/ships/1')).json()) as ShipView;
    expect(after.deckSpots.find((spot) => spot.name === 'bow-1')!.taxiS[1]).toBe(55);
  } finally {
    // Other browser tests time aircraft from the demo deck.
    await putBack();
  }
});
