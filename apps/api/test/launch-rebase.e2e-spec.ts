import type { SlotView } from '@catline/contracts';
import type { INestApplication } from '@nestjs/common';
import { LineupDriver, launchKey, pilot } from './support/lineup-fixtures.js';
import { startTestApp } from './support/test-app.js';

const MINUTE = 60_000;

// Once launching, what is left is projected from the launches made and from now, not from the plan.
describe('the projection of a launching cycle', () => {
  let app: INestApplication;
  let deck: LineupDriver;

  beforeAll(async () => {
    const started = await startTestApp();
    app = started.app;
    deck = new LineupDriver(started.url);
  });

  afterAll(async () => {
    await app.close();
  });

  it('moves what is left to the real launch times and now, and says how late each runs against the plan', async () => {
    // Planned twenty minutes ago: the plan's times are all in the past; the window closes in a quarter hour.
    const planned = Date.now() - 20 * MINUTE;
    const {
      cycle,
      slots: [first, second, alone, third, fourth],
    } = await deck.executingCycle(
      {
        1: [{ side: 'C21', pilotEmail: pilot(2) }, 'C22'],
        2: ['C25'],
        3: [{ side: 'C23', pilotEmail: pilot(3) }, 'C24'],
      },
      {
        plannedLaunchAt: new Date(planned).toISOString(),
        windowStartAt: new Date(planned - 5 * MINUTE).toISOString(),
        windowEndAt: new Date(Date.now() + 15 * MINUTE).toISOString(),
      },
    );
    for (const [slot, pilotEmail] of [
      [first, pilot(2)],
      [third, pilot(3)],
    ] as const) {
      const ready = await deck.readyToLaunch(cycle.id, slot.id, pilotEmail);
      expect((await deck.launch(cycle.id, ready, launchKey())).status).toBe(200);
    }

    const asked = Date.now();
    const snapshot = await deck.snapshot(cycle.id);
    const view = (slot: SlotView) => snapshot.slots.find((candidate) => candidate.id === slot.id)!;
    const time = (slot: SlotView) => Date.parse(view(slot).projectedLaunchAt!);
    const ship = await deck.demoShip();
    const resetOf = (slot: SlotView) =>
      ship.catapults.find((catapult) => catapult.id === view(slot).catapultId)!.resetIntervalS * 1000;

    // The two launches stand at their real times, made in this test.
    for (const slot of [first, third]) {
      expect(view(slot).status).toBe('launched');
      expect(time(slot)).toBe(Date.parse(view(slot).launchedAt!));
      expect(time(slot)).toBeGreaterThan(planned + 15 * MINUTE);
    }
    // Behind each launch: no sooner than its catapult's reset after the real launch, and not before now.
    expect(time(second)).toBeGreaterThanOrEqual(time(first) + resetOf(first));
    expect(time(fourth)).toBeGreaterThanOrEqual(time(third) + resetOf(third));
    // The aircraft on a catapult that has not launched yet goes from now, not at the plan's time long gone.
    for (const slot of [second, fourth, alone]) expect(time(slot)).toBeGreaterThanOrEqual(asked);
    for (const slot of [second, fourth, alone]) {
      // Against the plan each runs about twenty minutes late; against the window's end each is on time.
      expect(view(slot).timing!.plan).toMatchObject({ verdict: 'late' });
      expect(view(slot).timing!.plan!.minutes).toBeGreaterThanOrEqual(15);
      expect(view(slot).timing!.window.verdict).toBe('on_time');
    }
  });
});
