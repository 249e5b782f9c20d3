import { READINESS_STEPS, type CycleView, type LaneView, type LineupSnapshot, type SlotView } from '@catline/contracts';
import { describe, expect, it } from 'vitest';
import {
  containersOf,
  isMovable,
  laneCounts,
  laneMarks,
  lineupWarnings,
  moveSlotLocally,
  placeName,
  slotsById,
} from './lineup-model.js';

const cycle: CycleView = {
  id: 7,
  shipId: 1,
  number: 3,
  state: 'planning',
  version: 12,
  slotCount: 5,
  launchedCount: 0,
  windGustFromDeg: 0,
  windGustKt: 10,
  windLullFromDeg: 0,
  windLullKt: 10,
  windReadAt: '2026-12-02T05:30:00.000Z',
  windStaleAt: '2026-12-02T06:00:00.000Z',
  latitudeDeg: null,
  longitudeDeg: null,
  timeZone: 'UTC',
  launchPrerequisites: [],
  plannedLaunchAt: '2026-12-02T10:00:00.000Z',
  windowStartAt: '2026-12-02T09:55:00.000Z',
  windowEndAt: '2026-12-02T10:20:00.000Z',
  shipCourseDeg: 0,
  shipSpeedKt: 20,
  trueWindFromDeg: 0,
  trueWindSpeedKt: 10,
  temperatureC: 15,
  pressureHpa: 1013,
  weatherCase: 'I',
  night: false,
  landingArea: 'clear',
  landingAreaReason: null,
  respot: null,
};

function slot(
  id: number,
  sideNumber: string,
  place: { catapultId: number; position: number } | null,
  extra: Partial<SlotView> = {},
): SlotView {
  return {
    id,
    cycleId: cycle.id,
    aircraftId: id,
    sideNumber,
    typeId: 1,
    typeDesignation: 'KX-9',
    aircraftClass: 'jet',
    squadronId: 1,
    squadronCode: 'VX-41',
    pilotId: id,
    pilotName: `Pilot ${id}`,
    mission: 'CAP',
    fuelLb: 9000,
    stores: '',
    storesList: [],
    grossWeightLb: 42_000,
    grossWeightParts: null,
    armState: null,
    armStateAt: null,
    armStateBy: null,
    tanker: false,
    earlyWarning: false,
    spare: false,
    heldSpare: false,
    catapultId: place?.catapultId ?? null,
    downFromCatapultId: null,
    position: place?.position ?? null,
    status: 'planned',
    version: 1,
    trimDeg: null,
    afterburnerRequired: false,
    departure: 'Case I',
    pilotWeightAckAt: '2026-12-02T09:40:00.000Z',
    pilotWeightAckLb: 44_000,
    agreedWeightLb: 44_000,
    catapultWeightAckAt: '2026-12-02T09:41:00.000Z',
    weightAgreedBy: null,
    settingReadBack: null,
    holdbackElement: null,
    suspendReason: null,
    overrideReason: null,
    reverifyCause: null,
    waivers: [],
    launchedAt: null,
    statusAt: null,
    statusBy: null,
    projectedLaunchAt: null,
    missesWindow: false,
    timing: null,
    figures: null,
    launchRecord: null,
    gates: null,
    deckPosition: { kind: 'spot', name: `spot-${id}` },
    mustMove: [],
    ...extra,
  };
}

function lane(catapultId: number, number: number, slotIds: number[], extra: Partial<LaneView> = {}): LaneView {
  return {
    catapultId,
    number,
    position: 'bow',
    status: 'up',
    closed: false,
    deckClear: true,
    deckHoldReason: null,
    slotIds,
    readinessSteps: [...READINESS_STEPS],
    go: true,
    headwindKt: 30,
    crosswindKt: 0,
    crosswindSide: 'none',
    ...extra,
  };
}

// Cat 1 (id 11) holds C21 then C22; cat 2 (id 12) holds D33; the pool holds C30 and G43 by side number.
function board(): LineupSnapshot {
  return {
    cycle,
    lanes: [lane(11, 1, [1, 2]), lane(12, 2, [3])],
    pool: [5, 4],
    slots: [
      slot(1, 'C21', { catapultId: 11, position: 0 }),
      slot(2, 'C22', { catapultId: 11, position: 1 }),
      slot(3, 'D33', { catapultId: 12, position: 0 }),
      slot(4, 'G43', null),
      slot(5, 'C30', null),
    ],
    readinessSteps: [],
    lastLaunchAt: null,
    version: 12,
  };
}

const move = (slotId: number, toCatapultId: number | null, toIndex: number) => ({
  slotId,
  slotVersion: 1,
  toCatapultId,
  toIndex,
  targetLaneOrder: [],
});
const placeOf = (snapshot: LineupSnapshot, id: number) => {
  const found = snapshot.slots.find((candidate) => candidate.id === id)!;
  return { catapultId: found.catapultId, position: found.position };
};

describe('moveSlotLocally', () => {
  it('moves a slot from the pool into a lane and renumbers the places behind it', () => {
    const moved = moveSlotLocally(board(), move(4, 11, 1));
    expect(moved.lanes[0].slotIds).toEqual([1, 4, 2]);
    expect(moved.pool).toEqual([5]);
    expect(placeOf(moved, 4)).toEqual({ catapultId: 11, position: 1 });
    expect(placeOf(moved, 2)).toEqual({ catapultId: 11, position: 2 });
  });

  it('moves a slot between lanes, closing the gap it leaves', () => {
    const moved = moveSlotLocally(board(), move(1, 12, 0));
    expect(moved.lanes.map((each) => each.slotIds)).toEqual([[2], [1, 3]]);
    expect(placeOf(moved, 2)).toEqual({ catapultId: 11, position: 0 });
    expect(placeOf(moved, 3)).toEqual({ catapultId: 12, position: 1 });
  });

  it('returns a slot to the pool, kept in side-number order with numbers compared as numbers', () => {
    const snapshot = board();
    snapshot.slots[1] = { ...snapshot.slots[1], sideNumber: 'C9' };
    const moved = moveSlotLocally(snapshot, move(2, null, 0));
    expect(moved.pool).toEqual([2, 5, 4]);
    expect(placeOf(moved, 2)).toEqual({ catapultId: null, position: null });
  });

  it('puts a slot asked for past the end of a lane at its end', () => {
    expect(moveSlotLocally(board(), move(5, 12, 40)).lanes[1].slotIds).toEqual([3, 5]);
  });

  it('keeps the slots it did not move as the same objects and leaves the input as it was', () => {
    const snapshot = board();
    const moved = moveSlotLocally(snapshot, move(4, 12, 1));
    expect(moved.slots[0]).toBe(snapshot.slots[0]);
    expect(snapshot.lanes[1].slotIds).toEqual([3]);
    expect(snapshot.pool).toEqual([5, 4]);
  });
});

describe('the board model', () => {
  it('gives one container per lane and one for the pool', () => {
    expect(containersOf(board())).toEqual({ pool: [5, 4], 'lane:11': [1, 2], 'lane:12': [3] });
  });

  it('names places as a person reads them, counting from one', () => {
    expect(placeName(board(), 'lane:12', 0)).toBe('catapult 2, place 1');
    expect(placeName(board(), 'lane:11')).toBe('catapult 1');
    expect(placeName(board(), 'pool', 3)).toBe('the deck pool');
  });

  it('lets only planned aircraft move', () => {
    expect(isMovable(slot(1, 'C21', null))).toBe(true);
    expect(isMovable(slot(1, 'C21', null, { status: 'taxiing' }))).toBe(false);
  });
});

describe('the marks and counts of a lane', () => {
  // Cat 1 holds C21, C22, C23, C24 in launch order.
  function lane1(...statuses: SlotView['status'][]) {
    const snapshot = board();
    const sides = ['C21', 'C22', 'C23', 'C24'];
    snapshot.slots = statuses.map((status, index) =>
      slot(index + 1, sides[index], { catapultId: 11, position: index }, { status }),
    );
    snapshot.lanes = [
      lane(
        11,
        1,
        snapshot.slots.map((each) => each.id),
      ),
    ];
    return { lane: snapshot.lanes[0], slots: slotsById(snapshot) };
  }
  const marked = ({ lane: one, slots }: ReturnType<typeof lane1>) =>
    Object.fromEntries([...laneMarks(one, slots)].map(([id, mark]) => [slots.get(id)!.sideNumber, mark]));

  it('marks the first aircraft still to launch as next while nobody is on the catapult', () => {
    expect(marked(lane1('planned', 'planned', 'planned'))).toEqual({ C21: 'next' });
    expect(marked(lane1('taxiing', 'planned'))).toEqual({ C21: 'next' });
  });

  it('marks the aircraft hooked up, or held on the catapult by a suspend, and the one behind it', () => {
    expect(marked(lane1('launched', 'weight_agreed', 'planned', 'planned'))).toEqual({
      C22: 'on-catapult',
      C23: 'next',
    });
    expect(marked(lane1('suspended', 'planned'))).toEqual({ C21: 'on-catapult', C22: 'next' });
    expect(marked(lane1('launched', 'launched', 'tensioned'))).toEqual({ C23: 'on-catapult' });
  });

  it('marks nothing in a lane whose aircraft have all gone', () => {
    expect(marked(lane1('launched', 'launched'))).toEqual({});
  });

  it('counts aircraft off, still to go and late', () => {
    const one = lane1('launched', 'on_catapult', 'planned', 'planned');
    one.slots.set(4, { ...one.slots.get(4)!, missesWindow: true });
    expect(laneCounts(one.lane, one.slots)).toEqual({ launched: 1, toGo: 3, late: 1, down: 0 });
  });

  it("counts the aircraft gone down out of the lane's order, not those down from another catapult or the pool", () => {
    const one = lane1('launched', 'planned');
    const gone = (id: number, side: string, downFromCatapultId: number | null) =>
      slot(id, side, null, { status: 'down', downFromCatapultId });
    one.slots.set(5, gone(5, 'C25', 11));
    one.slots.set(6, gone(6, 'C26', 11));
    one.slots.set(7, gone(7, 'C27', 12));
    one.slots.set(8, gone(8, 'C28', null));
    expect(laneCounts(one.lane, one.slots)).toEqual({ launched: 1, toGo: 1, late: 0, down: 2 });
  });
});

describe('lineupWarnings', () => {
  const clock = (iso: string) => iso.slice(11, 16);

  it('has nothing to say about a ready board with agreed weights', () => {
    expect(lineupWarnings(board(), clock)).toEqual([]);
  });

  it('puts a down catapult with aircraft waiting first, then no-go, window and weight warnings', () => {
    const snapshot = board();
    snapshot.lanes[1] = lane(12, 2, [3], { status: 'down' });
    snapshot.slots[0] = {
      ...snapshot.slots[0],
      missesWindow: true,
      projectedLaunchAt: '2026-12-02T10:25:00.000Z',
      pilotWeightAckAt: null,
    };
    snapshot.slots[1] = {
      ...snapshot.slots[1],
      figures: {
        catapultSetting: null,
        crossCheckSetting: null,
        crossCheckFlagged: null,
        endSpeedKt: 120,
        requiredAirspeedKt: 140,
        requiredWindOverDeckKt: 30,
        marginKt: -4,
        excessWindOverDeckKt: 6,
        recommendedExcessKt: 10,
        go: false,
        reasons: [{ code: 'margin_negative', message: 'End speed is 4 kt short.' }],
        clearingTurnDeg: 10,
        headwindKt: 26,
        crosswindKt: 0,
        crosswindSide: 'none',
      },
    };
    expect(lineupWarnings(snapshot, clock)).toEqual([
      { kind: 'catapult_down', key: 'down-12', text: 'Cat 2 is down with 1 aircraft still in its lane.' },
      {
        kind: 'missed_window',
        key: 'window-1',
        text: 'C21 misses the launch window (projected 10:25, window ends 10:20).',
      },
      { kind: 'no_go', key: 'nogo-2', text: 'C22 on cat 1 is no-go: End speed is 4 kt short.' },
    ]);
  });

  it('says nothing of gross weights while the cycle is planned: they are agreed at the catapult', () => {
    const snapshot = board();
    snapshot.slots = snapshot.slots.map((each) => ({ ...each, pilotWeightAckAt: null, catapultWeightAckAt: null }));
    expect(lineupWarnings(snapshot, clock)).toEqual([]);
  });

  it('once launching, warns only about the aircraft on each catapult and the next one', () => {
    const snapshot = board();
    snapshot.cycle = { ...cycle, state: 'executing' };
    // Cat 1: C21 on the catapult, C22 next, C23 behind them; cat 2: D33 next. Nobody has agreed a weight.
    snapshot.lanes[0] = lane(11, 1, [1, 2, 6]);
    snapshot.slots = [
      ...snapshot.slots.map((each) => ({ ...each, pilotWeightAckAt: null, catapultWeightAckAt: null })),
      slot(6, 'C23', { catapultId: 11, position: 2 }, { missesWindow: true, pilotWeightAckAt: null }),
    ];
    snapshot.slots[0] = { ...snapshot.slots[0], status: 'on_catapult', pilotWeightAckAt: '2026-12-02T09:40:00.000Z' };
    snapshot.slots[1] = { ...snapshot.slots[1], missesWindow: true };
    expect(lineupWarnings(snapshot, clock)).toEqual([
      { kind: 'missed_window', key: 'window-2', text: 'C22 misses the launch window.' },
      {
        kind: 'weight_not_agreed',
        key: 'weight-1',
        text: 'C21, on cat 1: gross weight not yet agreed by the catapult officer.',
      },
      {
        kind: 'weight_not_agreed',
        key: 'weight-2',
        text: 'C22, next on cat 1: gross weight not yet agreed by the pilot and the catapult officer.',
      },
      {
        kind: 'weight_not_agreed',
        key: 'weight-3',
        text: 'D33, next on cat 2: gross weight not yet agreed by the pilot and the catapult officer.',
      },
    ]);
  });

  it('has no warnings for a closed cycle', () => {
    const snapshot = board();
    snapshot.cycle = { ...cycle, state: 'closed' };
    snapshot.lanes[1] = lane(12, 2, [3], { status: 'down' });
    expect(lineupWarnings(snapshot, clock)).toEqual([]);
  });

  it('does not repeat a down or closed catapult as a no-go reason of each aircraft in its lane', () => {
    const snapshot = board();
    snapshot.lanes[1] = lane(12, 2, [3], { closed: true });
    snapshot.slots[2] = {
      ...snapshot.slots[2],
      figures: {
        catapultSetting: 20,
        crossCheckSetting: 20,
        crossCheckFlagged: false,
        endSpeedKt: 150,
        requiredAirspeedKt: 140,
        requiredWindOverDeckKt: 10,
        marginKt: 20,
        excessWindOverDeckKt: 30,
        recommendedExcessKt: 10,
        go: false,
        reasons: [{ code: 'catapult_closed', message: 'Cat 2 is closed.' }],
        clearingTurnDeg: 10,
        headwindKt: 26,
        crosswindKt: 0,
        crosswindSide: 'none',
      },
    };
    expect(lineupWarnings(snapshot, clock).map((warning) => warning.key)).toEqual(['closed-12']);
  });

  it('names the aircraft that must move when the lineup sends one parked behind it', () => {
    const snapshot = board();
    snapshot.slots[1] = { ...snapshot.slots[1], mustMove: ['C21', 'D40'] };
    expect(lineupWarnings(snapshot, clock)).toEqual([
      {
        kind: 'spot_blocked',
        key: 'blocked-2',
        text: 'C22 on cat 1 cannot taxi out: C21, D40 parked in front must move first.',
      },
    ]);
  });

  it('ignores aircraft already launched, down or scratched', () => {
    const snapshot = board();
    snapshot.lanes[0] = lane(11, 1, [1, 2], { status: 'down' });
    snapshot.slots[0] = { ...snapshot.slots[0], status: 'launched', pilotWeightAckAt: null };
    snapshot.slots[1] = { ...snapshot.slots[1], status: 'scratched', missesWindow: true };
    expect(lineupWarnings(snapshot, clock)).toEqual([]);
  });

  it('names every aircraft still to fly that has no pilot, but not a spare held aside', () => {
    const snapshot = board();
    snapshot.slots[0] = { ...snapshot.slots[0], pilotId: null, pilotName: null };
    snapshot.slots[1] = { ...snapshot.slots[1], pilotId: null, pilotName: null, spare: true, heldSpare: true };
    const warnings = lineupWarnings(snapshot, clock).filter((warning) => warning.kind === 'no_pilot');
    expect(warnings.map((warning) => warning.text)).toEqual([`No pilot assigned to ${snapshot.slots[0].sideNumber}.`]);
  });
});
