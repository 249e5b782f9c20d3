import fc from 'fast-check';
import type { CycleView } from './cycles.js';
import {
  type CycleFollow,
  type FollowStep,
  followChange,
  followJoin,
  followJoinAsked,
  followJoinFailed,
  followSnapshot,
  startFollow,
} from './cycle-follow.js';
import { type LaneView, type LineupChange, type LineupSnapshot, READINESS_STEPS } from './lineup.js';
import { applyLineupChanges } from './lineup-patch.js';

// A fresh seed every run, printed so a failure can be replayed with FOLLOW_SEED=<seed>.
const seed = Number(process.env.FOLLOW_SEED ?? Math.floor(Math.random() * 2 ** 31));
beforeAll(() => console.info(`cycle-follow properties: seed ${seed} (FOLLOW_SEED=${seed} replays it)`));

const LANES = 4;

const cycle: CycleView = {
  id: 7,
  shipId: 1,
  number: 3,
  plannedLaunchAt: '2026-12-02T06:00:00.000Z',
  windowStartAt: '2026-12-02T05:45:00.000Z',
  windowEndAt: '2026-12-02T06:30:00.000Z',
  state: 'executing',
  version: 0,
  slotCount: 0,
  launchedCount: 0,
  windGustFromDeg: 80,
  windGustKt: 12,
  windLullFromDeg: 80,
  windLullKt: 12,
  windReadAt: '2026-12-02T05:30:00.000Z',
  windStaleAt: '2026-12-02T06:00:00.000Z',
  latitudeDeg: null,
  longitudeDeg: null,
  timeZone: 'UTC',
  launchPrerequisites: [],
  shipCourseDeg: 90,
  shipSpeedKt: 20,
  trueWindFromDeg: 80,
  trueWindSpeedKt: 12,
  temperatureC: 15,
  pressureHpa: 1013,
  weatherCase: 'I',
  night: false,
  landingArea: 'clear',
  landingAreaReason: null,
  respot: null,
};

function lane(catapultId: number, slotIds: number[]): LaneView {
  return {
    catapultId,
    number: catapultId,
    position: catapultId <= 2 ? 'bow' : 'waist',
    status: 'up',
    closed: false,
    deckClear: true,
    deckHoldReason: null,
    slotIds,
    go: true,
    headwindKt: 30,
    crosswindKt: 2,
    crosswindSide: 'port',
    readinessSteps: [...READINESS_STEPS],
  };
}

/** The server's side: a start snapshot and its changes, each touching one lane (so a skipped one shows). */
function serverHistory(startVersion: number, laneOfChange: readonly number[]) {
  const start: LineupSnapshot = {
    cycle: { ...cycle, version: startVersion },
    lanes: Array.from({ length: LANES }, (_, i) => lane(i + 1, [])),
    pool: [],
    slots: [],
    readinessSteps: [],
    lastLaunchAt: null,
    version: startVersion,
  };
  const changes: LineupChange[] = laneOfChange.map((laneIndex, i) => {
    const version = startVersion + i + 1;
    return {
      cycleId: cycle.id,
      version,
      kind: 'slot_moved',
      actor: { id: 1, name: 'Handler', role: 'handler' },
      at: new Date(Date.UTC(2026, 11, 2, 6, 0, i)).toISOString(),
      summary: `change ${version}`,
      patch: { lanes: [lane(laneIndex + 1, [version])], pool: [version] },
    };
  });
  const states = new Map<number, LineupSnapshot>([[startVersion, start]]);
  changes.forEach((change, i) => states.set(change.version, applyLineupChanges(start, changes.slice(0, i + 1))));
  return { start, changes, states };
}

type PendingJoin = { sinceVersion: number | undefined };

interface Delivery {
  /** Copies of each broadcast that reach the client (0 = dropped); the last always arrives. */
  copies: number[];
  /** Picks the next event among those possible, and which message or join it is. */
  choices: number[];
  /** Whether each rejoin's answer is lost (the client then asks again); past the list none is. */
  lostAnswers: boolean[];
  /** Past this many missed changes the server answers a snapshot instead of a replay. */
  maxReplay: number;
}

/**
 * Runs one client against the server's history: the server commits its changes one by one, each
 * broadcast reaches the client 0–2 times in any order, joins are answered at any moment from what the
 * server has committed by then. Checks every step against the server and returns what the client ends with.
 */
function simulate(startVersion: number, laneOfChange: readonly number[], delivery: Delivery): CycleFollow {
  const { changes, states } = serverHistory(startVersion, laneOfChange);
  const lastVersion = startVersion + changes.length;
  let committed = startVersion;
  const inFlight: LineupChange[] = [];
  const joins: PendingJoin[] = [{ sinceVersion: undefined }];
  let follow = followJoinAsked(startFollow());
  let lastApplied = startVersion;
  let choice = 0;
  let lost = 0;
  const next = () => delivery.choices[choice++] ?? 0;

  const take = (step: FollowStep) => {
    for (const change of step.applied) {
      expect(change.version).toBeGreaterThan(lastApplied);
      lastApplied = change.version;
    }
    const held = step.follow.held;
    if (held) {
      // The client only ever holds a lineup the server held at that version, and never goes back.
      expect(held).toEqual(states.get(held.version));
      expect(held.version).toBeGreaterThanOrEqual(follow.held?.version ?? startVersion);
    }
    follow = step.follow;
    if (step.rejoinFrom !== null) joins.push({ sinceVersion: step.rejoinFrom });
  };

  const answer = (join: PendingJoin) => {
    if (join.sinceVersion !== undefined && (delivery.lostAnswers[lost++] ?? false)) {
      take(followJoinFailed(follow));
      return;
    }
    if (join.sinceVersion === undefined || committed - join.sinceVersion > delivery.maxReplay) {
      take(followJoin(follow, { mode: 'snapshot', snapshot: states.get(committed)! }));
    } else {
      take(
        followJoin(follow, {
          mode: 'replay',
          changes: changes.filter((c) => c.version > join.sinceVersion! && c.version <= committed),
        }),
      );
    }
  };

  for (;;) {
    const events = [
      ...(committed < lastVersion ? ['commit' as const] : []),
      ...(inFlight.length ? ['deliver' as const] : []),
      ...(joins.length ? ['answer' as const] : []),
    ];
    if (events.length === 0) break;
    const event = events[next() % events.length];
    if (event === 'commit') {
      committed += 1;
      const copies =
        committed === lastVersion
          ? Math.max(1, delivery.copies[committed - startVersion - 1])
          : delivery.copies[committed - startVersion - 1];
      for (let copy = 0; copy < copies; copy += 1) inFlight.push(changes[committed - startVersion - 1]);
    } else if (event === 'deliver') {
      take(followChange(follow, inFlight.splice(next() % inFlight.length, 1)[0]));
    } else {
      answer(joins.splice(next() % joins.length, 1)[0]);
    }
  }
  return follow;
}

const scenario = fc
  .record({
    startVersion: fc.nat({ max: 50 }),
    laneOfChange: fc.array(fc.integer({ min: 0, max: LANES - 1 }), { minLength: 1, maxLength: 40 }),
    choices: fc.array(fc.nat(), { maxLength: 400 }),
    lostAnswers: fc.array(fc.boolean(), { maxLength: 6 }),
    maxReplay: fc.integer({ min: 1, max: 50 }),
    copiesPool: fc.array(fc.integer({ min: 0, max: 2 }), { minLength: 40, maxLength: 40 }),
  })
  .map(({ copiesPool, laneOfChange, ...rest }) => ({
    ...rest,
    laneOfChange,
    copies: copiesPool.slice(0, laneOfChange.length),
  }));

describe('following a cycle', () => {
  it('ends equal to the server whatever the order, duplicates and drops of the broadcast', () => {
    fc.assert(
      fc.property(scenario, ({ startVersion, laneOfChange, ...delivery }) => {
        const follow = simulate(startVersion, laneOfChange, delivery);
        const { states } = serverHistory(startVersion, laneOfChange);
        expect(follow.held).toEqual(states.get(startVersion + laneOfChange.length));
        expect(follow.early).toEqual([]);
        expect(follow.joining).toBe(false);
      }),
      { numRuns: 300, seed },
    );
  });

  const { start, changes } = serverHistory(10, [0, 1, 2, 3]);

  it('applies the change whose version is the one held + 1', () => {
    const step = followChange(startFollow(start), changes[0]);
    expect(step.applied.map((c) => c.version)).toEqual([11]);
    expect(step.follow.held?.version).toBe(11);
    expect(step.rejoinFrom).toBeNull();
  });

  it('ignores a version it already holds', () => {
    const once = followChange(startFollow(start), changes[0]).follow;
    const again = followChange(once, changes[0]);
    expect(again.applied).toEqual([]);
    expect(again.follow.held).toBe(once.held);
  });

  it('keeps an early change, asks once to rejoin from the version held, and applies it when the gap fills', () => {
    const early = followChange(startFollow(start), changes[2]);
    expect(early.applied).toEqual([]);
    expect(early.rejoinFrom).toBe(10);
    const stillEarly = followChange(early.follow, changes[3]);
    expect(stillEarly.rejoinFrom).toBeNull();
    const replayed = followJoin(stillEarly.follow, { mode: 'replay', changes: changes.slice(0, 2) });
    expect(replayed.applied.map((c) => c.version)).toEqual([11, 12, 13, 14]);
    expect(replayed.rejoinFrom).toBeNull();
  });

  it('asks again when a rejoin goes unanswered while a change is still missing', () => {
    const early = followChange(startFollow(start), changes[1]);
    expect(followJoinFailed(early.follow).rejoinFrom).toBe(10);
  });

  it('keeps changes that arrive before the first snapshot and applies those after it', () => {
    const before = followChange(followChange(startFollow(), changes[0]).follow, changes[1]);
    expect(before.rejoinFrom).toBeNull();
    const joined = followJoin(before.follow, {
      mode: 'snapshot',
      snapshot: followChange(startFollow(start), changes[0]).follow.held!,
    });
    expect(joined.applied.map((c) => c.version)).toEqual([12]);
    expect(joined.follow.early).toEqual([]);
  });

  it('keeps a newer lineup than an older snapshot read later', () => {
    const newer = followChange(startFollow(start), changes[0]).follow;
    expect(followSnapshot(newer, start).follow.held?.version).toBe(11);
  });
});
