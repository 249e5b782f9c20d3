import type { CycleView, LaneView, LineupSnapshot, SlotView } from '@catline/contracts';
import { READINESS_STEPS, applyLineupPatch } from '@catline/contracts';
import { diffSnapshots } from './lineup-diff.js';

const cycle = (version: number): CycleView => ({
  id: 1,
  shipId: 1,
  number: 4,
  plannedLaunchAt: '2026-12-02T10:00:00.000Z',
  windowStartAt: '2026-12-02T09:50:00.000Z',
  windowEndAt: '2026-12-02T10:30:00.000Z',
  shipCourseDeg: 270,
  shipSpeedKt: 20,
  trueWindFromDeg: 260,
  trueWindSpeedKt: 12,
  temperatureC: 18,
  pressureHpa: 1013,
  weatherCase: 'I',
  night: false,
  landingArea: 'clear',
  landingAreaReason: null,
  respot: null,
  state: 'planning',
  version,
  slotCount: 3,
  launchedCount: 0,
  windGustFromDeg: 260,
  windGustKt: 12,
  windLullFromDeg: 260,
  windLullKt: 12,
  windReadAt: '2026-12-02T09:40:00.000Z',
  windStaleAt: '2026-12-02T10:10:00.000Z',
  latitudeDeg: null,
  longitudeDeg: null,
  timeZone: 'UTC',
  launchPrerequisites: [],
});

const slot = (id: number, catapultId: number | null, position: number | null, version = 0): SlotView => ({
  id,
  cycleId: 1,
  aircraftId: id,
  sideNumber: String(200 + id),
  typeId: 1,
  typeDesignation: 'WKD-41',
  aircraftClass: 'jet',
  squadronId: 1,
  squadronCode: 'CWR',
  pilotId: null,
  pilotName: null,
  mission: 'strike',
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
  catapultId,
  downFromCatapultId: null,
  position,
  status: 'planned',
  version,
  trimDeg: 15,
  afterburnerRequired: false,
  departure: 'case I',
  pilotWeightAckAt: null,
  pilotWeightAckLb: null,
  agreedWeightLb: null,
  catapultWeightAckAt: null,
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
});

const lane = (catapultId: number, slotIds: number[]): LaneView => ({
  catapultId,
  number: catapultId,
  position: 'bow',
  status: 'up',
  closed: false,
  deckClear: true,
  deckHoldReason: null,
  headwindKt: 30,
  crosswindKt: 2,
  crosswindSide: 'port',
  slotIds,
  readinessSteps: [...READINESS_STEPS],
  go: true,
});

const snapshot = (version: number, parts: Partial<LineupSnapshot>): LineupSnapshot => ({
  cycle: cycle(version),
  lanes: [lane(1, []), lane(2, [])],
  pool: [],
  slots: [],
  readinessSteps: [],
  lastLaunchAt: null,
  version,
  ...parts,
});

describe('diffSnapshots', () => {
  const before = snapshot(4, {
    lanes: [lane(1, [1, 2]), lane(2, [])],
    pool: [3],
    slots: [slot(1, 1, 0), slot(2, 1, 1), slot(3, null, null)],
    lastLaunchAt: '2026-12-02T10:03:00.000Z',
  });

  it('carries only the slots and lanes that changed, and the pool when it changed', () => {
    const after = snapshot(5, {
      lanes: [lane(1, [1]), lane(2, [2])],
      pool: [3],
      slots: [slot(1, 1, 0), slot(2, 2, 0, 1), slot(3, null, null)],
      lastLaunchAt: '2026-12-02T10:03:00.000Z',
    });
    const patch = diffSnapshots(before, after);
    expect(patch.slots?.map((view) => view.id)).toEqual([2]);
    expect(patch.lanes?.map((view) => view.catapultId)).toEqual([1, 2]);
    expect(patch).not.toHaveProperty('pool');
    expect(patch).not.toHaveProperty('lastLaunchAt');
    expect(patch.cycle?.version).toBe(5);
  });

  it('names a last launch that became null', () => {
    const after = { ...before, cycle: cycle(5), version: 5, lastLaunchAt: null };
    const patch = diffSnapshots(before, after);
    expect(patch).toHaveProperty('lastLaunchAt', null);
    expect(patch).not.toHaveProperty('slots');
    expect(patch).not.toHaveProperty('lanes');
  });

  it('includes new slots and a changed pool', () => {
    const after = snapshot(5, {
      lanes: before.lanes,
      pool: [3, 4],
      slots: [...before.slots, slot(4, null, null)],
      lastLaunchAt: before.lastLaunchAt,
    });
    const patch = diffSnapshots(before, after);
    expect(patch.slots?.map((view) => view.id)).toEqual([4]);
    expect(patch.pool).toEqual([3, 4]);
  });

  it('turns the earlier snapshot into the later one when the client applies it', () => {
    const after = snapshot(5, {
      lanes: [lane(1, [2, 1]), lane(2, [3])],
      pool: [4],
      slots: [slot(1, 1, 1, 1), slot(2, 1, 0, 1), slot(3, 2, 0, 1), slot(4, null, null)],
      lastLaunchAt: '2026-12-02T10:05:00.000Z',
    });
    expect(applyLineupPatch(before, 5, diffSnapshots(before, after))).toEqual(after);
  });

  it('is empty apart from the cycle between equal lineups', () => {
    const after = { ...before, cycle: cycle(5), version: 5 };
    expect(Object.keys(diffSnapshots(before, after))).toEqual(['cycle']);
  });
});
