import { expect, test } from '@playwright/test';
import { DEMO_PASSWORD, planCycle } from './support/demo-api.js';
import { card, dragWithMouse, lane, openAs, pool } from './support/screens.js';

test('a move based on a lineup that changed meanwhile is refused with the server’s reason and rolled back', async ({
  browser,
}) => {
  const { cycle } = await planCycle({ aircraft: [{ side: 'C24', grossWeightLb: 41_000 }] });
  const first = await openAs(browser, 'handler', `/lineup?cycle=${cycle.id}`);

  // The second handler's screen is a moment behind: broadcasts reach it late (here: not at all).
  const lagging = await (await browser.newContext({ viewport: { width: 1366, height: 768 } })).newPage();
  await lagging.routeWebSocket(/\/socket\.io\//, (socket) => {
    const server = socket.connectToServer();
    server.onMessage((message) => {
      if (!String(message).includes('lineup:change')) socket.send(message);
    });
  });
  await lagging.goto(`/lineup?cycle=${cycle.id}`);
  await lagging.getByLabel('E-mail').fill('handler@catline.example');
  await lagging.getByLabel('Password').fill(DEMO_PASSWORD);
  await lagging.getByRole('button', { name: 'Sign in' }).click();
  await expect(card(pool(lagging), 'C24')).toBeVisible();

  await dragWithMouse(first, card(pool(first), 'C24'), lane(first, 2).getByTestId('lane-drop-zone'));
  await expect(card(lane(first, 2), 'C24')).toBeVisible();
  await expect(card(pool(lagging), 'C24')).toBeVisible();

  await dragWithMouse(lagging, card(pool(lagging), 'C24'), lane(lagging, 3).getByTestId('lane-drop-zone'));

  const notice = lagging.getByTestId('notice');
  await expect(notice).toContainText('refused: the lineup changed first');
  await expect(notice).toContainText('C24');
  // Rolled back and refreshed: the lagging screen now shows where the first handler put it.
  await expect(card(lane(lagging, 2), 'C24')).toBeVisible();
  await expect(card(lane(lagging, 3), 'C24')).toHaveCount(0);
  await expect(card(lane(first, 2), 'C24')).toBeVisible();
});

test('a move refused on a lineup nobody else changed puts the card back where it was', async ({ browser }) => {
  // No pilot: the server refuses to put the aircraft in a catapult's order, and nothing else changes.
  const { cycle } = await planCycle({ aircraft: [{ side: 'L47', grossWeightLb: 44_000, pilot: null }] });
  const handler = await openAs(browser, 'handler', `/lineup?cycle=${cycle.id}`);
  await expect(handler.getByTestId('live-figures')).toHaveAttribute('data-live', 'true');
  // The lineup read again after the refusal is held back: the screen must undo the move by itself.
  await handler.route(`**/api/cycles/${cycle.id}/lineup`, () => undefined);

  await dragWithMouse(handler, card(pool(handler), 'L47'), lane(handler, 2).getByTestId('lane-drop-zone'));

  await expect(handler.getByTestId('notice')).toContainText('the aircraft has no pilot');
  await expect(card(pool(handler), 'L47')).toBeVisible();
  await expect(card(lane(handler, 2), 'L47')).toHaveCount(0);
  await handler.context().close();
});
