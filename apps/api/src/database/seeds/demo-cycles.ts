import type { ReadinessStep } from '@catline/contracts';
import type { DataSource } from 'typeorm';
import type { CreateCycleDto } from '../../cycles/dto/create-cycle.dto.js';
import { DemoDeck, type DemoSortie } from './demo-deck.js';

// The invented demo cycles of the training carrier's flying day: one flown and closed earlier, a day
// cycle being planned, and a night cycle after it. Weights, missions and times are made up.

const AIR_OPS = 'airops@catline.example';
const AIR_BOSS = 'airboss@catline.example';
const HANDLER = 'handler@catline.example';
const MINUTE = 60_000;

const pilot = (n: number) => (n === 1 ? 'pilot@catline.example' : `pilot${n}@catline.example`);

const strike = (side: string, grossWeightLb: number, extra: Partial<DemoSortie> = {}): DemoSortie => ({
  side,
  mission: 'Strike training',
  grossWeightLb,
  fuelLb: 11_500,
  stores: '4 practice bombs',
  ...extra,
});

const dayConditions = {
  shipCourseDeg: 40,
  shipSpeedKt: 22,
  trueWindFromDeg: 30,
  trueWindSpeedKt: 14,
  temperatureC: 22,
  pressureHpa: 1014,
  weatherCase: 'I',
  night: false,
} as const;

function cycleAt(
  number: number,
  planned: Date,
  conditions: Omit<CreateCycleDto, 'shipId' | 'number' | 'plannedLaunchAt' | 'windowStartAt' | 'windowEndAt'>,
) {
  return (shipId: number): CreateCycleDto => ({
    shipId,
    number,
    plannedLaunchAt: planned.toISOString(),
    windowStartAt: new Date(planned.getTime() - 10 * MINUTE).toISOString(),
    windowEndAt: new Date(planned.getTime() + 35 * MINUTE).toISOString(),
    ...conditions,
  });
}

const flownSorties: DemoSortie[] = [
  {
    side: 'L47',
    mission: 'Airborne early warning',
    grossWeightLb: 52_500,
    fuelLb: 11_000,
    earlyWarning: true,
    pilot: pilot(2),
  },
  {
    side: 'C30',
    mission: 'Recovery tanker',
    grossWeightLb: 49_800,
    fuelLb: 15_500,
    stores: 'Refuelling store',
    tanker: true,
    pilot: pilot(3),
  },
  strike('C21', 44_800, { pilot: pilot(1) }),
  strike('C22', 46_200, { pilot: pilot(4) }),
  strike('C23', 43_500, { pilot: pilot(5) }),
  strike('C24', 45_100, { pilot: pilot(9) }),
  strike('D33', 47_300, { pilot: pilot(6) }),
  strike('D34', 42_900, { pilot: pilot(7) }),
  {
    side: 'G43',
    mission: 'Close air support training',
    grossWeightLb: 27_400,
    fuelLb: 7_800,
    stores: '2 rocket pods',
    pilot: pilot(8),
  },
  // Its pilot comes from C24 when C24 goes down.
  strike('C31', 44_000, { spare: true, mission: 'Spare' }),
];

/** Catapult number, then its aircraft in launch order. */
const flownLanes: [number, string[]][] = [
  [1, ['L47', 'C21', 'C22']],
  [2, ['C30', 'D33']],
  [3, ['C23', 'C24']],
  [4, ['G43', 'D34']],
];

/** Each readiness step, seconds before the aircraft's launch. */
const STEPS_BEFORE_LAUNCH: [ReadinessStep, number][] = [
  ['taxiing', 50],
  ['on_catapult', 40],
  ['weight_agreed', 34],
  ['setting_set', 30],
  ['deflector_up', 26],
  ['tensioned', 20],
  ['run_up', 14],
  ['checks_clear', 9],
  ['pilot_ready', 5],
];
/** After a resume the aircraft is hooked up again: weight, setting and the rest once more. */
const STEPS_AFTER_RESUME = STEPS_BEFORE_LAUNCH.slice(2);

/** The flown cycle: planned, a reorder, a down aircraft replaced by the spare, a suspend, every launch, closed on the last. */
async function flyEarlierCycle(deck: DemoDeck, shipId: number, planned: Date): Promise<void> {
  deck.clock.at = new Date(planned.getTime() - 45 * MINUTE);
  const cycleId = await deck.createCycle(
    cycleAt(1, planned, { ...dayConditions, trueWindSpeedKt: 11, temperatureC: 19 })(shipId),
  );
  for (const sortie of flownSorties) {
    await deck.add(cycleId, AIR_OPS, sortie);
    deck.clock.advance(40);
  }
  for (const [catapult, sides] of flownLanes) {
    for (const [index, side] of sides.entries()) {
      await deck.move(cycleId, HANDLER, side, catapult, index);
      deck.clock.advance(25);
    }
  }
  await deck.move(cycleId, HANDLER, 'D34', 2, 1);
  deck.clock.advance(60);
  for (const sortie of flownSorties.filter((candidate) => candidate.pilot)) {
    await deck.acknowledgeWeight(cycleId, sortie.side);
    deck.clock.advance(20);
  }
  await deck.markDown(cycleId, HANDLER, 'C24', 'C31');
  deck.clock.advance(20);
  await deck.acknowledgeWeight(cycleId, 'C31');
  deck.clock.at = new Date(planned.getTime() - 8 * MINUTE);
  await deck.tickPrerequisites(cycleId, AIR_BOSS);
  deck.clock.at = new Date(planned.getTime() - 3 * MINUTE);
  await deck.readWind(cycleId, AIR_OPS, { trueWindFromDeg: 30, trueWindSpeedKt: 11 });
  deck.clock.at = new Date(planned.getTime() - 2 * MINUTE);
  await deck.start(cycleId, AIR_BOSS);

  // Each lane launches in turn; the pair gap and reset intervals are kept; D33 is suspended once.
  const events: { at: number; run: () => Promise<void> }[] = [];
  const lanes = (await deck.snapshot(cycleId)).lanes;
  for (const lane of lanes) {
    let launchAt = planned.getTime() + (lane.number - 1) * 13_000;
    for (const slotId of lane.slotIds) {
      const side = (await deck.snapshot(cycleId)).slots.find((slot) => slot.id === slotId)!.sideNumber;
      // D33 is suspended 9 s before its launch, at full power: the steps after that wait for the resume.
      const suspendedAt = side === 'D33' ? 9 : 0;
      for (const [step, before] of STEPS_BEFORE_LAUNCH.filter(([, before]) => before > suspendedAt)) {
        events.push({ at: launchAt - before * 1000, run: () => deck.advance(cycleId, side, step) });
      }
      if (side === 'D33') {
        events.push({ at: launchAt - 9_000, run: () => deck.suspend(cycleId, side, 'Launch bar not seated') });
        events.push({ at: launchAt + 25_000, run: () => deck.advance(cycleId, side, 'resume') });
        launchAt += 60_000;
        for (const [step, before] of STEPS_AFTER_RESUME) {
          events.push({ at: launchAt - before * 1000, run: () => deck.advance(cycleId, side, step) });
        }
      }
      events.push({ at: launchAt, run: () => deck.launch(cycleId, side) });
      launchAt += lane.number <= 2 ? 60_000 : 70_000;
    }
  }
  events.sort((a, b) => a.at - b.at);
  for (const event of events) {
    deck.clock.at = new Date(event.at);
    await event.run();
  }
}

const daySorties: DemoSortie[] = [
  {
    side: 'L47',
    mission: 'Airborne early warning',
    grossWeightLb: 53_000,
    fuelLb: 11_500,
    earlyWarning: true,
    pilot: pilot(2),
  },
  {
    side: 'C28',
    mission: 'Recovery tanker',
    grossWeightLb: 50_200,
    fuelLb: 16_000,
    stores: 'Refuelling store',
    tanker: true,
    pilot: pilot(3),
  },
  strike('C21', 45_400, { pilot: pilot(1) }),
  ...['C22', 'C23', 'C24', 'C25', 'C26', 'C27'].map((side, i) =>
    strike(side, 42_600 + i * 700, i < 3 ? { pilot: pilot(4 + i) } : {}),
  ),
  ...['D33', 'D34', 'D35', 'D36', 'D37', 'D38'].map((side, i) =>
    strike(side, 41_800 + i * 900, {
      mission: 'Air combat training',
      stores: '2 training rounds',
      pilot: i < 2 ? pilot(7 + i) : undefined,
    }),
  ),
  ...['G43', 'G44', 'G45'].map((side, i) => ({
    side,
    mission: 'Close air support training',
    grossWeightLb: 25_800 + i * 600,
    fuelLb: 7_500,
    stores: '2 rocket pods',
    pilot: i === 0 ? pilot(9) : undefined,
  })),
  {
    side: 'L48',
    mission: 'Airborne early warning',
    grossWeightLb: 51_900,
    fuelLb: 11_000,
    earlyWarning: true,
    spare: true,
  },
  strike('C29', 44_200, { spare: true, mission: 'Spare' }),
];

const dayLanes: [number, string[]][] = [
  [1, ['L47', 'C21']],
  [2, ['C28', 'D33']],
  [3, ['C22', 'D34']],
  [4, ['G43', 'C23']],
];

async function planDayCycle(deck: DemoDeck, shipId: number, planned: Date): Promise<void> {
  deck.clock.at = new Date(planned.getTime() - 70 * MINUTE);
  const cycleId = await deck.createCycle(cycleAt(2, planned, dayConditions)(shipId));
  for (const sortie of daySorties) {
    await deck.add(cycleId, AIR_OPS, sortie);
    deck.clock.advance(30);
  }
  for (const [catapult, sides] of dayLanes) {
    for (const [index, side] of sides.entries()) {
      await deck.move(cycleId, HANDLER, side, catapult, index);
      deck.clock.advance(20);
    }
  }
}

const nightSorties: DemoSortie[] = [
  {
    side: 'L49',
    mission: 'Airborne early warning',
    grossWeightLb: 52_000,
    fuelLb: 11_000,
    earlyWarning: true,
    pilot: pilot(2),
  },
  {
    side: 'C31',
    mission: 'Recovery tanker',
    grossWeightLb: 49_500,
    fuelLb: 15_000,
    stores: 'Refuelling store',
    tanker: true,
    pilot: pilot(3),
  },
  ...['C32', 'C25', 'C26'].map((side, i) =>
    strike(side, 43_000 + i * 800, { mission: 'Night strike training', pilot: pilot(4 + i) }),
  ),
  ...['D39', 'D40', 'D41', 'D42'].map((side, i) =>
    strike(side, 42_000 + i * 600, { mission: 'Night intercept training', stores: '2 training rounds' }),
  ),
  { side: 'G46', mission: 'Night close air support', grossWeightLb: 26_300, fuelLb: 7_600, stores: '2 rocket pods' },
];

async function planNightCycle(deck: DemoDeck, shipId: number, planned: Date): Promise<void> {
  deck.clock.at = new Date(planned.getTime() - 150 * MINUTE);
  const cycleId = await deck.createCycle(
    cycleAt(3, planned, {
      shipCourseDeg: 120,
      shipSpeedKt: 18,
      trueWindFromDeg: 150,
      trueWindSpeedKt: 10,
      temperatureC: 16,
      pressureHpa: 1016,
      weatherCase: 'III',
      night: true,
    })(shipId),
  );
  for (const sortie of nightSorties) {
    await deck.add(cycleId, AIR_OPS, sortie);
    deck.clock.advance(30);
  }
}

/** Adds the demo cycles to a freshly seeded fleet, around `now`: flown three hours ago, the next hour, the evening. */
export async function seedDemoCycles(dataSource: DataSource, shipId: number, now = new Date()): Promise<void> {
  const hour = new Date(Math.floor(now.getTime() / (60 * MINUTE)) * 60 * MINUTE);
  const deck = await DemoDeck.open(dataSource, now);
  await flyEarlierCycle(deck, shipId, new Date(hour.getTime() - 3 * 60 * MINUTE));
  await planDayCycle(deck, shipId, new Date(hour.getTime() + 2 * 60 * MINUTE));
  await planNightCycle(deck, shipId, new Date(hour.getTime() + 6 * 60 * MINUTE));
}
