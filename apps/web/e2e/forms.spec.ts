import { expect, test } from '@playwright/test';
import type { CycleView } from '@catline/contracts';
import { allOf, apiAs, lineupOf } from './support/demo-api.js';
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
