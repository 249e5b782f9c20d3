import type { ChangeKind, LineupChange, SlotStatus, SlotView } from '@catline/contracts';
import type { Cycle } from '../database/entities/cycle.entity.js';
import type { Slot } from '../database/entities/slot.entity.js';
import type { LineupState } from '../cycle-changes/lineup-state.js';
import type { Catapult } from '../database/entities/catapult.entity.js';
import type { Ship } from '../database/entities/ship.entity.js';
import { buildCycleReport } from './cycle-report.builder.js';

// A small invented cycle; every expected figure is worked by hand from its times (common practice, no source).

const t = (clock: string) => `2027-01-05T${clock}.000Z`;

const cycle = {
  id: 1,
  shipId: 1,
  number: 12,
  plannedLaunchAt: new Date(t('10:00:00')),
  windowStartAt: new Date(t('09:50:00')),
  windowEndAt: new Date(t('10:35:00')),
  shipCourseDeg: 0,
  shipSpeedKt: 25,
  trueWindFromDeg: 0,
  trueWindSpeedKt: 10,
  windGustFromDeg: 0,
  windGustKt: 10,
  windLullFromDeg: 0,
  windLullKt: 10,
  windReadAt: new Date(t('09:45:00')),
  latitudeDeg: null,
  longitudeDeg: null,
  temperatureC: 20,
  pressureHpa: 1013,
  weatherCase: 'I',
  night: false,
  state: 'closed',
  version: 0,
} as Cycle;

const catapult = (id: number, number: number, pair: number) =>
  ({ id, number, pair, position: number <= 2 ? 'bow' : 'waist', resetIntervalS: 55 }) as Catapult;

const squadrons = {
  CWR: { id: 1, code: 'CWR', name: 'Cinderwrights' },
  DFM: { id: 2, code: 'DFM', name: 'Driftmenders' },
  GSB: { id: 3, code: 'GSB', name: 'Gorsebinders' },
};

interface SlotFields {
  id: number;
  side: string;
  squadron: keyof typeof squadrons;
  status: SlotStatus;
  catapultId?: number | null;
  launchedAt?: string;
  overrideReason?: string;
  replacedBySlotId?: number;
}

const slot = (fields: SlotFields) =>
  ({
    id: fields.id,
    cycleId: 1,
    aircraftId: fields.id,
    aircraft: {
      sideNumber: fields.side,
      squadronId: squadrons[fields.squadron].id,
      squadron: squadrons[fields.squadron],
      type: { designation: 'WKD-41' },
    },
    pilot: null,
    mission: 'Strike training',
    status: fields.status,
    catapultId: fields.catapultId ?? null,
    launchedAt: fields.launchedAt ? new Date(fields.launchedAt) : null,
    overrideReason: fields.overrideReason ?? null,
    replacedBySlotId: fields.replacedBySlotId ?? null,
    launchRecord: null,
  }) as unknown as Slot;

const state: LineupState = {
  cycle,
  ship: { pairGapS: 10, profile: {} } as Ship,
  catapults: [catapult(11, 1, 1), catapult(12, 2, 1), catapult(13, 3, 2)],
  slots: [
    slot({ id: 1, side: 'C21', squadron: 'CWR', status: 'launched', catapultId: 11, launchedAt: t('10:00:05') }),
    slot({
      id: 2,
      side: 'C22',
      squadron: 'CWR',
      status: 'launched',
      catapultId: 11,
      launchedAt: t('10:01:10'),
      overrideReason: 'Crosswind checked by hand',
    }),
    slot({ id: 3, side: 'D33', squadron: 'DFM', status: 'down', replacedBySlotId: 4 }),
    slot({ id: 4, side: 'D34', squadron: 'DFM', status: 'launched', catapultId: 12, launchedAt: t('10:00:50') }),
    slot({ id: 5, side: 'D35', squadron: 'DFM', status: 'launched', catapultId: 12, launchedAt: t('10:36:00') }),
    slot({ id: 6, side: 'G43', squadron: 'GSB', status: 'scratched' }),
    slot({ id: 7, side: 'C29', squadron: 'CWR', status: 'scratched' }),
  ],
};

let version = 0;
const change = (kind: ChangeKind, at: string, by: string, slots: Partial<SlotView>[]): LineupChange => ({
  cycleId: 1,
  version: ++version,
  kind,
  actor: { id: 1, name: by, role: 'handler' },
  at: t(at),
  summary: kind,
  patch: { slots: slots.map((fields) => ({ projectedLaunchAt: null, suspendReason: null, ...fields }) as SlotView) },
});

const HANDLER = 'Tomas Ebberhold';
const changes = [
  change('slot_moved', '09:40:00', HANDLER, [
    { id: 1, status: 'planned', catapultId: 11, projectedLaunchAt: t('10:00:00') },
    { id: 2, status: 'planned', catapultId: 11, projectedLaunchAt: t('10:00:55') },
    { id: 3, status: 'planned', catapultId: 12, projectedLaunchAt: t('10:00:10') },
    { id: 4, status: 'planned', catapultId: null },
    { id: 5, status: 'planned', catapultId: 12, projectedLaunchAt: t('10:01:05') },
    { id: 6, status: 'planned', catapultId: 13, projectedLaunchAt: t('10:00:20') },
    { id: 7, status: 'planned', catapultId: null },
  ]),
  change('cycle_started', '09:58:00', 'Priya Quennevar', []),
  change('slot_launched', '10:00:05', 'Lia Corrimand', [{ id: 1, status: 'launched', catapultId: 11 }]),
  change('aircraft_down', '10:00:30', HANDLER, [
    { id: 3, status: 'down', catapultId: null },
    { id: 4, status: 'planned', catapultId: 12, projectedLaunchAt: t('10:00:50') },
  ]),
  change('slot_launched', '10:00:50', 'Sam Dellavint', [{ id: 4, status: 'launched', catapultId: 12 }]),
  change('slot_suspended', '10:01:00', 'Sam Dellavint', [
    { id: 5, status: 'suspended', catapultId: 12, suspendReason: 'Launch bar not seated' },
  ]),
  change('slot_launched', '10:01:10', 'Lia Corrimand', [{ id: 2, status: 'launched', catapultId: 11 }]),
  change('slot_advanced', '10:02:00', 'Sam Dellavint', [{ id: 5, status: 'on_catapult', catapultId: 12 }]),
  change('slot_launched', '10:36:00', 'Sam Dellavint', [{ id: 5, status: 'launched', catapultId: 12 }]),
  change('cycle_closed', '10:40:00', 'Priya Quennevar', [
    { id: 6, status: 'scratched', catapultId: null },
    { id: 7, status: 'scratched', catapultId: null },
  ]),
];

describe('buildCycleReport', () => {
  const report = buildCycleReport({ state, changes });
  const lane = (number: number) => report.catapults.find((catapult) => catapult.number === number)!;

  it('puts launches on their catapult in launch order, then what was planned there and did not launch', () => {
    expect(lane(1).launches.map((line) => line.sideNumber)).toEqual(['C21', 'C22']);
    expect(lane(2).launches.map((line) => line.sideNumber)).toEqual(['D34', 'D35', 'D33']);
    expect(lane(3).launches.map((line) => [line.sideNumber, line.status, line.plannedAt])).toEqual([
      ['G43', 'scratched', t('10:00:20')],
    ]);
  });

  it('compares each launch with the time planned when the cycle started', () => {
    expect(report.plannedBasis).toBe('cycle_start');
    expect(report.plannedAtVersion).toBe(2);
    const delta = (side: string) =>
      report.catapults.flatMap((catapult) => catapult.launches).find((line) => line.sideNumber === side)!.deltaS;
    expect(delta('C21')).toBe(5); // 10:00:00 → 10:00:05
    expect(delta('C22')).toBe(15); // 10:00:55 → 10:01:10
    expect(delta('D35')).toBe(2095); // 10:01:05 → 10:36:00
  });

  it('gives a spare that was in the deck pool at the start the planned time of the aircraft it replaced', () => {
    const spare = lane(2).launches.find((line) => line.sideNumber === 'D34')!;
    expect(spare).toMatchObject({ plannedAt: t('10:00:10'), plannedCatapultNumber: 2, deltaS: 40 }); // 10:00:10 → 10:00:50
  });

  it('measures intervals per catapult and per pair', () => {
    expect(lane(1).intervals.map((interval) => interval.seconds)).toEqual([65]); // 10:00:05 → 10:01:10
    expect(lane(2).intervals.map((interval) => interval.seconds)).toEqual([2110]); // 10:00:50 → 10:36:00
    expect(lane(3).intervals).toEqual([]);
    const [bow, waist] = report.pairs;
    expect(bow).toMatchObject({ pair: 1, catapultNumbers: [1, 2], minimumGapS: 10 });
    // 101 10:00:05, 202 10:00:50, 102 10:01:10, 203 10:36:00
    expect(bow.intervals.map((interval) => [interval.fromSideNumber, interval.toSideNumber, interval.seconds])).toEqual(
      [
        ['C21', 'D34', 45],
        ['D34', 'C22', 20],
        ['C22', 'D35', 2090],
      ],
    );
    expect(bow.spread).toEqual({ shortestS: 20, meanS: 718.333, longestS: 2090 }); // 2155 / 3 = 718.333…
    expect(waist.intervals).toEqual([]);
  });

  it('judges each launch against the cycle window', () => {
    const verdicts = report.catapults
      .flatMap((catapult) => catapult.launches)
      .map((line) => [line.sideNumber, line.inWindow]);
    expect(verdicts).toEqual([
      ['C21', true],
      ['C22', true],
      ['D34', true],
      ['D35', false],
      ['D33', null],
      ['G43', null],
    ]);
  });

  it('lists the suspend, the down aircraft with its spare, and the waiver with who launched', () => {
    expect(report.suspends).toEqual([
      {
        slotId: 5,
        sideNumber: 'D35',
        squadronCode: 'DFM',
        catapultNumber: 2,
        at: t('10:01:00'),
        reason: 'Launch bar not seated',
        by: 'Sam Dellavint',
        resumedAt: t('10:02:00'),
      },
    ]);
    expect(report.downs).toEqual([
      {
        slotId: 3,
        sideNumber: 'D33',
        squadronCode: 'DFM',
        catapultNumber: 2,
        at: t('10:00:30'),
        by: HANDLER,
        spare: { slotId: 4, sideNumber: 'D34', squadronCode: 'DFM' },
      },
    ]);
    expect(report.waivers).toEqual([
      {
        slotId: 2,
        sideNumber: 'C22',
        squadronCode: 'CWR',
        catapultNumber: 1,
        launchedAt: t('10:01:10'),
        reason: 'Crosswind checked by hand',
        by: 'Lia Corrimand',
      },
    ]);
  });

  it('sums the figures for the cycle and per squadron', () => {
    expect(report.totals).toEqual({
      aircraft: 7,
      launched: 4,
      onTime: 3,
      outsideWindow: 1,
      suspends: 1,
      down: 1,
      waivers: 1,
      scratched: 2,
    });
    expect(report.squadrons).toEqual([
      {
        squadronId: 1,
        squadronCode: 'CWR',
        squadronName: 'Cinderwrights',
        aircraft: 3,
        launched: 2,
        onTime: 2,
        outsideWindow: 0,
        suspends: 0,
        down: 0,
        waivers: 1,
        scratched: 1,
      },
      {
        squadronId: 2,
        squadronCode: 'DFM',
        squadronName: 'Driftmenders',
        aircraft: 3,
        launched: 2,
        onTime: 1,
        outsideWindow: 1,
        suspends: 1,
        down: 1,
        waivers: 0,
        scratched: 0,
      },
      {
        squadronId: 3,
        squadronCode: 'GSB',
        squadronName: 'Gorsebinders',
        aircraft: 1,
        launched: 0,
        onTime: 0,
        outsideWindow: 0,
        suspends: 0,
        down: 0,
        waivers: 0,
        scratched: 1,
      },
    ]);
  });

  it('records when the cycle started, closed, and launched first and last', () => {
    expect(report).toMatchObject({
      startedAt: t('09:58:00'),
      closedAt: t('10:40:00'),
      firstLaunchAt: t('10:00:05'),
      lastLaunchAt: t('10:36:00'),
    });
    expect(report.cycle).toMatchObject({ id: 1, number: 12, slotCount: 7, launchedCount: 4 });
  });
});
