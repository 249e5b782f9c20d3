import type { DeckLayout } from './deck-positions.js';

/** Longest and shortest trip an elevator may be given, seconds (common practice, no source). */
export const ELEVATOR_CYCLE_RANGE_S = { min: 5, max: 600 } as const;

export type DeckLayoutProblemCode =
  | 'duplicate_name'
  | 'unknown_clear_before'
  | 'clear_before_other_area'
  | 'clear_before_cycle'
  | 'taxi_missing'
  | 'taxi_negative'
  | 'unknown_catapult'
  | 'elevator_cycle_out_of_range'
  | 'unknown_elevator';

/** One reason a deck layout cannot be used, with the part of the layout it concerns. */
export interface DeckLayoutProblem {
  readonly code: DeckLayoutProblemCode;
  /** Where: `spot bow-1`, `elevator lift-fwd` or `hangar bay bay-A`. */
  readonly subject: string;
  /** A sentence a person understands. */
  readonly message: string;
}

const duplicates = (kind: string, names: readonly string[]): DeckLayoutProblem[] =>
  [...new Set(names.filter((name, i) => names.indexOf(name) !== i))].map((name) => ({
    code: 'duplicate_name',
    subject: `${kind} ${name}`,
    message: `The name ${name} is given to more than one ${kind}; each needs its own.`,
  }));

function taxiProblems(
  subject: string,
  taxiTo: (catapultId: string) => number | undefined,
  given: readonly string[],
  catapultIds: readonly string[],
): DeckLayoutProblem[] {
  const missing = catapultIds.filter((id) => taxiTo(id) === undefined);
  const negative = catapultIds.filter((id) => (taxiTo(id) ?? 0) < 0);
  const unknown = [...new Set(given)].filter((id) => !catapultIds.includes(id));
  return [
    ...(missing.length > 0
      ? [
          {
            code: 'taxi_missing' as const,
            subject,
            message: `The ${subject} needs a taxi time to catapult ${missing.join(', ')}.`,
          },
        ]
      : []),
    ...negative.map((id) => ({
      code: 'taxi_negative' as const,
      subject,
      message: `The taxi time from the ${subject} to catapult ${id} is ${taxiTo(id)} s; it cannot be below 0.`,
    })),
    ...(unknown.length > 0
      ? [
          {
            code: 'unknown_catapult' as const,
            subject,
            message: `The ${subject} gives a taxi time to catapult ${unknown.join(', ')}, which the ship does not have.`,
          },
        ]
      : []),
  ];
}

/**
 * The spots of a clear-before circle (a spot that, through the spots it must wait for, waits for
 * itself), the first met following the lists in order, or null; such a row could never taxi out. One
 * is enough to refuse the layout, and a deck can hold very many overlapping circles.
 */
function clearBeforeCycle(layout: DeckLayout): string[] | null {
  const ahead = new Map(layout.spots.map((spot) => [spot.id, spot.clearBefore ?? []]));
  const done = new Set<string>();
  const visit = (id: string, path: string[]): string[] | null => {
    const at = path.indexOf(id);
    if (at >= 0) return path.slice(at);
    if (done.has(id) || !ahead.has(id)) return null;
    for (const front of ahead.get(id)!) {
      const cycle = visit(front, [...path, id]);
      if (cycle !== null) return cycle;
    }
    done.add(id);
    return null;
  };
  for (const spot of layout.spots) {
    const cycle = visit(spot.id, []);
    if (cycle !== null) return cycle;
  }
  return null;
}

/**
 * Every reason the layout cannot be used by the timing and the deck's rules, none when it can: names
 * unique among spots, elevators and hangar bays; a spot's clear-before list names spots of its own area
 * (its row) and never leads back to itself (the first circle found is named); every spot and elevator reaches every catapult (the spot by
 * its own time or its area's) in no negative time and names no other catapult; elevator trips within
 * ELEVATOR_CYCLE_RANGE_S; hangar bays served by elevators the layout has.
 */
export function deckLayoutProblems(layout: DeckLayout, catapultIds: readonly string[]): DeckLayoutProblem[] {
  const problems: DeckLayoutProblem[] = [
    ...duplicates(
      'spot',
      layout.spots.map((spot) => spot.id),
    ),
    ...duplicates(
      'elevator',
      layout.elevators.map((elevator) => elevator.id),
    ),
    ...duplicates(
      'hangar bay',
      layout.hangarBays.map((bay) => bay.id),
    ),
  ];
  const spots = new Map(layout.spots.map((spot) => [spot.id, spot]));
  const areas = new Map(layout.areas.map((area) => [area.id, area]));
  for (const spot of layout.spots) {
    const subject = `spot ${spot.id}`;
    for (const front of spot.clearBefore ?? []) {
      const other = spots.get(front);
      if (other === undefined) {
        problems.push({
          code: 'unknown_clear_before',
          subject,
          message: `Spot ${spot.id} waits for spot ${front}, which the deck does not have.`,
        });
      } else if (other.areaId !== spot.areaId) {
        problems.push({
          code: 'clear_before_other_area',
          subject,
          message: `Spot ${spot.id} waits for spot ${front}, which is in another area; only spots of its own row can stand in front of it.`,
        });
      }
    }
    const areaTaxi = areas.get(spot.areaId)?.taxi ?? {};
    problems.push(
      ...taxiProblems(
        subject,
        (id) => spot.taxi?.[id] ?? areaTaxi[id],
        [...Object.keys(spot.taxi ?? {}), ...Object.keys(areaTaxi)],
        catapultIds,
      ),
    );
  }
  const cycle = clearBeforeCycle(layout);
  if (cycle !== null) {
    problems.push({
      code: 'clear_before_cycle',
      subject: `spot ${cycle[0]}`,
      message: `Spots ${[...cycle, cycle[0]].join(' → ')} wait for each other in a circle, so none of them could taxi out.`,
    });
  }
  for (const elevator of layout.elevators) {
    const subject = `elevator ${elevator.id}`;
    if (
      !Number.isFinite(elevator.cycleTime) ||
      elevator.cycleTime < ELEVATOR_CYCLE_RANGE_S.min ||
      elevator.cycleTime > ELEVATOR_CYCLE_RANGE_S.max
    ) {
      problems.push({
        code: 'elevator_cycle_out_of_range',
        subject,
        message: `Elevator ${elevator.id} takes ${elevator.cycleTime} s per trip; a trip must take ${ELEVATOR_CYCLE_RANGE_S.min} to ${ELEVATOR_CYCLE_RANGE_S.max} s.`,
      });
    }
    problems.push(...taxiProblems(subject, (id) => elevator.taxi[id], Object.keys(elevator.taxi), catapultIds));
  }
  const elevators = new Set(layout.elevators.map((elevator) => elevator.id));
  for (const bay of layout.hangarBays) {
    const unknown = bay.elevatorIds.filter((id) => !elevators.has(id));
    if (unknown.length > 0) {
      problems.push({
        code: 'unknown_elevator',
        subject: `hangar bay ${bay.id}`,
        message: `Hangar bay ${bay.id} is served by elevator ${unknown.join(', ')}, which the deck does not have.`,
      });
    }
  }
  return problems;
}
