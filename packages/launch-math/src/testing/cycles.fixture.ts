import fc from 'fast-check';
import type { LaunchCatapult, LaunchPriority, Projection, ProjectionInput } from '../schedule/launch-projection.js';
import type { LineupSuggestion, SuggestionInput } from '../schedule/lineup-suggestion.js';
import { epochMs, seconds } from '../units/units.js';

export const CYCLE_START = epochMs(Date.UTC(2026, 5, 1, 9, 0, 0));
export const at = (secondsAfterStart: number) => epochMs(CYCLE_START + secondsAfterStart * 1000);

/** Two bow catapults (1, 2) and two waist catapults (3, 4), each pair sharing a pair id. */
export function fourCatapults(resetInterval = 60, up: readonly boolean[] = [true, true, true, true]): LaunchCatapult[] {
  return [1, 2, 3, 4].map((number) => ({
    id: `cat${number}`,
    number,
    position: number <= 2 ? 'bow' : 'waist',
    pairId: number <= 2 ? 'bow' : 'waist',
    resetInterval: seconds(resetInterval),
    up: up[number - 1],
  }));
}

const TIER: Record<LaunchPriority, number> = { first: 0, normal: 1, last: 2 };
const TOLERANCE_MS = 1e-6;

/**
 * Every rule a projection must keep, checked from its output alone (written apart from the scheduler
 * so that it can catch it out): lane order and reset intervals, pair gaps, earliest times, priority
 * holds, and every slot accounted for once.
 */
export function scheduleViolations(input: ProjectionInput, projection: Projection): string[] {
  const problems: string[] = [];
  const timeOf = new Map(projection.slots.map((slot) => [slot.slotId, slot.time as number]));
  const accounted = [
    ...projection.slots.map((slot) => slot.slotId),
    ...projection.unschedulable.map((slot) => slot.slotId),
  ];
  const inLanes = Object.values(input.lanes).flat();
  if (accounted.length !== inLanes.length || new Set(accounted).size !== inLanes.length)
    problems.push('slots not accounted for once each');
  const earliest = Math.max(input.cycleStart, input.window.start, input.now ?? -Infinity);
  const effectiveTier = new Map<string, number>();

  for (const catapult of input.catapults) {
    const lane = (input.lanes[catapult.id] ?? []).filter((slotId) => timeOf.has(slotId));
    let previous: number | null = null;
    let running = -Infinity;
    for (const slotId of lane) {
      const time = timeOf.get(slotId) ?? NaN;
      const launched = input.launched?.[slotId] !== undefined;
      if (!launched) {
        if (!catapult.up || (input.landingAreaInUse && catapult.position === 'waist'))
          problems.push(`${slotId} projected on a closed catapult`);
        if (previous !== null && time < previous + catapult.resetInterval * 1000 - TOLERANCE_MS)
          problems.push(`${slotId} breaks the reset interval`);
        if (time < earliest - TOLERANCE_MS) problems.push(`${slotId} before the earliest launch`);
        if (time < (input.notBefore?.[slotId] ?? -Infinity) - TOLERANCE_MS)
          problems.push(`${slotId} before its taxi arrival`);
        running = Math.max(running, TIER[input.priorities?.[slotId] ?? 'normal']);
        effectiveTier.set(slotId, running);
      }
      previous = previous === null ? time : Math.max(previous, time);
    }
  }

  for (const a of input.catapults) {
    for (const b of input.catapults) {
      if (a.number >= b.number || a.pairId !== b.pairId) continue;
      for (const slotA of input.lanes[a.id] ?? []) {
        for (const slotB of input.lanes[b.id] ?? []) {
          if (!timeOf.has(slotA) || !timeOf.has(slotB)) continue;
          if (input.launched?.[slotA] !== undefined && input.launched?.[slotB] !== undefined) continue;
          const apart = Math.abs((timeOf.get(slotA) ?? NaN) - (timeOf.get(slotB) ?? NaN));
          if (!(apart >= input.pairMinimumGap * 1000 - TOLERANCE_MS))
            problems.push(`${slotA} and ${slotB} break the pair gap`);
        }
      }
    }
  }

  if (input.priorities) {
    for (const [held, heldTier] of effectiveTier) {
      for (const [ahead, aheadTier] of effectiveTier) {
        if (aheadTier < heldTier && (timeOf.get(held) ?? NaN) < (timeOf.get(ahead) ?? NaN) - TOLERANCE_MS) {
          problems.push(`${held} launches before higher-priority ${ahead}`);
        }
      }
    }
  }
  return problems;
}

const priorityArbitrary = fc.constantFrom<LaunchPriority>('first', 'normal', 'normal', 'normal', 'last');

/** Random lineups on four catapults, with launches already made, taxi arrivals, priorities and a `now`. */
export const projectionInputArbitrary: fc.Arbitrary<ProjectionInput> = fc
  .record({
    resets: fc.array(fc.integer({ min: 20, max: 150 }), { minLength: 4, maxLength: 4 }),
    up: fc.array(fc.boolean(), { minLength: 4, maxLength: 4 }),
    landingAreaInUse: fc.boolean(),
    pairGap: fc.integer({ min: 0, max: 60 }),
    slots: fc.array(
      fc.record({
        lane: fc.integer({ min: 0, max: 3 }),
        notBefore: fc.option(fc.integer({ min: 0, max: 900 }), { nil: undefined }),
        priority: priorityArbitrary,
      }),
      { maxLength: 14 },
    ),
    launchedPerLane: fc.array(fc.integer({ min: 0, max: 2 }), { minLength: 4, maxLength: 4 }),
    launchSpacing: fc.integer({ min: 0, max: 60 }),
    now: fc.option(fc.integer({ min: 0, max: 600 }), { nil: undefined }),
    windowLength: fc.integer({ min: 60, max: 1800 }),
  })
  .map((draw) => {
    const catapults = fourCatapults().map((catapult, index) => ({
      ...catapult,
      resetInterval: seconds(draw.resets[index]),
      up: draw.up[index],
    }));
    const lanes: Record<string, string[]> = Object.fromEntries(catapults.map((catapult) => [catapult.id, []]));
    const notBefore: Record<string, ReturnType<typeof at>> = {};
    const priorities: Record<string, LaunchPriority> = {};
    draw.slots.forEach((slot, index) => {
      const slotId = `s${index}`;
      lanes[catapults[slot.lane].id].push(slotId);
      if (slot.notBefore !== undefined) notBefore[slotId] = at(slot.notBefore);
      priorities[slotId] = slot.priority;
    });
    const launched: Record<string, ReturnType<typeof at>> = {};
    catapults.forEach((catapult, index) => {
      lanes[catapult.id].slice(0, draw.launchedPerLane[index]).forEach((slotId, place) => {
        launched[slotId] = at(place * (catapult.resetInterval + draw.launchSpacing) + index);
      });
    });
    return {
      cycleStart: CYCLE_START,
      window: { start: CYCLE_START, end: at(draw.windowLength) },
      catapults,
      landingAreaInUse: draw.landingAreaInUse,
      lanes,
      pairMinimumGap: seconds(draw.pairGap),
      launched,
      notBefore,
      priorities,
      now: draw.now === undefined ? undefined : at(draw.now),
    };
  });

/** Random small cycles for the suggested lineup: `minAircraft` to `maxAircraft`, some catapults down or closed, some unreachable. */
export function suggestionInputArbitrary(maxAircraft: number, minAircraft = 1): fc.Arbitrary<SuggestionInput> {
  return fc
    .record({
      resets: fc.array(fc.integer({ min: 40, max: 120 }), { minLength: 4, maxLength: 4 }),
      up: fc.array(fc.constantFrom(true, true, true, true, false), { minLength: 4, maxLength: 4 }),
      landingAreaInUse: fc.constantFrom(false, false, false, true),
      pairGap: fc.integer({ min: 0, max: 30 }),
      aircraft: fc.array(
        fc.record({
          priority: priorityArbitrary,
          taxi: fc.array(fc.option(fc.integer({ min: 0, max: 480 }), { nil: undefined, freq: 12 }), {
            minLength: 4,
            maxLength: 4,
          }),
        }),
        { minLength: minAircraft, maxLength: maxAircraft },
      ),
    })
    .map((draw) => {
      const catapults = fourCatapults().map((catapult, index) => ({
        ...catapult,
        resetInterval: seconds(draw.resets[index]),
        up: draw.up[index],
      }));
      return {
        cycleStart: CYCLE_START,
        window: { start: CYCLE_START, end: at(1800) },
        catapults,
        landingAreaInUse: draw.landingAreaInUse,
        pairMinimumGap: seconds(draw.pairGap),
        aircraft: draw.aircraft.map((aircraft, index) => ({ id: `a${index}`, priority: aircraft.priority })),
        taxiTimes: Object.fromEntries(
          draw.aircraft.map((aircraft, index) => [
            `a${index}`,
            Object.fromEntries(
              catapults.flatMap((catapult, c) =>
                aircraft.taxi[c] === undefined ? [] : [[catapult.id, seconds(aircraft.taxi[c] ?? 0)]],
              ),
            ),
          ]),
        ),
      };
    });
}

/**
 * Every rule a suggestion must keep, beyond those of its projection: each aircraft placed once or
 * reported unplaced only when no open catapult is in reach, lanes only on open catapults the aircraft
 * can reach, no aircraft queued behind a lower priority, the times its own taxi arrivals allow.
 */
export function suggestionViolations(input: SuggestionInput, suggestion: LineupSuggestion): string[] {
  const problems: string[] = [];
  const open = input.catapults.filter(
    (catapult) => catapult.up && !(input.landingAreaInUse && catapult.position === 'waist'),
  );
  const placed = Object.values(suggestion.lanes).flat();
  const unplaced = suggestion.unplaced.map((entry) => entry.aircraftId);
  for (const aircraft of input.aircraft) {
    const count = placed.filter((id) => id === aircraft.id).length + unplaced.filter((id) => id === aircraft.id).length;
    if (count !== 1) problems.push(`${aircraft.id} placed ${count} times`);
    const reachable = open.some((catapult) => input.taxiTimes[aircraft.id]?.[catapult.id] !== undefined);
    if (unplaced.includes(aircraft.id) && reachable)
      problems.push(`${aircraft.id} left out though a catapult is in reach`);
  }
  const priorityOf = new Map(input.aircraft.map((aircraft) => [aircraft.id, aircraft.priority]));
  for (const [catapultId, lane] of Object.entries(suggestion.lanes)) {
    if (lane.length > 0 && !open.some((catapult) => catapult.id === catapultId))
      problems.push(`lane on closed catapult ${catapultId}`);
    lane.forEach((aircraftId, place) => {
      const taxi = input.taxiTimes[aircraftId]?.[catapultId];
      if (taxi === undefined) problems.push(`${aircraftId} cannot reach ${catapultId}`);
      else if (suggestion.notBefore[aircraftId] !== input.cycleStart + taxi * 1000)
        problems.push(`${aircraftId} taxi arrival wrong`);
      if (
        place > 0 &&
        TIER[priorityOf.get(lane[place - 1]) ?? 'normal'] > TIER[priorityOf.get(aircraftId) ?? 'normal']
      ) {
        problems.push(`${aircraftId} queued behind a lower priority`);
      }
    });
  }
  const projectionInput = {
    ...input,
    lanes: suggestion.lanes,
    notBefore: suggestion.notBefore,
    priorities: suggestion.priorities,
  };
  if (suggestion.projection.unschedulable.length > 0) problems.push('suggestion has unschedulable slots');
  return [...problems, ...scheduleViolations(projectionInput, suggestion.projection)];
}
