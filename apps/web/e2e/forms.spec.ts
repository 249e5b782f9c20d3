import { expect, test, type Page } from '@playwright/test';
import type { CycleView } from '@catline/contracts';
import { addTrialType, allOf, apiAs, lineupOf } from './support/demo-api.js';
import { openAs } from './support/screens.js';

// The forms check what the server would refuse before sending, say it under the field, and clear
// themselves once the server has taken what they sent.

test('the admin is told what is missing, then adds a squadron and an aircraft of it', async ({ browser }) => {
  const admin = await openAs(browser, 'admin', '/fleet');
  const tag = String(Date.now() % 100_000);

  await admin.getByRole('tab', { name: 'Squadrons' }).click();
  const squadron = admin.getByRole('form', { name: 'Add a squadron' });
  await squadron.getByLabel('Code').fill('too-long-a-code');
  await squadron.getByRole('button', { name: 'Add squadron' }).click();
  await expect(squadron.getByText('Enter the squadron name.')).toBeVisible();
  await expect(squadron.getByText('Up to 12 letters, digits or dashes.')).toBeVisible();
  await expect(squadron.getByText('Enter the duty officer e-mail address.')).toBeVisible();

  await squadron.getByLabel('Name').fill(`Test Wing ${tag}`);
  await squadron.getByLabel('Code').fill(`tw-${tag}`);
  await expect(squadron.getByLabel('Code')).toHaveValue(`TW-${tag}`);
  await squadron.getByLabel('E-mail for reports').fill(`tw${tag}@catline.example`);
  await squadron.getByRole('button', { name: 'Add squadron' }).click();
  await expect(admin.getByRole('row', { name: new RegExp(`TW-${tag}`) })).toBeVisible();
  await expect(squadron.getByLabel('Name')).toHaveValue('');

  await admin.getByRole('tab', { name: 'Aircraft' }).click();
  const aircraft = admin.getByRole('form', { name: 'Add an aircraft' });
  await aircraft.getByLabel('Side number').fill('1 0 1');
  await aircraft.getByRole('button', { name: 'Add aircraft' }).click();
  for (const problem of [
    'Up to 8 letters, digits or dashes.',
    'Pick a type.',
    'Pick a squadron.',
    'Pick where it is parked.',
  ]) {
    await expect(aircraft.getByText(problem)).toBeVisible();
  }

  const side = `T${tag}`;
  await aircraft.getByLabel('Side number').fill(side);
  await aircraft.getByLabel('Type').selectOption({ index: 1 });
  await aircraft.getByLabel('Squadron').selectOption({ label: `TW-${tag} · Test Wing ${tag}` });
  await aircraft.getByLabel('Parked at').selectOption({ index: 1 });
  await expect(aircraft.getByText('Pick a type.')).toHaveCount(0);
  await aircraft.getByRole('button', { name: 'Add aircraft' }).click();
  await expect(admin.getByRole('row', { name: new RegExp(`${side}.*TW-${tag}`) })).toBeVisible();
  await expect(aircraft.getByLabel('Side number')).toHaveValue('');
});

test('air operations is stopped on a wrong figure and window, creates the cycle, then adds an aircraft to its deck pool', async ({
  browser,
}) => {
  const airops = await openAs(browser, 'airops', '/cycles');
  await airops.getByRole('button', { name: 'New cycle' }).click();
  const form = airops.getByRole('form', { name: 'Create cycle' });
  const planned = await form.getByLabel('Planned first launch').inputValue();
  const closes = await form.getByLabel('Window closes').inputValue();
  await form.getByLabel('Ship speed (kt)').fill('41');
  await form.getByLabel('Window closes').fill(planned);
  await form.getByRole('button', { name: 'Create cycle' }).click();
  await expect(form.getByText('Enter a speed from 0 to 40 kt.')).toBeVisible();
  await expect(form.getByText('The window must close after the planned launch.')).toBeVisible();

  await form.getByLabel('Ship speed (kt)').fill('25');
  await form.getByLabel('Window closes').fill(closes);
  const number = await form.getByLabel('Cycle number').inputValue();
  await form.getByRole('button', { name: 'Create cycle' }).click();
  const panel = airops.getByRole('region', { name: `Cycle ${number}` });
  await expect(panel).toBeVisible();

  const addSlot = panel.getByRole('form', { name: 'Add an aircraft to the cycle' });
  await addSlot.getByLabel('Fuel (lb)').fill('11500.5');
  await addSlot.getByRole('button', { name: 'Add to deck pool' }).click();
  for (const problem of [
    'Pick an aircraft.',
    'Say what the sortie is for.',
    'Enter the fuel in whole pounds, up to 100,000.',
    'Enter the gross weight in whole pounds, from 1 to 200,000.',
  ]) {
    await expect(addSlot.getByText(problem)).toBeVisible();
  }

  await addSlot.getByLabel('Aircraft').selectOption({ index: 1 });
  const side = (await addSlot.getByLabel('Aircraft').locator('option:checked').textContent())!.split(' · ')[0];
  await addSlot.getByLabel('Mission').fill('  Tanker track  ');
  await addSlot.getByLabel('Fuel (lb)').fill('11500');
  await addSlot.getByLabel('Gross weight (lb)').fill('45400');
  await addSlot.getByText('Tanker', { exact: true }).click();
  await addSlot.getByRole('button', { name: 'Add to deck pool' }).click();
  await expect(addSlot.getByLabel('Mission')).toHaveValue('');

  const api = await apiAs('airops');
  const cycles = await allOf<CycleView>(api, '/api/cycles');
  const cycle = cycles.find((candidate) => candidate.number === Number(number))!;
  expect(cycle.shipSpeedKt).toBe(25);
  const lineup = await lineupOf(api, cycle.id);
  expect(
    lineup.slots.map(({ sideNumber, mission, fuelLb, grossWeightLb, tanker }) => ({
      sideNumber,
      mission,
      fuelLb,
      grossWeightLb,
      tanker,
    })),
  ).toEqual([{ sideNumber: side, mission: 'Tanker track', fuelLb: 11_500, grossWeightLb: 45_400, tanker: true }]);

  // A wind read off the deck: 35 kt dead ahead while steaming 25 kt into it is 10 kt of true wind from
  // ahead; its gust and lull likewise lose the ship's 25 kt (arithmetic, the wind being along the course).
  const conditions = panel.getByRole('form', { name: 'Save conditions' });
  await conditions.getByLabel('Wind entered as').selectOption('relative');
  await conditions.getByRole('button', { name: 'Save conditions' }).click();
  await expect(conditions.getByText('Enter a bearing off the bow from −180 to 180°.')).toBeVisible();
  await conditions.getByLabel('Wind off the bow (°, port −)').fill('0');
  await conditions.getByLabel('Wind over the deck (kt)').fill('35');
  await conditions.getByLabel('Gust (kt, optional)').fill('38');
  await conditions.getByLabel('Lull (kt, optional)').fill('33');
  await conditions.getByRole('button', { name: 'Save conditions' }).click();
  await expect(panel.getByText('Conditions saved; every launch figure has been worked out again.')).toBeVisible();
  const read = (await allOf<CycleView>(api, '/api/cycles')).find((candidate) => candidate.id === cycle.id)!;
  expect(read.trueWindSpeedKt).toBeCloseTo(10, 6);
  expect(read.windGustKt).toBeCloseTo(13, 6);
  expect(read.windLullKt).toBeCloseTo(8, 6);
});

test('the admin is told which figures of a new aircraft type are wrong, then adds it and sees its launch data', async ({
  browser,
}) => {
  const admin = await openAs(browser, 'admin', '/launch-data');
  const form = admin.getByRole('form', { name: 'Add an aircraft type' });
  const designation = `KT-${Date.now() % 10_000}`;
  await form.getByLabel('Designation').fill(designation);
  await form.getByLabel('Name').fill('Kestrel trainer');
  await form.getByLabel('Max gross weight (lb)').fill('52000.5');
  await form.getByLabel('Crosswind limit (kt)').fill('101');
  await form.getByLabel('Thrust (lbf)').fill('22000');
  await form.getByLabel('Required excess (kt)').fill('10');
  await form.getByLabel('Max end speed (kt)').fill('175');
  await form.getByLabel('Trim bands').fill('44000:15');
  await form.getByLabel('Launch table').fill('34000:124, 30000:120');
  await form.getByRole('button', { name: 'Add type' }).click();
  for (const problem of [
    'Enter the maximum gross weight in whole pounds, 1 to 1,000,000.',
    'Enter the crosswind limit in knots, 0 to 100.',
    'Write bands as 44000:15, 48000:17, *:18 — the last one with *.',
    'Row 2: each weight must be heavier than the row above.',
  ]) {
    await expect(form.getByText(problem)).toBeVisible();
  }

  await form.getByLabel('Max gross weight (lb)').fill('52000');
  await form.getByLabel('Crosswind limit (kt)').fill('15');
  await form.getByLabel('Trim bands').fill('44000:15, *:18');
  await form.getByLabel('Launch table').fill('34000:124, 46000:143');
  await form.getByRole('button', { name: 'Add type' }).click();
  const detail = admin.getByRole('region', { name: `${designation} launch data` });
  await expect(detail).toContainText('52,000 lb');
  await expect(detail).toContainText('up to 44,000 lb: 15° · above: 18°');
  await expect(form.getByLabel('Designation')).toHaveValue('');
});

/** Does `act` and waits until the server has answered the PUT of the type's `part` with a 200. */
async function saved(page: Page, part: string, act: () => Promise<void>) {
  const answer = page.waitForResponse((r) => r.request().method() === 'PUT' && r.url().endsWith(`/${part}`));
  await act();
  expect((await answer).status()).toBe(200);
}

test('the admin edits a launch table and a stores catalogue row by row, told in words what is wrong', async ({
  browser,
}) => {
  const type = await addTrialType(`RW-${Date.now() % 100_000}`);
  const admin = await openAs(browser, 'admin', '/launch-data');
  await admin.getByRole('button', { name: `Show ${type.designation}` }).click();

  const table = admin.getByRole('region', { name: 'Launch table' });
  await table.getByRole('button', { name: 'Add row' }).click();
  await table.getByLabel('Row 3 gross weight').fill('40000');
  await table.getByLabel('Row 3 minimum launch airspeed').fill('150');
  await table.getByRole('button', { name: 'Save table' }).click();
  await expect(admin.getByRole('alert')).toContainText('Row 3: each weight must be heavier than the row above.');
  await table.getByLabel('Row 3 gross weight').fill('52000');
  await saved(admin, 'launch-table', () => table.getByRole('button', { name: 'Save table' }).click());
  await expect(admin.getByRole('alert')).toHaveCount(0);

  const stores = admin.getByRole('region', { name: 'Stores catalogue' });
  await stores.getByRole('button', { name: 'Add item' }).click();
  await stores.getByRole('button', { name: 'Add item' }).click();
  await stores.getByLabel('Stores item 1 name').fill('Practice bomb rack');
  await stores.getByLabel('Stores item 1 weight each').fill('95');
  await stores.getByLabel('Stores item 2 name').fill('Spare tank');
  await stores.getByLabel('Stores item 2 weight each').fill('12.5');
  await stores.getByRole('button', { name: 'Save catalogue' }).click();
  await expect(stores.getByRole('alert')).toContainText('Item 2: enter the weight of one Spare tank in whole pounds');
  await stores.getByRole('button', { name: 'Remove stores item 2' }).click();
  await saved(admin, 'stores-catalogue', () => stores.getByRole('button', { name: 'Save catalogue' }).click());

  // What the server kept, read back by a fresh page.
  const again = await openAs(browser, 'admin', '/launch-data');
  await again.getByRole('button', { name: `Show ${type.designation}` }).click();
  await expect(again.getByLabel('Row 3 gross weight')).toHaveValue('52000');
  await expect(again.getByLabel('Row 3 minimum launch airspeed')).toHaveValue('150');
  const kept = again.getByRole('region', { name: 'Stores catalogue' });
  await expect(kept.getByLabel('Stores item 1 name')).toHaveValue('Practice bomb rack');
  await expect(kept.getByLabel('Stores item 2 name')).toHaveCount(0);
});
