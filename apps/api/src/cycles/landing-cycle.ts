import type { CycleState, Role } from '@catline/contracts';

export interface LandingCandidate {
  id: number;
  state: CycleState;
  plannedLaunchAt: Date;
}

export interface LandingPerson {
  role: Role;
  /**
   * The cycles that hold this person's part: a pilot's slot, or an aircraft in the lane of a catapult
   * officer's or deck edge operator's catapult. Empty for every other role.
   */
  heldCycleIds: ReadonlySet<number>;
}

const launching = (cycles: readonly LandingCandidate[]) => cycles.find((cycle) => cycle.state === 'executing');

const nextPlanned = (cycles: readonly LandingCandidate[]) =>
  cycles
    .filter((cycle) => cycle.state === 'planning')
    .reduce<LandingCandidate | undefined>(
      (soonest, cycle) => (soonest && soonest.plannedLaunchAt <= cycle.plannedLaunchAt ? soonest : cycle),
      undefined,
    );

const latest = (cycles: readonly LandingCandidate[]) =>
  cycles.reduce<LandingCandidate | undefined>(
    (newest, cycle) => (newest && newest.plannedLaunchAt >= cycle.plannedLaunchAt ? newest : cycle),
    undefined,
  );

/** The ship's launching cycle, else its next planned one, else (nothing left to fly) its latest. */
const shipCycle = (cycles: readonly LandingCandidate[]) => launching(cycles) ?? nextPlanned(cycles) ?? latest(cycles);

/**
 * The cycle a person's screens open on when the address names none, from the cycles of their ship.
 * A pilot goes where their slot is, launching first; a catapult's crew to the cycle the ship launches
 * (every catapult launches the ship's one launching cycle), before that to the next one lining up on
 * their catapult; everyone else, and anyone whose part no open cycle holds, to the ship's cycle.
 */
export function chooseLandingCycle(
  cycles: readonly LandingCandidate[],
  person: LandingPerson,
): LandingCandidate | undefined {
  const held = cycles.filter((cycle) => person.heldCycleIds.has(cycle.id));
  switch (person.role) {
    case 'pilot':
      return launching(held) ?? nextPlanned(held) ?? shipCycle(cycles);
    case 'catapult_officer':
    case 'deck_edge_operator':
      return launching(cycles) ?? nextPlanned(held) ?? shipCycle(cycles);
    default:
      return shipCycle(cycles);
  }
}
