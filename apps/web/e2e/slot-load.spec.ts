import { expect, test } from '@playwright/test';
import { planCycle } from './support/demo-api.js';
import { card, openAs, pool } from './support/screens.js';

test('air operations loads fuel and stores from the card and sees the weight they build', async ({ browser }) => {
  const { cycle } = await planCycle({ aircraft: [{ side: 'D38', grossWeightLb: 42_000 }] });
  const airops = await openAs(browser, 'airops', `/lineup?cycle=${cycle.id}`);
  const openLoad = async () => {
    await airops.getByRole('button', { name: 'Actions for D38' }).click();
    await airops.getByRole('menuitem', { name: 'Fuel and stores…' }).click();
    return airops.getByRole('dialog');
  };

  let dialog = await openLoad();
  await dialog.getByLabel('Fuel on board (lb)').fill('-5');
  await dialog.getByRole('button', { name: 'Save fuel and stores' }).click();
  await expect(dialog.getByRole('alert')).toContainText('Enter the fuel on board in whole pounds');

  await dialog.getByLabel('Fuel on board (lb)').fill('8000');
  await dialog.getByLabel('Count of Drop tank').fill('2');
  await dialog.getByLabel('Count of Rocket pod').fill('1');
  // Hand computation from the demo's WKD-41 (common practice, no source): 29,400 operating with crew
  // + 8,000 fuel + 2 × 1,240 drop tanks + 1 × 520 rocket pod = 40,400 lb.
  await expect(dialog.getByTestId('load-weight-preview')).toContainText('Planned weight 40,400 lb');
  await expect(dialog.getByTestId('load-weight-preview')).toContainText('29,400 operating + 8,000 fuel + 3,000 stores');
  await expect(dialog.getByTestId('caution-line')).toBeVisible();
  await dialog.getByRole('button', { name: 'Save fuel and stores' }).click();
  await expect(airops.getByTestId('notice')).toContainText('Fuel and stores of D38 saved');

  const d38 = card(pool(airops), 'D38');
  await expect(d38).toContainText('40,400 lb');
  await expect(d38.getByTestId('gross-weight-parts')).toHaveText('= 29,400 operating + 8,000 fuel + 3,000 stores lb');

  // The same load again: the server's sentence says why nothing changed.
  dialog = await openLoad();
  await expect(dialog.getByLabel('Count of Drop tank')).toHaveValue('2');
  await dialog.getByRole('button', { name: 'Save fuel and stores' }).click();
  await expect(airops.getByTestId('notice')).toContainText('The fuel and stores refused: nothing to change');
  await expect(airops.getByTestId('notice')).toContainText('D38 already has this fuel and these stores.');
});
