import { expect, test, type APIRequestContext, type Page } from '@playwright/test';
import type { ReadinessStep } from '@catline/contracts';
import { axeViolations } from './support/axe.js';
import { apiAs, launchingCycle, lineupOf } from './support/demo-api.js';
import { openAs } from './support/screens.js';

// What the live feed brings to the station may take a while on a loaded machine.
const LIVE = { timeout: 10_000 };

/** The catapult officer of cat 1 takes C21's steps through the API, reading back the approved setting. */
async function stepsUpTo(cat1: APIRequestContext, cycleId: number, last: ReadinessStep) {
  for (;;) {
    const snapshot = await lineupOf(cat1, cycleId);
    const slot = snapshot.slots.find((candidate) => candidate.sideNumber === 'C21')!;
    const steps = snapshot.lanes.find((lane) => lane.catapultId === slot.catapultId)!.readinessSteps;
    if (slot.status === last) return;
    const to = steps[steps.indexOf(slot.status as ReadinessStep) + 1];
    const response = await cat1.post(`/api/cycles/${cycleId}/lineup/slots/${slot.id}/advance`, {
      data: {
        slotVersion: slot.version,
        to,
        ...(to === 'weight_agreed' ? { agreedWeightLb: slot.grossWeightLb } : {}),
        ...(to === 'setting_set' ? { settingReadBack: slot.figures!.catapultSetting } : {}),
      },
    });
    expect(response.status(), `${to}: ${await response.text()}`).toBe(200);
  }
}

/** Every text and state colour on the station at 7:1 or better (WCAG 2.2 § 1.4.6, contrast enhanced). */
async function expectEnhancedContrast(station: Page, state: string) {
  await expect(station.getByTestId('station-banner')).toHaveAttribute('data-state', state, LIVE);
  expect(await axeViolations(station, ['color-contrast-enhanced']), `below 7:1 with the banner ${state}`).toEqual([]);
}

test('the Cat station reads at 7:1 in the day theme: waiting, at the read-back, GO, NO-GO and suspended', async ({
  browser,
}) => {
  test.setTimeout(150_000);
  const cycle = await launchingCycle(false);
  const station = await openAs(browser, 'cat1', `/cat-station?cycle=${cycle.id}`, { width: 1024, height: 768 }, true);
  await expect(station.getByTestId('connection-state')).toHaveAttribute('data-state', 'live', LIVE);
  await expect(station.locator('html')).toHaveClass(/\blight\b/);
  await expect(station.getByTestId('current-aircraft')).toHaveAttribute('data-side-number', 'C21');
  await expectEnhancedContrast(station, 'waiting');

  const cat1 = await apiAs('cat1');
  const airboss = await apiAs('airboss');
  try {
    await stepsUpTo(cat1, cycle.id, 'weight_agreed');
    await expect(station.getByTestId('setting-read-back-input')).toBeVisible(LIVE);
    await station.getByTestId('setting-read-back-input').fill('7');
    await expectEnhancedContrast(station, 'waiting');

    await stepsUpTo(cat1, cycle.id, 'pilot_ready');
    await expectEnhancedContrast(station, 'go');

    const snapshot = await lineupOf(airboss, cycle.id);
    const cat1Id = snapshot.lanes.find((lane) => lane.number === 1)!.catapultId;
    const setDeck = async (clear: boolean) => {
      const { version } = await lineupOf(airboss, cycle.id);
      const response = await airboss.post(`/api/cycles/${cycle.id}/deck/catapult-status`, {
        data: {
          catapultId: cat1Id,
          clear,
          reason: clear ? null : 'Tractor ahead of the shuttle',
          basisVersion: version,
        },
      });
      expect(response.status(), await response.text()).toBe(200);
    };
    await setDeck(false);
    await expectEnhancedContrast(station, 'nogo');
    await setDeck(true);

    const slot = (await lineupOf(cat1, cycle.id)).slots.find((candidate) => candidate.sideNumber === 'C21')!;
    const suspended = await cat1.post(`/api/cycles/${cycle.id}/lineup/slots/${slot.id}/suspend`, {
      data: { slotVersion: slot.version },
    });
    expect(suspended.status()).toBe(200);
    await expectEnhancedContrast(station, 'suspended');
  } finally {
    await cat1.dispose();
    await airboss.dispose();
    await station.context().close();
  }
});
