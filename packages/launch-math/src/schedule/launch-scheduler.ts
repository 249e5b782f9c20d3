/**
 * The one timing model behind both the projection and the suggested lineup, in an index-based form
 * cheap enough for the suggestion's search to run thousands of times. Times are epoch milliseconds.
 *
 * Rules, in the order they are applied:
 * - each lane launches in its own order, a catapult's launches at least its reset interval apart;
 * - a slot launches no earlier than the cycle's earliest time and its own `notBefore` (taxi arrival);
 * - launches on two catapults of the same group (a pair) are at least the pair gap apart;
 * - priority holds: a slot's effective tier is the highest tier at or ahead of it in its lane (it
 *   cannot overtake what is ahead), and no slot launches before every launch of a lower tier;
 * - clear before: a slot parked behind others in its row cannot taxi out before they have left. Each
 *   aircraft leaves its spot just in time to reach its catapult at its launch (its launch minus its
 *   taxi lead, `notBefore` minus `taxiStart`), so a blocked slot launches no earlier than each
 *   blocker's departure plus its own taxi lead; a slot whose blocker never launches is never scheduled;
 * - within those rules the earliest possible launch is taken first, ties to the lower catapult index.
 */
export interface SchedulerCatapult {
  readonly resetMs: number;
  /** Catapults with the same group keep the pair gap between their launches. */
  readonly group: string;
}

export interface FixedLaunch {
  readonly catapult: number;
  readonly time: number;
  readonly tier: number;
}

export interface SchedulerProblem {
  readonly earliest: number;
  readonly pairGapMs: number;
  /** In tie-break order. */
  readonly catapults: readonly SchedulerCatapult[];
  /** Per catapult, the slot indices still to launch, in lane order. */
  readonly lanes: readonly (readonly number[])[];
  /** Per slot, the earliest time it can launch (-Infinity when free). */
  readonly notBefore: ArrayLike<number>;
  /** Per slot, its priority tier: 0 launches first. */
  readonly tier: ArrayLike<number>;
  /** Launches already made: they hold their catapult and pair partner like any other. */
  readonly fixed: readonly FixedLaunch[];
  /** When taxiing starts: a slot's taxi lead is its `notBefore` minus this. */
  readonly taxiStart?: number;
  /** Per slot, the slots (indices) that must leave their spots before it can taxi out. */
  readonly clearAfter?: ArrayLike<readonly number[] | undefined>;
}

function insertSorted(list: number[], value: number): void {
  let index = list.length;
  while (index > 0 && list[index - 1] > value) index -= 1;
  list.splice(index, 0, value);
}

/** The earliest time at or after `start` at least `gap` from every (ascending) event. */
function clearOf(events: readonly number[], start: number, gap: number): number {
  // Events at or before start - gap can never conflict: skip them by bisection.
  let low = 0;
  let high = events.length;
  while (low < high) {
    const middle = (low + high) >>> 1;
    if (events[middle] <= start - gap) low = middle + 1;
    else high = middle;
  }
  let time = start;
  for (let index = low; index < events.length && events[index] < time + gap; index += 1) {
    if (time > events[index] - gap && time < events[index] + gap) time = events[index] + gap;
  }
  return time;
}

/** Projected launch time of every slot in a lane, by index; NaN for slots in no lane. */
export function scheduleLaunches(problem: SchedulerProblem): Float64Array {
  const { catapults, lanes, notBefore, tier, pairGapMs } = problem;
  const count = catapults.length;
  const times = new Float64Array(notBefore.length).fill(Number.NaN);
  const events: number[][] = catapults.map(() => []);
  const readyAt = new Float64Array(count).fill(Number.NEGATIVE_INFINITY);
  // Latest launch per priority tier; tiers are small whole numbers.
  const latestOfTier: number[] = [];
  const noteTier = (slotTier: number, time: number): void => {
    latestOfTier[slotTier] = Math.max(latestOfTier[slotTier] ?? Number.NEGATIVE_INFINITY, time);
  };

  for (const launch of problem.fixed) {
    insertSorted(events[launch.catapult], launch.time);
    readyAt[launch.catapult] = Math.max(readyAt[launch.catapult], launch.time + catapults[launch.catapult].resetMs);
    noteTier(launch.tier, launch.time);
  }
  const effectiveTier = new Float64Array(notBefore.length);
  let lastPhase = 0;
  for (const lane of lanes) {
    let running = 0;
    for (const slot of lane) {
      running = Math.max(running, tier[slot]);
      effectiveTier[slot] = running;
    }
    lastPhase = Math.max(lastPhase, running);
  }

  const taxiStart = problem.taxiStart ?? Number.NEGATIVE_INFINITY;
  const { clearAfter } = problem;
  const lead = (slot: number): number => (Number.isFinite(notBefore[slot]) ? notBefore[slot] - taxiStart : 0);
  /** The earliest the slot can launch once its blockers have left; NaN while one is not yet scheduled. */
  const clearedAt = (slot: number): number => {
    const blockers = clearAfter?.[slot];
    if (blockers === undefined) return Number.NEGATIVE_INFINITY;
    let time = Number.NEGATIVE_INFINITY;
    for (const blocker of blockers) time = Math.max(time, times[blocker] - lead(blocker) + lead(slot));
    return time;
  };

  const clearOfPartners = (catapult: number, start: number): number => {
    let time = start;
    for (let moved = true; moved;) {
      moved = false;
      for (let partner = 0; partner < count; partner += 1) {
        if (partner === catapult || catapults[partner].group !== catapults[catapult].group) continue;
        const cleared = clearOf(events[partner], time, pairGapMs);
        moved ||= cleared !== time;
        time = cleared;
      }
    }
    return time;
  };

  const head = new Int32Array(count);
  // Candidate launch time of each lane's head; NaN once it must be worked out again.
  const candidate = new Float64Array(count);
  for (let phase = 0; phase <= lastPhase; phase += 1) {
    let hold = Number.NEGATIVE_INFINITY;
    for (let earlier = 0; earlier < phase; earlier += 1)
      hold = Math.max(hold, latestOfTier[earlier] ?? Number.NEGATIVE_INFINITY);
    const start = Math.max(problem.earliest, hold);
    candidate.fill(Number.NaN);
    for (;;) {
      let best = -1;
      let bestTime = Number.POSITIVE_INFINITY;
      for (let catapult = 0; catapult < count; catapult += 1) {
        if (head[catapult] >= lanes[catapult].length) continue;
        const slot = lanes[catapult][head[catapult]];
        if (effectiveTier[slot] !== phase) continue;
        if (Number.isNaN(candidate[catapult])) {
          let from = Math.max(start, readyAt[catapult], notBefore[slot]);
          if (clearAfter !== undefined) {
            const cleared = clearedAt(slot);
            // Waits, without a candidate, until every blocker has its time.
            if (Number.isNaN(cleared)) continue;
            from = Math.max(from, cleared);
          }
          candidate[catapult] = clearOfPartners(catapult, from);
        }
        if (candidate[catapult] < bestTime) {
          best = catapult;
          bestTime = candidate[catapult];
        }
      }
      if (best < 0) break;
      const slot = lanes[best][head[best]];
      times[slot] = bestTime;
      head[best] += 1;
      readyAt[best] = bestTime + catapults[best].resetMs;
      insertSorted(events[best], bestTime);
      noteTier(phase, bestTime);
      for (let catapult = 0; catapult < count; catapult += 1) {
        if (catapults[catapult].group === catapults[best].group) candidate[catapult] = Number.NaN;
      }
    }
  }
  return times;
}
