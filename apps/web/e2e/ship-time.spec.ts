import { expect, test } from '@playwright/test';
import type { ShipView } from '@catline/contracts';
import { apiAs, planCycle } from './support/demo-api.js';
import { signIn } from './support/screens.js';

// The ship keeps +04:00 all year (IANA tz database, file "asia": "Zone Asia/Dubai ... 4:00 - +04"); the
// browser runs thirteen hours ahead of UTC (Pacific/Auckland in December, NZDT). Ship time is worked here
// by plain arithmetic, not by the app's formatter.
const SHIP_ZONE = 'Asia/Dubai';
const DEVICE_ZONE = 'Pacific/Auckland';
const onBoard = (iso: string) => new Date(Date.parse(iso) + 4 * 3_600_000).toISOString();
const hhmm = (iso: string) => onBoard(iso).slice(11, 16);
// Chromium's short name for the zone, whichever its ICU gives ("GST" or "GMT+4"); never the device's.
const ZONE_NAME = '(?:GST|GMT\\+4)';

test("the admin sets the ship's zone; the Cycles list and the board show its clock with the zone named, not the device's", async ({
  browser,
}) => {
  const admin = await apiAs('admin');
  const [ship] = (await (await admin.get('/api/ships')).json()) as ShipView[];
  const setZone = async (timeZone: string | undefined) =>
    expect(
      (await admin.patch(`/api/ships/${ship.id}`, { data: { profile: { ...ship.profile, timeZone } } })).status(),
    ).toBe(200);
  try {
    // The admin sets the zone where the ship is kept; a name Intl does not know is refused as typed.
    const fleet = await browser.newContext({ viewport: { width: 1366, height: 768 } });
    const adminPage = await fleet.newPage();
    await adminPage.goto('/fleet');
    await expect(adminPage).toHaveURL(/\/sign-in/, { timeout: 30_000 });
    await signIn(adminPage, 'admin');
    await adminPage.getByRole('tab', { name: 'Deck layout' }).click();
    const zoneForm = adminPage.getByRole('form', { name: "Ship's time zone" });
    await zoneForm.getByLabel("Ship's time zone").fill('Mid/Ocean');
    await expect(zoneForm).toContainText('Enter a time zone name such as Asia/Dubai or UTC.');
    await zoneForm.getByLabel("Ship's time zone").fill(SHIP_ZONE);
    await zoneForm.getByRole('button', { name: 'Save time zone' }).click();
    await expect(zoneForm.getByRole('status')).toContainText(`Saved`, { timeout: 15_000 });
    await fleet.close();

    const { cycle } = await planCycle({ aircraft: [] });
    expect(cycle.timeZone).toBe(SHIP_ZONE);

    const context = await browser.newContext({ timezoneId: DEVICE_ZONE, viewport: { width: 1366, height: 768 } });
    const page = await context.newPage();
    expect(await page.evaluate(() => Intl.DateTimeFormat().resolvedOptions().timeZone)).toBe(DEVICE_ZONE);

    await page.goto('/cycles');
    // A fresh browser under load may take a while to find it has no session and offer the sign-in.
    await expect(page).toHaveURL(/\/sign-in/, { timeout: 30_000 });
    await signIn(page, 'airops');
    const row = page.getByRole('row').filter({ hasText: new RegExp(`^${cycle.number}`) });
    await expect(row).toContainText(
      new RegExp(`${onBoard(cycle.plannedLaunchAt).slice(0, 10)} ${hhmm(cycle.plannedLaunchAt)} ${ZONE_NAME}`),
    );
    await expect(row).toContainText(
      new RegExp(`${hhmm(cycle.windowStartAt)} ${ZONE_NAME}–${hhmm(cycle.windowEndAt)} ${ZONE_NAME}`),
    );

    await page.goto(`/lineup?cycle=${cycle.id}`);
    // The summary names the zone once for the whole window.
    await expect(page.getByTestId('lineup-summary')).toContainText(
      new RegExp(`${hhmm(cycle.windowStartAt)}–${hhmm(cycle.windowEndAt)} ${ZONE_NAME}`),
      { timeout: 30_000 },
    );
    await context.close();
  } finally {
    // The other tests share the demo ship and expect it on its own zone.
    await setZone(ship.profile.timeZone);
    await admin.dispose();
  }
});
