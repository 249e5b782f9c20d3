import { expect, type Locator, test } from '@playwright/test';
import type {
  AircraftTypeView,
  AuditEntryView,
  Page as ApiPage,
  ShipView,
  SquadronView,
  UserView,
} from '@catline/contracts';
import { apiAs } from './support/demo-api.js';
import { openAs } from './support/screens.js';

// A fleet admin (an admin of no one ship) sees every ship: the forms that add a ship's rows ask which
// ship, and the Fleet screen's Ship choice says which ship's profile the admin's tabs edit.

test('a fleet admin adds a squadron to the second ship through the ship picker', async ({ browser }) => {
  const fleetApi = await apiAs('fleet');
  const ships = (await (await fleetApi.get('/api/ships')).json()) as ShipView[];
  expect(ships.length).toBeGreaterThan(1);
  const second = ships[1];
  const tag = String(Date.now() % 100_000);

  const page = await openAs(browser, 'fleet', '/fleet');
  await page.getByRole('tab', { name: 'Squadrons' }).click();
  const form = page.getByRole('form', { name: 'Add a squadron' });
  await form.getByLabel('Ship it belongs to').selectOption({ label: `${second.name} (${second.hullCode})` });
  await form.getByLabel('Name').fill(`Far Wing ${tag}`);
  await form.getByLabel('Code').fill(`FW-${tag}`);
  await form.getByLabel('E-mail for reports').fill(`fw${tag}@catline.example`);
  await form.getByRole('button', { name: 'Add squadron' }).click();
  await expect(page.getByRole('row', { name: new RegExp(`FW-${tag}`) })).toBeVisible();
  await expect(form.getByRole('alert')).toHaveCount(0);

  // The first ship's admin does not see it; the audit trail puts it on the second ship.
  const firstShipAdmin = await apiAs('admin');
  const firstShipSquadrons = (await (await firstShipAdmin.get('/api/squadrons')).json()) as SquadronView[];
  expect(firstShipSquadrons.map((squadron) => squadron.code)).not.toContain(`FW-${tag}`);
  const squadron = ((await (await fleetApi.get('/api/squadrons')).json()) as SquadronView[]).find(
    (candidate) => candidate.code === `FW-${tag}`,
  )!;
  const created = (await (
    await fleetApi.get('/api/audit', { params: { action: 'squadron.created', limit: 200 } })
  ).json()) as ApiPage<AuditEntryView>;
  expect(created.items.find((entry) => entry.subjectId === squadron.id)).toMatchObject({
    actorEmail: 'fleet@catline.example',
    shipId: second.id,
  });
  await firstShipAdmin.dispose();
  await fleetApi.dispose();
});

test("the Fleet screen's Ship choice picks the ship whose readiness steps the admin edits, and keeps it over a reload", async ({
  browser,
}) => {
  const fleetApi = await apiAs('fleet');
  const ships = (await (await fleetApi.get('/api/ships')).json()) as ShipView[];
  const [first, second] = ships;
  await fleetApi.dispose();

  const page = await openAs(browser, 'fleet', '/fleet');
  await page.getByRole('tab', { name: 'Readiness steps' }).click();
  await expect(page.getByText(`${first.name} readiness steps`)).toBeVisible();

  await page.getByLabel('Ship', { exact: true }).selectOption({ label: `${second.name} (${second.hullCode})` });
  await expect(page).toHaveURL(new RegExp(`[?&]ship=${second.id}\\b`));
  await expect(page.getByText(`${second.name} readiness steps`)).toBeVisible();
  await expect(page.getByText(`${first.name} readiness steps`)).toHaveCount(0);

  await page.reload();
  await expect(page.getByLabel('Ship', { exact: true })).toHaveValue(String(second.id));
  await page.getByRole('tab', { name: 'Readiness steps' }).click();
  await expect(page.getByText(`${second.name} readiness steps`)).toBeVisible();
});

test("a fleet admin adds a catapult officer to the second ship, on one of that ship's catapults", async ({
  browser,
}) => {
  const fleetApi = await apiAs('fleet');
  const [, second] = (await (await fleetApi.get('/api/ships')).json()) as ShipView[];
  const catapult = second.catapults[0];
  const email = `far-cat${Date.now() % 100_000}@catline.example`;

  const page = await openAs(browser, 'fleet', '/people');
  const form = page.getByRole('form', { name: 'Add a person' });
  await form.getByLabel('Ship they belong to').selectOption({ label: `${second.name} (${second.hullCode})` });
  await form.getByLabel('Name').fill('Ora Farcat');
  await form.getByLabel('E-mail').fill(email);
  await form.getByLabel('First password').fill('a long first password for the test');
  await form.getByLabel('Role').selectOption('catapult_officer');
  await form.getByLabel('Catapult').selectOption({ label: `Cat ${catapult.number} (${catapult.position})` });
  await form.getByRole('button', { name: 'Add person' }).click();
  await expect(page.getByTestId('person-added')).toContainText('Ora Farcat added');

  // Only the second ship's catapults were offered, so the person stands on one of them.
  const people = (await (await fleetApi.get('/api/users', { params: { limit: 200 } })).json()) as ApiPage<UserView>;
  expect(people.items.find((person) => person.email === email)).toMatchObject({
    role: 'catapult_officer',
    catapultId: catapult.id,
  });
  await fleetApi.dispose();
});

test("a fleet admin on the second ship is offered only that ship's squadrons, types and deck spots", async ({
  browser,
}) => {
  const fleetApi = await apiAs('fleet');
  const [first, second] = (await (await fleetApi.get('/api/ships')).json()) as ShipView[];
  const squadrons = (await (await fleetApi.get('/api/squadrons')).json()) as SquadronView[];
  const types = (await (await fleetApi.get('/api/aircraft-types')).json()) as AircraftTypeView[];
  await fleetApi.dispose();
  const squadronsOf = (shipId: number) =>
    squadrons.filter((row) => row.shipId === shipId).map((squadron) => `${squadron.code} · ${squadron.name}`);
  const typesOf = (shipId: number) =>
    types.filter((row) => row.shipId === shipId).map((type) => `${type.designation} · ${type.name}`);
  // Both ships have squadrons and types in the demo, so a list that kept the first ship's in would show it.
  expect(squadronsOf(first.id)).not.toEqual([]);
  expect(typesOf(first.id)).not.toEqual([]);
  /** The select's choices, in the order listed, its placeholder left out. */
  const offers = (select: Locator, labels: string[]) =>
    expect(select.locator('option:not([value=""])')).toHaveText(labels);

  const people = await openAs(browser, 'fleet', '/people');
  const personForm = people.getByRole('form', { name: 'Add a person' });
  await personForm.getByLabel('Ship they belong to').selectOption({ label: `${second.name} (${second.hullCode})` });
  await personForm.getByLabel('Role').selectOption('pilot');
  await offers(personForm.getByLabel('Squadron'), squadronsOf(second.id));

  const fleet = await openAs(browser, 'fleet', `/fleet?ship=${second.id}`);
  const aircraftForm = fleet.getByRole('form', { name: 'Add an aircraft' });
  await offers(aircraftForm.getByLabel('Type'), typesOf(second.id));
  await offers(aircraftForm.getByLabel('Squadron'), squadronsOf(second.id));
  await offers(
    aircraftForm.getByLabel('Parked at'),
    second.deckSpots.map((spot) => spot.name),
  );
});
