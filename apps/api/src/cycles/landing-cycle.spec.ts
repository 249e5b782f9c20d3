import type { Role } from '@catline/contracts';
import { chooseLandingCycle, type LandingCandidate } from './landing-cycle.js';

const at = (time: string) => new Date(`2026-05-04T${time}Z`);
const cycle = (id: number, state: LandingCandidate['state'], time: string): LandingCandidate => ({
  id,
  state,
  plannedLaunchAt: at(time),
});

// Cycle 1 is launching; cycle 2 is planned after it; cycle 3 closed earlier in the day.
const launchingNow = cycle(1, 'executing', '10:00:00');
const plannedNext = cycle(2, 'planning', '12:00:00');
const closedEarlier = cycle(3, 'closed', '08:00:00');
const day = [closedEarlier, plannedNext, launchingNow];

const land = (cycles: LandingCandidate[], role: Role, held: number[] = []) =>
  chooseLandingCycle(cycles, { role, heldCycleIds: new Set(held) })?.id;

describe('chooseLandingCycle', () => {
  it('lands a pilot whose only slot is in the planned cycle on that cycle, not the launching one', () => {
    expect(land(day, 'pilot', [2])).toBe(2);
  });

  it('lands a pilot with slots in both on the launching cycle first', () => {
    expect(land(day, 'pilot', [2, 1])).toBe(1);
  });

  it('lands a pilot on the soonest planned cycle of theirs when none of theirs launches', () => {
    const later = cycle(4, 'planning', '14:00:00');
    expect(land([later, plannedNext, launchingNow], 'pilot', [4, 2])).toBe(2);
  });

  it("does not land a pilot on a closed cycle holding their slot; the ship's cycle instead", () => {
    expect(land(day, 'pilot', [3])).toBe(1);
  });

  it.each<Role>(['catapult_officer', 'deck_edge_operator'])(
    'lands a %s on the launching cycle even when their catapult lines up in the planned one',
    (role) => {
      expect(land(day, role, [2])).toBe(1);
    },
  );

  it('lands a catapult officer, before launching, on the next cycle lining up on their catapult', () => {
    const later = cycle(4, 'planning', '14:00:00');
    expect(land([closedEarlier, plannedNext, later], 'catapult_officer', [4])).toBe(4);
  });

  it.each<Role>(['handler', 'air_boss', 'observer', 'air_operations', 'admin'])(
    'lands a %s on the launching cycle, else on the next planned',
    (role) => {
      expect(land(day, role)).toBe(1);
      const later = cycle(4, 'planning', '14:00:00');
      expect(land([closedEarlier, later, plannedNext], role)).toBe(2);
    },
  );

  it('lands on the latest cycle when every cycle is closed, and nowhere without cycles', () => {
    expect(land([closedEarlier, cycle(5, 'closed', '09:00:00')], 'handler')).toBe(5);
    expect(land([], 'pilot')).toBeUndefined();
  });
});
