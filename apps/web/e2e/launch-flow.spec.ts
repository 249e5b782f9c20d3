import { expect, test } from '@playwright/test';
import { apiAs, changesOf, enterWindReading, lineupOf, planCycle } from './support/demo-api.js';
import { approvedSetting, card, dragWithMouse, lane, openAs, pool } from './support/screens.js';

test('handler drags an aircraft to cat 1, the pilot sees it live, the catapult officer launches it once', async ({
  browser,
}) => {
  const { cycle } = await planCycle({
    aircraft: [{ side: 'C21', grossWeightLb: 40_000, pilot: 'pilot' }],
    start: true,
  });

  const handler = await openAs(browser, 'handler', `/lineup?cycle=${cycle.id}`);
  const pilot = await openAs(browser, 'pilot', `/my-launch?cycle=${cycle.id}`);
  const catOfficer = await openAs(browser, 'cat1', `/cat-station?cycle=${cycle.id}`);

  await expect(card(pool(handler), 'C21')).toBeVisible();
  await expect(handler.getByTestId('connection-state')).toHaveAttribute('data-state', 'live');
  await expect(pilot.getByTestId('my-catapult')).toContainText('Deck pool');
  await expect(pilot.getByTestId('connection-state')).toHaveAttribute('data-state', 'live');
  await expect(catOfficer.getByText('No aircraft waiting on cat 1')).toBeVisible();

  // A reading a few seconds short of the ship's age: each station flags it by its own clock, while the
  // server sends nothing more, and a fresh reading clears the flag.
  const stations = [handler, pilot, catOfficer];
  const maxAgeMs = Date.parse(cycle.windStaleAt) - Date.parse(cycle.windReadAt);
  await enterWindReading(cycle.id, maxAgeMs - 5_000);
  for (const station of stations) {
    await expect(station.getByTestId('stale-wind-notice')).toContainText(
      `Wind reading is ${maxAgeMs / 60_000} min old`,
      { timeout: 20_000 },
    );
  }
  await enterWindReading(cycle.id, 0);
  for (const station of stations) await expect(station.getByTestId('stale-wind-notice')).toHaveCount(0);

  await dragWithMouse(handler, card(pool(handler), 'C21'), lane(handler, 1).getByTestId('lane-drop-zone'));
  await expect(card(lane(handler, 1), 'C21')).toBeVisible();

  // Live, without a reload, within two seconds.
  await expect(pilot.getByTestId('my-catapult')).toContainText('Cat 1', { timeout: 2_000 });
  await expect(pilot.getByTestId('my-place')).toContainText('Next (1st)', { timeout: 2_000 });

  await expect(catOfficer.getByTestId('current-aircraft')).toHaveAttribute('data-side-number', 'C21');
  await catOfficer.getByTestId('step-taxiing').click();
  await catOfficer.getByTestId('step-on_catapult').click();
  await expect(catOfficer.getByTestId('step-on_catapult')).toHaveAttribute('data-done', 'true');
  await expect(catOfficer.getByTestId('pilot-weight')).toContainText('Show the pilot 40,000 lb');
  await expect(catOfficer.getByTestId('launch')).toBeDisabled();
  const banner = catOfficer.getByTestId('station-banner');
  await expect(banner).toHaveAttribute('data-state', 'waiting');
  await expect(banner).toContainText('WAITING FOR');
  await expect(banner).toContainText('agree the gross weight');

  await pilot.getByTestId('acknowledge-weight').click();
  await expect(pilot.getByTestId('weight-acknowledged')).toBeVisible();
  await expect(catOfficer.getByTestId('pilot-weight')).toContainText('The pilot agrees 40,000 lb');

  // One tap per step, in the ship's order; the setting is read back from the console as the station shows it.
  await catOfficer.getByTestId('step-weight_agreed').click();
  await expect(catOfficer.getByTestId('step-weight_agreed')).toHaveAttribute('data-done', 'true');
  await catOfficer.getByTestId('setting-read-back-input').fill(await approvedSetting(catOfficer).innerText());
  for (const step of ['setting_set', 'deflector_up', 'tensioned', 'run_up', 'checks_clear', 'pilot_ready']) {
    await catOfficer.getByTestId(`step-${step}`).click();
    await expect(catOfficer.getByTestId(`step-${step}`)).toHaveAttribute('data-done', 'true');
  }
  await expect(catOfficer.getByTestId('launch')).toBeEnabled();
  await expect(banner).toHaveAttribute('data-state', 'go');
  await expect(banner).toHaveText('GO');
  // A double tap must launch once.
  await catOfficer.getByTestId('launch').dblclick();

  await expect(card(lane(handler, 1), 'C21')).toHaveAttribute('data-status', 'launched');
  await expect(pilot.getByTestId('slot-status')).toHaveText('Launched');
  await expect(catOfficer.getByText('No aircraft waiting on cat 1')).toBeVisible();

  const observer = await apiAs('observer');
  const launches = (await changesOf(observer, cycle.id)).filter((change) => change.kind === 'slot_launched');
  expect(launches).toHaveLength(1);
  const snapshot = await lineupOf(observer, cycle.id);
  expect(snapshot.slots.find((slot) => slot.sideNumber === 'C21')?.launchedAt).not.toBeNull();
  await observer.dispose();
});
