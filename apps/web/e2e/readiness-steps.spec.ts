import { expect, test } from '@playwright/test';
import { READINESS_STEPS, type ShipView } from '@catline/contracts';
import { axeViolations } from './support/axe.js';
import { apiAs } from './support/demo-api.js';
import { expectNoSidewaysOverflow, openAs } from './support/screens.js';

test('the admin gives a waist catapult its own readiness steps on a 1024×768 tablet, is told beside the list what the server refuses, and saves', async ({
  browser,
}) => {
  const api = await apiAs('admin');
  const cat3 = ((await (await api.get('/api/ships/1')).json()) as ShipView).catapults.find((cat) => cat.number === 3)!;
  try {
    const admin = await openAs(browser, 'admin', '/fleet', { width: 1024, height: 768 });
    await admin.getByRole('tab', { name: 'Readiness steps' }).click();
    const steps = admin.getByRole('group', { name: 'Catapult 3 (waist) readiness steps' });
    await expect(steps.getByRole('checkbox', { name: 'Tension' })).toBeDisabled();
    await expectNoSidewaysOverflow(admin);
    expect(await axeViolations(admin)).toEqual([]);

    await steps.getByText("Runs the ship's steps", { exact: true }).click();
    await steps.getByText('Tension', { exact: true }).click();
    await admin.getByRole('button', { name: 'Save catapult 3 steps' }).click();
    await expect(steps.getByText('Catapult 3: These readiness steps cannot be left out: tensioned.')).toBeVisible();
    expect(await axeViolations(admin)).toEqual([]);

    await steps.getByText('Tension', { exact: true }).click();
    await steps.getByText('Deflector raised', { exact: true }).click();
    await admin.getByRole('button', { name: 'Save catapult 3 steps' }).click();
    await expect(admin.getByRole('status').filter({ hasText: 'Saved.' })).toBeVisible();
    const after = (await (await api.get('/api/ships/1')).json()) as ShipView;
    expect(after.catapults.find((cat) => cat.number === 3)!.readinessSteps).toEqual(
      READINESS_STEPS.filter((step) => step !== 'deflector_up'),
    );
    expect(after.catapults.find((cat) => cat.number === 1)!.readinessSteps).toBeNull();
  } finally {
    // Other browser tests step aircraft through the ship's list on every catapult.
    expect((await api.patch(`/api/ships/1/catapults/${cat3.id}`, { data: { readinessSteps: null } })).status()).toBe(
      200,
    );
  }
});
