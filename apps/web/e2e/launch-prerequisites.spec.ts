import { expect, test } from '@playwright/test';
import { axeViolations } from './support/axe.js';
import { planCycle, stopLaunchingBefore } from './support/demo-api.js';
import { openAs } from './support/screens.js';

test('the air boss ticks every launch prerequisite before launching starts; the others read the ticks live', async ({
  browser,
}) => {
  const { cycle } = await planCycle({ aircraft: [{ side: 'C25', grossWeightLb: 44_000 }] });
  await stopLaunchingBefore(cycle.id);
  const names = cycle.launchPrerequisites.map((item) => item.name);
  expect(names.length).toBeGreaterThan(0);

  const openPanel = async (who: string) => {
    const page = await openAs(browser, who, '/cycles');
    await page.getByRole('button', { name: `Show cycle ${cycle.number}` }).click();
    const panel = page.getByRole('region', { name: `Cycle ${cycle.number}` });
    return { page, panel, list: panel.getByRole('region', { name: 'Launch prerequisites' }) };
  };
  const { page: boss, panel, list } = await openPanel('airboss');
  const { panel: watched, list: watchedList } = await openPanel('observer');

  const startButton = panel.getByRole('button', { name: 'Start launching' });
  await expect(startButton).toBeDisabled();
  await expect(panel).toContainText(`Tick every launch prerequisite first; not ticked: ${names.join(', ')}.`);
  // Others read the list; ticking is the air boss's alone.
  await expect(watchedList.getByRole('checkbox')).toHaveCount(0);
  await expect(watchedList.getByText('Not ticked', { exact: true })).toHaveCount(names.length);

  for (const name of names) {
    await list.getByText(name, { exact: true }).click();
    await expect(list.getByRole('checkbox', { name })).toBeChecked();
  }
  await expect(startButton).toBeEnabled();
  expect(await axeViolations(boss)).toEqual([]);
  await expect(watchedList.getByText('Ticked', { exact: true })).toHaveCount(names.length);

  await startButton.click();
  await expect(panel.getByRole('button', { name: 'Stop launching' })).toBeVisible();
  await expect(watched).toContainText('executing');
});
