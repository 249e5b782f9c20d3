import { expect, test } from '@playwright/test';
import { planCycle } from './support/demo-api.js';
import { card, openAs, pool } from './support/screens.js';

test('a pilot-less tanker is left out of the suggestion until it has a pilot, then passes the weight check on its catapult', async ({
  browser,
}) => {
  // What once ended on a catapult "waiting for the pilot": a tanker with nobody to fly it, and a spare held aside.
  const { cycle } = await planCycle({
    aircraft: [
      { side: 'L48', grossWeightLb: 47_000, pilot: null, tanker: true },
      { side: 'C30', grossWeightLb: 40_000, spare: true },
    ],
    start: true,
  });
  const handler = await openAs(browser, 'handler', `/lineup?cycle=${cycle.id}`);
  // Joss Abbotsfell, the pilot the handler will give the tanker, on a tablet.
  const pilot = await openAs(browser, 'pilot21', `/my-launch?cycle=${cycle.id}`, { width: 1024, height: 768 }, true);
  await expect(handler.getByTestId('connection-state')).toHaveAttribute('data-state', 'live');
  await expect(pilot.getByTestId('connection-state')).toHaveAttribute('data-state', 'live');
  await expect(pilot.getByText(`You are not in cycle ${cycle.number}`)).toBeVisible();

  const tanker = card(pool(handler), 'L48');
  await expect(tanker.getByTestId('no-pilot')).toBeVisible();
  await expect(handler.getByTestId('lineup-warnings')).toContainText('No pilot assigned to L48.');
  // A held spare brings no pilot until it is called: it is not flagged.
  await expect(card(pool(handler), 'C30').getByTestId('no-pilot')).toHaveCount(0);

  await handler.getByRole('button', { name: 'Suggest lineup' }).click();
  let dialog = handler.getByRole('dialog');
  await expect(dialog.getByTestId('suggestion-unassigned')).toHaveText('Left out, no pilot assigned: L48');
  await expect(dialog.getByText('Nothing to suggest')).toBeVisible();
  await dialog.getByRole('button', { name: 'Cancel' }).click();
  await expect(card(pool(handler), 'L48')).toBeVisible();

  await handler.getByRole('button', { name: 'Actions for L48' }).click();
  await handler.getByRole('menuitem', { name: 'Assign pilot…' }).click();
  await handler.getByRole('dialog').getByRole('combobox').selectOption({ label: 'Joss Abbotsfell' });
  await handler.getByRole('dialog').getByRole('button', { name: 'Save pilot' }).click();
  await expect(handler.getByTestId('notice')).toContainText('Pilot of L48 saved');
  await expect(card(pool(handler), 'L48').getByTestId('no-pilot')).toHaveCount(0);
  await expect(handler.getByTestId('lineup-warnings')).not.toContainText('No pilot assigned');
  // The pilot's tablet shows the tanker at once, still in the deck pool.
  await expect(pilot.getByTestId('my-slot')).toHaveAttribute('data-side-number', 'L48', { timeout: 2_000 });
  await expect(pilot.getByTestId('my-catapult')).toContainText('Deck pool');

  await handler.getByRole('button', { name: 'Suggest lineup' }).click();
  dialog = handler.getByRole('dialog');
  await expect(dialog.getByTestId('suggestion-lanes')).toContainText('L48 join');
  await expect(dialog.getByTestId('suggestion-unassigned')).toHaveCount(0);
  await dialog.getByRole('button', { name: 'Apply suggestion' }).click();
  await expect(handler.getByTestId('notice')).toContainText('Suggested lineup applied');
  await expect(card(pool(handler), 'L48')).toHaveCount(0);
  // The spare stays held: the suggestion never puts it on a catapult.
  await expect(card(pool(handler), 'C30')).toBeVisible();
  const catapult = await handler
    .locator('[data-testid="lane"]', { has: card(handler, 'L48') })
    .getAttribute('data-catapult-number');
  await expect(pilot.getByTestId('my-catapult')).toContainText(`Cat ${catapult}`, { timeout: 2_000 });

  // On the catapult the tanker reaches the step where it once stuck: the pilot answers the weight.
  const catOfficer = await openAs(browser, `cat${catapult}`, `/cat-station?cycle=${cycle.id}`);
  await expect(catOfficer.getByTestId('current-aircraft')).toHaveAttribute('data-side-number', 'L48');
  await expect(catOfficer.getByTestId('current-aircraft')).toContainText('Joss Abbotsfell');
  await catOfficer.getByTestId('step-taxiing').click();
  await catOfficer.getByTestId('step-on_catapult').click();
  await expect(catOfficer.getByTestId('pilot-weight')).toContainText('Show the pilot 47,000 lb');
  await pilot.getByTestId('acknowledge-weight').click();
  await expect(catOfficer.getByTestId('pilot-weight')).toContainText('The pilot agrees 47,000 lb');
});

test('air operations gives a pilot-less aircraft its pilot from the card, as the server allows, and the handler sees it', async ({
  browser,
}) => {
  const { cycle } = await planCycle({ aircraft: [{ side: 'L48', grossWeightLb: 47_000, pilot: null }] });
  const airOps = await openAs(browser, 'airops', `/lineup?cycle=${cycle.id}`);
  const handler = await openAs(browser, 'handler', `/lineup?cycle=${cycle.id}`);
  await expect(card(pool(handler), 'L48').getByTestId('no-pilot')).toBeVisible();

  await airOps.getByRole('button', { name: 'Actions for L48' }).click();
  await airOps.getByRole('menuitem', { name: 'Assign pilot…' }).click();
  await airOps.getByRole('dialog').getByRole('combobox').selectOption({ label: 'Joss Abbotsfell' });
  await airOps.getByRole('dialog').getByRole('button', { name: 'Save pilot' }).click();
  await expect(card(pool(airOps), 'L48').getByTestId('no-pilot')).toHaveCount(0);
  await expect(card(pool(handler), 'L48').getByTestId('no-pilot')).toHaveCount(0);
});
