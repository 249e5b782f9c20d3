/**
 * The one timing model behind both the projection and the suggested lineup, in an index-based form
 * cheap enough for the suggestion's search to run tens of thousands of times. Times are epoch milliseconds.
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

/** Everything about a cycle that stays the same whatever the lineup. */
export interface SchedulerSetup {
  readonly earliest: number;
  readonly pairGapMs: number;
  /** In tie-break order. */
  readonly catapults: readonly SchedulerCatapult[];
  /** Per slot, its priority tier: 0 launches first. */
  readonly tier: ArrayLike<number>;
  /** Launches already made: they hold their catapult and pair partner like any other. */
  readonly fixed: readonly FixedLaunch[];
  /** When taxiing starts: a slot's taxi lead is its `notBefore` minus this. */
  readonly taxiStart?: number;
  /** Per slot, the slots (indices) that must leave their spots before it can taxi out. */
  readonly clearAfter?: ArrayLike<readonly number[] | undefined>;
}

export interface SchedulerProblem extends SchedulerSetup {
  /** Per catapult, the slot indices still to launch, in lane order. */
  readonly lanes: readonly (readonly number[])[];
  /** Per slot, the earliest time it can launch (-Infinity when free). */
  readonly notBefore: ArrayLike<number>;
}

type Lanes = readonly (readonly number[])[];

/** The earliest time at or after `start` at least `gap` from each of the first `count` (ascending) events. */
function clearOf(events: Float64Array, count: number, start: number, gap: number): number {
  // Events at or before start - gap can never conflict: skip them by bisection.
  let low = 0;
  let high = count;
  while (low < high) {
    const middle = (low + high) >>> 1;
    if (events[middle] <= start - gap) low = middle + 1;
    else high = middle;
  }
  let time = start;
  for (let index = low; index < count && events[index] < time + gap; index += 1) {
    if (time > events[index] - gap && time < events[index] + gap) time = events[index] + gap;
  }
  return time;
}

const fixedOn = (fixed: readonly FixedLaunch[], catapult: number): number =>
  fixed.filter((launch) => launch.catapult === catapult).length;

/** A recorded lineup: the scheduler's state after each step (launches made), flattened per catapult or tier. */
interface Recording {
  readonly phase: Int32Array;
  /** The slot launched at each step. */
  readonly slot: Int32Array;
  readonly head: Int32Array;
  readonly readyAt: Float64Array;
  readonly candidate: Float64Array;
  readonly eventCount: Int32Array;
  readonly latestOfTier: Float64Array;
  /** Each catapult's launch times after the last step (those of an earlier step are a prefix). */
  readonly events: Float64Array[];
  /** Each slot's launch time after the last step. */
  readonly times: Float64Array;
  /** Per catapult, the step after which its lane's head stood at each place. */
  readonly laneStep: Int32Array[];
  /** Steps recorded. */
  steps: number;
}

function emptyRecording(slots: number, events: readonly Float64Array[], tierCount: number): Recording {
  const count = events.length;
  return {
    phase: new Int32Array(slots + 1),
    slot: new Int32Array(slots + 1),
    head: new Int32Array((slots + 1) * count),
    readyAt: new Float64Array((slots + 1) * count),
    candidate: new Float64Array((slots + 1) * count),
    eventCount: new Int32Array((slots + 1) * count),
    latestOfTier: new Float64Array((slots + 1) * tierCount),
    events: events.map((own) => new Float64Array(own.length)),
    times: new Float64Array(slots),
    laneStep: events.map(() => new Int32Array(slots + 1)),
    steps: 0,
  };
}

/**
 * Runs the timing model on one lineup after another without allocating, for the suggestion's search.
 * Launch times are in {@link times} after each run, until the next.
 *
 * Two shortcuts give the same times as a run from scratch, only sooner:
 * - {@link record} keeps the state after every launch of a lineup, and {@link resume} runs a lineup
 *   that differs from it only from given lane places on, starting from the last launch before the
 *   first of those places: until a lane's head reaches a changed place, nothing of the change is seen.
 * - a run given `latestAllowed` stops as soon as some slot must launch after it (or never), since then
 *   the search has no use for the rest.
 */
export class LaunchScheduler {
  /** Per slot, its launch time in the last run; NaN for slots not (yet) launched. */
  readonly times: Float64Array;
  private readonly catapultCount: number;
  private readonly resetMs: Float64Array;
  /** Per catapult, the other catapults of its pair, in index order. */
  private readonly partners: readonly Int32Array[];
  private readonly groupOf: Int32Array;
  private readonly tierCount: number;
  private readonly effectiveTier: Float64Array;
  private lastPhase = 0;

  // The state during a run.
  /** Per catapult, its launch times in order; launches come in time order, so each is appended. */
  private readonly events: Float64Array[];
  private readonly eventCount: Int32Array;
  private readonly readyAt: Float64Array;
  /** Latest launch per priority tier. */
  private readonly latestOfTier: Float64Array;
  private readonly head: Int32Array;
  /** Candidate launch time of each lane's head; NaN once it must be worked out again. */
  private readonly candidate: Float64Array;

  /** The recorded lineup, made on the first {@link record}: a projection runs once and needs none. */
  private recording: Recording | null = null;

  constructor(private readonly setup: SchedulerSetup) {
    const { catapults, tier, fixed } = setup;
    const count = catapults.length;
    const slots = tier.length;
    this.catapultCount = count;
    this.resetMs = Float64Array.from(catapults, (catapult) => catapult.resetMs);
    const groups = catapults.map((catapult) => catapult.group);
    this.groupOf = Int32Array.from(groups, (group) => groups.indexOf(group));
    this.partners = catapults.map((_, catapult) =>
      Int32Array.from(
        groups.flatMap((group, partner) => (partner !== catapult && group === groups[catapult] ? [partner] : [])),
      ),
    );
    let maxTier = 0;
    for (let slot = 0; slot < slots; slot += 1) maxTier = Math.max(maxTier, tier[slot]);
    for (const launch of fixed) maxTier = Math.max(maxTier, launch.tier);
    this.tierCount = maxTier + 1;
    this.times = new Float64Array(slots);
    this.effectiveTier = new Float64Array(slots);
    this.events = catapults.map((_, catapult) => new Float64Array(slots + fixedOn(fixed, catapult)));
    this.eventCount = new Int32Array(count);
    this.readyAt = new Float64Array(count);
    this.latestOfTier = new Float64Array(this.tierCount);
    this.head = new Int32Array(count);
    this.candidate = new Float64Array(count);
  }

  /** Runs a lineup from scratch; false when `latestAllowed` is given and some slot must launch after it or never. */
  run(lanes: Lanes, notBefore: ArrayLike<number>, latestAllowed = Number.POSITIVE_INFINITY): boolean {
    this.prepare(lanes);
    if (!this.mayFinishBy(lanes, notBefore, latestAllowed)) return false;
    this.start();
    return this.simulate(lanes, notBefore, 0, latestAllowed, false);
  }

  /** Runs a lineup in full and keeps its state after every launch, for {@link resume}. */
  record(lanes: Lanes, notBefore: ArrayLike<number>): void {
    this.recording ??= emptyRecording(this.times.length, this.events, this.tierCount);
    this.prepare(lanes);
    this.start();
    this.save(0, 0, -1);
    this.simulate(lanes, notBefore, 0, Number.POSITIVE_INFINITY, true);
    this.recording.times.set(this.times);
    this.events.forEach((events, catapult) => this.recording?.events[catapult].set(events));
  }

  /**
   * The step (launches made) of the recorded lineup from which a lineup that differs from it at
   * `place` of lane `catapult`, or later in that lane, can resume: the launch that brought that lane's
   * head to the place, or the last launch when it never got there (the place is never reached then).
   */
  stepBefore(catapult: number, place: number): number {
    const saved = this.recorded();
    return place === 0
      ? 0
      : place <= saved.head[saved.steps * this.catapultCount + catapult]
        ? saved.laneStep[catapult][place]
        : saved.steps;
  }

  /**
   * Runs a lineup that matches the recorded one in every lane place its heads reach within `step`
   * launches (see {@link stepBefore}), from that step on; as {@link run} otherwise.
   */
  resume(lanes: Lanes, notBefore: ArrayLike<number>, step: number, latestAllowed = Number.POSITIVE_INFINITY): boolean {
    this.prepare(lanes);
    if (!this.mayFinishBy(lanes, notBefore, latestAllowed)) return false;
    return this.simulate(lanes, notBefore, this.restore(step), latestAllowed, false);
  }

  /** Effective tiers and the last phase of the lineup. */
  private prepare(lanes: Lanes): void {
    let lastPhase = 0;
    for (const lane of lanes) {
      let running = 0;
      for (const slot of lane) {
        running = Math.max(running, this.setup.tier[slot]);
        this.effectiveTier[slot] = running;
      }
      lastPhase = Math.max(lastPhase, running);
    }
    this.lastPhase = lastPhase;
  }

  /**
   * Whether every lane could still launch its last slot by `latestAllowed`: none launches before its
   * own earliest time, and each slot behind it in the lane a reset interval later still.
   */
  private mayFinishBy(lanes: Lanes, notBefore: ArrayLike<number>, latestAllowed: number): boolean {
    if (latestAllowed === Number.POSITIVE_INFINITY) return true;
    const { earliest } = this.setup;
    for (let catapult = 0; catapult < lanes.length; catapult += 1) {
      const lane = lanes[catapult];
      const reset = this.resetMs[catapult];
      for (let place = 0; place < lane.length; place += 1) {
        if (Math.max(earliest, notBefore[lane[place]]) + (lane.length - 1 - place) * reset > latestAllowed)
          return false;
      }
    }
    return true;
  }

  /** The state before any launch of the lineup: only the launches already made. */
  private start(): void {
    this.times.fill(Number.NaN);
    this.eventCount.fill(0);
    this.readyAt.fill(Number.NEGATIVE_INFINITY);
    this.latestOfTier.fill(Number.NEGATIVE_INFINITY);
    this.head.fill(0);
    this.candidate.fill(Number.NaN);
    for (const launch of this.setup.fixed) {
      this.insertEvent(launch.catapult, launch.time);
      this.readyAt[launch.catapult] = Math.max(
        this.readyAt[launch.catapult],
        launch.time + this.resetMs[launch.catapult],
      );
      this.latestOfTier[launch.tier] = Math.max(this.latestOfTier[launch.tier], launch.time);
    }
  }

  private recorded(): Recording {
    if (this.recording === null) throw new Error('No lineup recorded to resume from');
    return this.recording;
  }

  private save(step: number, phase: number, slot: number): void {
    const { catapultCount } = this;
    const saved = this.recorded();
    saved.steps = step;
    saved.phase[step] = phase;
    saved.slot[step] = slot;
    // Plain loops: set() costs more than it saves on arrays of four.
    for (let catapult = 0, at = step * catapultCount; catapult < catapultCount; catapult += 1, at += 1) {
      saved.head[at] = this.head[catapult];
      saved.readyAt[at] = this.readyAt[catapult];
      saved.candidate[at] = this.candidate[catapult];
      saved.eventCount[at] = this.eventCount[catapult];
    }
    for (let tier = 0; tier < this.tierCount; tier += 1)
      saved.latestOfTier[step * this.tierCount + tier] = this.latestOfTier[tier];
  }

  /** Puts back the recorded state after `step` launches; returns its phase. */
  private restore(step: number): number {
    const { catapultCount, tierCount } = this;
    const saved = this.recorded();
    // Plain loops: views (subarray) would allocate on every resume.
    for (let catapult = 0, at = step * catapultCount; catapult < catapultCount; catapult += 1, at += 1) {
      this.head[catapult] = saved.head[at];
      this.readyAt[catapult] = saved.readyAt[at];
      this.candidate[catapult] = saved.candidate[at];
      this.eventCount[catapult] = saved.eventCount[at];
      const events = this.events[catapult];
      for (let index = 0; index < saved.eventCount[at]; index += 1) events[index] = saved.events[catapult][index];
    }
    for (let tier = 0; tier < tierCount; tier += 1)
      this.latestOfTier[tier] = saved.latestOfTier[step * tierCount + tier];
    this.times.fill(Number.NaN);
    for (let made = 1; made <= step; made += 1) this.times[saved.slot[made]] = saved.times[saved.slot[made]];
    return saved.phase[step];
  }

  private insertEvent(catapult: number, time: number): void {
    const events = this.events[catapult];
    let index = this.eventCount[catapult];
    while (index > 0 && events[index - 1] > time) {
      events[index] = events[index - 1];
      index -= 1;
    }
    events[index] = time;
    this.eventCount[catapult] += 1;
  }

  private lead(slot: number, notBefore: ArrayLike<number>): number {
    return Number.isFinite(notBefore[slot]) ? notBefore[slot] - (this.setup.taxiStart ?? Number.NEGATIVE_INFINITY) : 0;
  }

  /** The earliest the slot can launch once its blockers have left; NaN while one is not yet scheduled. */
  private clearedAt(slot: number, notBefore: ArrayLike<number>): number {
    const blockers = this.setup.clearAfter?.[slot];
    if (blockers === undefined) return Number.NEGATIVE_INFINITY;
    let time = Number.NEGATIVE_INFINITY;
    for (const blocker of blockers)
      time = Math.max(time, this.times[blocker] - this.lead(blocker, notBefore) + this.lead(slot, notBefore));
    return time;
  }

  private clearOfPartners(catapult: number, start: number): number {
    const partners = this.partners[catapult];
    let time = start;
    // With one partner the first answer is final: clearOf moves past conflicts in time order only.
    for (let moved = true; moved; moved &&= partners.length > 1) {
      moved = false;
      for (const partner of partners) {
        const cleared = clearOf(this.events[partner], this.eventCount[partner], time, this.setup.pairGapMs);
        moved ||= cleared !== time;
        time = cleared;
      }
    }
    return time;
  }

  /** The lane whose head launches next in the phase, its time in `candidate`; -1 when none can. */
  private nextLane(lanes: Lanes, notBefore: ArrayLike<number>, phase: number, start: number): number {
    const { candidate, head } = this;
    let best = -1;
    let bestTime = Number.POSITIVE_INFINITY;
    for (let catapult = 0; catapult < this.catapultCount; catapult += 1) {
      if (head[catapult] >= lanes[catapult].length) continue;
      const slot = lanes[catapult][head[catapult]];
      if (this.effectiveTier[slot] !== phase) continue;
      if (Number.isNaN(candidate[catapult])) {
        let from = Math.max(start, this.readyAt[catapult], notBefore[slot]);
        if (this.setup.clearAfter !== undefined) {
          const cleared = this.clearedAt(slot, notBefore);
          // Waits, without a candidate, until every blocker has its time.
          if (Number.isNaN(cleared)) continue;
          from = Math.max(from, cleared);
        }
        candidate[catapult] = this.clearOfPartners(catapult, from);
      }
      if (candidate[catapult] < bestTime) {
        best = catapult;
        bestTime = candidate[catapult];
      }
    }
    return best;
  }

  /** Launches the lineup phase by phase from the current state; false once it cannot finish by `latestAllowed`. */
  private simulate(
    lanes: Lanes,
    notBefore: ArrayLike<number>,
    fromPhase: number,
    latestAllowed: number,
    recording: boolean,
  ): boolean {
    const { candidate, head, readyAt, latestOfTier, groupOf, catapultCount } = this;
    let step = 0;
    for (let catapult = 0; catapult < catapultCount; catapult += 1) step += head[catapult];
    for (let phase = fromPhase; phase <= this.lastPhase; phase += 1) {
      if (phase > fromPhase) candidate.fill(Number.NaN);
      let hold = Number.NEGATIVE_INFINITY;
      for (let earlier = 0; earlier < phase; earlier += 1) hold = Math.max(hold, latestOfTier[earlier]);
      const start = Math.max(this.setup.earliest, hold);
      for (let best = this.nextLane(lanes, notBefore, phase, start); best >= 0;) {
        const time = candidate[best];
        const lane = lanes[best];
        this.times[lane[head[best]]] = time;
        head[best] += 1;
        readyAt[best] = time + this.resetMs[best];
        this.insertEvent(best, time);
        latestOfTier[phase] = Math.max(latestOfTier[phase], time);
        for (let catapult = 0; catapult < catapultCount; catapult += 1) {
          if (groupOf[catapult] === groupOf[best]) candidate[catapult] = Number.NaN;
        }
        step += 1;
        if (recording) {
          this.recorded().laneStep[best][head[best]] = step;
          this.save(step, phase, lane[head[best] - 1]);
        }
        // The lane's slots still to launch each need a reset interval after this launch.
        const left = lane.length - head[best];
        if (time > latestAllowed || (left > 0 && readyAt[best] + (left - 1) * this.resetMs[best] > latestAllowed))
          return false;
        best = this.nextLane(lanes, notBefore, phase, start);
      }
    }
    if (latestAllowed === Number.POSITIVE_INFINITY) return true;
    // A slot never launched (its blocker never goes) cannot launch by any time.
    for (let catapult = 0; catapult < catapultCount; catapult += 1)
      if (head[catapult] < lanes[catapult].length) return false;
    return true;
  }
}

/** Projected launch time of every slot in a lane, by index; NaN for slots in no lane. */
export function scheduleLaunches(problem: SchedulerProblem): Float64Array {
  const scheduler = new LaunchScheduler(problem);
  scheduler.run(problem.lanes, problem.notBefore);
  return scheduler.times;
}
