import { expect, test, type Page } from '@playwright/test';
import type { AircraftView } from '@catline/contracts';
import { addTrialType, allOf, apiAs, planCycle } from './support/demo-api.js';
import { card, openAs, pool } from './support/screens.js';

const AIR_PLAN_HEADER = 'side_number,pilot_email,mission,fuel_lb,stores,gross_weight_lb,tanker,early_warning,spare';

async function chooseAndCheck(page: Page, label: string, name: string, lines: string[]) {
  await page.getByLabel(label).setInputFiles({ name, mimeType: 'text/csv', buffer: Buffer.from(lines.join('\r\n')) });
  await page.getByRole('button', { name: 'Check file' }).click();
}

test('air operations sees every problem of an air plan file, then imports a good one into the deck pool', async ({
  browser,
}) => {
  const { cycle } = await planCycle({ aircraft: [] });
  const airops = await openAs(browser, 'airops', '/cycles');
  await airops.getByRole('button', { name: `Show cycle ${cycle.number}` }).click();
  const download = airops.waitForEvent('download');
  await airops.getByRole('button', { name: 'Download template' }).click();
  expect((await download).suggestedFilename()).toBe('air-plan-template.csv');

  await chooseAndCheck(airops, 'Air plan file (CSV)', 'bad-plan.csv', [
    AIR_PLAN_HEADER,
    'C27,,Strike training,11500,,44900,no,no,no',
    '999,,Strike training,11500,,44900,no,no,no',
    'C28,,Strike training,lots,,44900,no,no,maybe',
  ]);
  const problems = airops.getByTestId('import-problems').locator('tbody tr');
  await expect(problems).toHaveCount(3);
  await expect(problems.nth(0)).toContainText('No aircraft has the side number 999.');
  await expect(problems.nth(1)).toContainText('fuel_lb');
  await expect(problems.nth(1)).toContainText('lots');
  await expect(problems.nth(1)).toContainText('Must be a whole number');
  await expect(problems.nth(2)).toContainText('spare');
  await expect(problems.nth(2)).toContainText('Must be yes or no');
  await expect(airops.getByText('bad-plan.csv: 3 problems.')).toBeVisible();
  await expect(airops.getByRole('button', { name: /^Import / })).toHaveCount(0);

  await chooseAndCheck(airops, 'Air plan file (CSV)', 'good-plan.csv', [
    AIR_PLAN_HEADER,
    'C27,pilot2@catline.example,Strike training,11500,4 practice bombs,44900,no,no,no',
    'C28,,Recovery tanker,15800,Refuelling store,47600,yes,no,no',
  ]);
  await expect(airops.getByTestId('import-problems')).toHaveCount(0);
  const rows = airops.getByTestId('import-rows').locator('tbody tr');
  await expect(rows).toHaveCount(2);
  await expect(rows.nth(0)).toContainText('Jo Fettleworth');
  await expect(rows.nth(1)).toContainText('Tanker');
  // Someone changes the cycle after the check: the import is refused in words, and works once the screen has caught up.
  // The screen follows the cycle live and would read the new version before the click: its reads of cycles wait
  // until the import tried on the version the check saw has been answered.
  let release = () => {};
  const released = new Promise<void>((resolve) => (release = resolve));
  await airops.route('**/api/cycles**', async (route) => {
    if (route.request().method() === 'GET') {
      await released;
      return route.fallback();
    }
    if (!route.request().url().includes('/air-plan/imports/')) return route.fallback();
    const response = await route.fetch();
    release();
    return route.fulfill({ response });
  });
  const api = await apiAs('airops');
  const fleet = await allOf<AircraftView>(api, '/api/aircraft');
  const added = await api.post(`/api/cycles/${cycle.id}/slots`, {
    data: {
      aircraftId: fleet.find((plane) => plane.sideNumber === 'C29')!.id,
      mission: 'Spare',
      fuelLb: 9000,
      stores: '',
      grossWeightLb: 42_000,
      tanker: false,
      earlyWarning: false,
      spare: true,
    },
  });
  expect(added.ok(), await added.text()).toBe(true);
  await api.dispose();
  const importButton = airops.getByRole('button', { name: `Import 2 aircraft into cycle ${cycle.number}` });
  await importButton.click();
  await expect(airops.getByTestId('import-refusal')).toContainText(
    `Cycle ${cycle.number} has changed 1 time since you saw it`,
  );
  await airops.unroute('**/api/cycles**');
  await importButton.click();
  await expect(airops.getByTestId('import-done')).toContainText(`deck pool of cycle ${cycle.number}`);

  const handler = await openAs(browser, 'handler', `/lineup?cycle=${cycle.id}`);
  await expect(card(pool(handler), 'C27')).toBeVisible();
  await expect(card(pool(handler), 'C28')).toBeVisible();
  await expect(card(pool(handler), 'C29')).toBeVisible();
});

test('the admin replaces a launch table from a CSV file once its problems are put right', async ({ browser }) => {
  const type = await addTrialType(`IM-${Date.now() % 100_000}`);

  const admin = await openAs(browser, 'admin', '/launch-data');
  await admin.getByRole('button', { name: `Show ${type.designation}` }).click();
  await chooseAndCheck(admin, 'Launch table file (CSV)', 'table.csv', [
    'gross_weight_lb,min_launch_airspeed_kt',
    '36000,126',
    '35000,130',
    '52000,-4',
  ]);
  const problems = admin.getByTestId('import-problems').locator('tbody tr');
  await expect(problems).toHaveCount(2);
  await expect(problems.nth(0)).toContainText('Must be heavier than line 2');
  await expect(problems.nth(1)).toContainText('Cannot be negative.');
  await expect(admin.getByRole('button', { name: /^Replace the / })).toHaveCount(0);

  await chooseAndCheck(admin, 'Launch table file (CSV)', 'table.csv', [
    'gross_weight_lb,min_launch_airspeed_kt',
    '36000,126',
    '44000,139',
    '52000,152.5',
  ]);
  await admin.getByRole('button', { name: `Replace the ${type.designation} table with these 3 rows` }).click();
  await expect(admin.getByTestId('import-done')).toBeVisible();
  await expect(admin.getByLabel('Row 3 gross weight')).toHaveValue('52000');
  await expect(admin.getByLabel('Row 3 minimum launch airspeed')).toHaveValue('152.5');
});

test('the admin invites a person without a password, and a second invitation to someone with one is refused in words', async ({
  browser,
}) => {
  const admin = await openAs(browser, 'admin', '/people');
  const email = `invitee${Date.now() % 100_000}@catline.example`;
  const form = admin.getByRole('form', { name: 'Add a person' });
  await form.getByLabel('Name').fill('Ira Invitee');
  await form.getByLabel('E-mail').fill(email);
  await form.getByRole('button', { name: 'Add person' }).click();
  await expect(admin.getByTestId('person-added')).toContainText('Invitation sent');
  await expect(admin.getByTestId('person-added')).toContainText(email);

  const invitee = admin.getByRole('row', { name: new RegExp(email) });
  await invitee.getByRole('button', { name: 'Send invitation again' }).click();
  await expect(admin.getByTestId('notice')).toContainText(`A new invitation link is on its way to ${email}`);

  const pilot = admin.getByRole('row', { name: /pilot@catline\.example/ });
  await pilot.getByRole('button', { name: 'Send invitation again' }).click();
  await expect(admin.getByTestId('notice')).toContainText('No invitation sent to Kit Marrowby');
  await expect(admin.getByTestId('notice')).toContainText('has already chosen a password');
});

test('the screens before sign-in ask for a reset link and refuse a bogus invitation link with the server’s reason', async ({
  page,
}) => {
  await page.goto('/sign-in');
  await page.getByRole('link', { name: 'Forgot password?' }).click();
  await expect(page).toHaveURL(/\/forgot-password$/);
  await page.getByLabel('E-mail').fill('nobody-here@catline.example');
  await page.getByRole('button', { name: 'Send me a link' }).click();
  await expect(page.getByTestId('reset-requested')).toContainText('a link to set a new password is on its way');

  await page.goto('/invitation#token=not-a-real-token');
  await page.getByRole('textbox', { name: 'New password', exact: true }).fill('short');
  await page.getByLabel('New password again').fill('different');
  await page.getByRole('button', { name: 'Set my password' }).click();
  await expect(page.getByText('At least 12 characters')).toBeVisible();
  await expect(page.getByText('The two do not match')).toBeVisible();

  await page.getByRole('textbox', { name: 'New password', exact: true }).fill('a long enough pass phrase');
  await page.getByLabel('New password again').fill('a long enough pass phrase');
  await page.getByRole('button', { name: 'Set my password' }).click();
  await expect(page.getByTestId('set-password-error')).toContainText('This invitation link is not valid any more');
  await expect(page).toHaveURL(/\/invitation/);
});
