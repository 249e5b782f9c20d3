import { expect, test } from '@playwright/test';
import { apiAs, lineupOf, planCycle } from './support/demo-api.js';
import { card, dragWithMouse, dragWithTouch, grabPoint, lane, openAs, pool } from './support/screens.js';

// A handler on a busy deck drags one move after another: the next drag starts as the last one lands, here
// on the card just put down (a second thought), right where it landed.
const PAUSE_AFTER_DROP_MS = 80;
const SIDES = ['C21', 'C22', 'C23'];

const inputs = [
  { name: 'mouse', viewport: { width: 1366, height: 768 }, touch: false, drag: dragWithMouse },
  { name: 'touch', viewport: { width: 1024, height: 768 }, touch: true, drag: dragWithTouch },
  { name: 'touch upright', viewport: { width: 820, height: 1180 }, touch: true, drag: dragWithTouch },
] as const;

// Six real drags in a browser slowed to a tablet's speed take about a minute on a loaded test machine: the
// default minute timed out mid-drag (the drags themselves all went through when given two).
test.describe.configure({ timeout: 120_000 });

for (const input of inputs) {
  test(`by ${input.name}, a drag started ${PAUSE_AFTER_DROP_MS} ms after the previous drop moves its aircraft`, async ({
    browser,
  }) => {
    const { cycle } = await planCycle({ aircraft: SIDES.map((side) => ({ side, grossWeightLb: 42_000 })) });
    const handler = await openAs(browser, 'handler', `/lineup?cycle=${cycle.id}`, input.viewport, input.touch);
    await expect(handler.getByTestId('live-figures')).toHaveAttribute('data-live', 'true');
    // A deck tablet's processor, not this machine's: the board has as long to settle as on the deck.
    const cdp = await handler.context().newCDPSession(handler);
    await cdp.send('Emulation.setCPUThrottlingRate', { rate: 6 });

    // Each aircraft goes to the empty cat 1 and at once on from there to a catapult of its own.
    const target = (side: string) => SIDES.indexOf(side) + 2;
    for (const side of SIDES) {
      const [from, landing, onward] = await Promise.all([
        grabPoint(card(pool(handler), side)),
        grabPoint(lane(handler, 1).getByTestId('lane-drop-zone')),
        grabPoint(lane(handler, target(side)).getByTestId('lane-drop-zone')),
      ]);
      await input.drag(handler, from, landing);
      await handler.waitForTimeout(PAUSE_AFTER_DROP_MS);
      await input.drag(handler, landing, onward);
      await expect(card(lane(handler, target(side)), side), `${side} went on to cat ${target(side)}`).toBeVisible();
      await expect(card(lane(handler, 1), side)).toHaveCount(0);
    }

    const observer = await apiAs('observer');
    const snapshot = await lineupOf(observer, cycle.id);
    await observer.dispose();
    const laneOf = (side: string) => {
      const slot = snapshot.slots.find((candidate) => candidate.sideNumber === side);
      return snapshot.lanes.find((candidate) => candidate.catapultId === slot?.catapultId)?.number;
    };
    expect(SIDES.map(laneOf), 'the server holds every second move').toEqual(SIDES.map(target));
    await handler.context().close();
  });
}
