import type { LineupSnapshot, SuggestedLineup } from '@catline/contracts';
import { isDone, slotsById } from './lineup-model.js';

/** One catapult's lane before and after a suggestion. */
export interface LaneComparison {
  catapultId: number;
  number: number;
  now: { count: number; lastAt: string | null };
  suggested: { count: number; lastAt: string | null };
  /** Side numbers that come to this lane, and that leave it. */
  joining: string[];
  leaving: string[];
  /** The same aircraft stay, in another order. */
  reordered: boolean;
}

export interface SuggestionComparison {
  lanes: LaneComparison[];
  lastLaunch: {
    now: string | null;
    suggested: string | null;
    /** Positive when the suggestion finishes sooner. */ gainMs: number | null;
  };
  missesWindow: { now: number; suggested: number };
  /** Planned aircraft the suggestion leaves in the deck pool (no pilot, or no catapult that can take them). */
  leftInPool: string[];
}

const latest = (times: (string | null)[]) =>
  times.reduce<string | null>((last, time) => (time !== null && (last === null || time > last) ? time : last), null);

/** What applying a suggestion changes on each catapult, and what it gains: the last launch and the window misses. */
export function compareSuggestion(snapshot: LineupSnapshot, suggestion: SuggestedLineup): SuggestionComparison {
  const slots = slotsById(snapshot);
  const side = (id: number) => slots.get(id)?.sideNumber ?? '?';
  const projected = new Map(suggestion.projected.map((launch) => [launch.slotId, launch]));
  const lanes = [...snapshot.lanes]
    .sort((a, b) => a.number - b.number)
    .map((lane): LaneComparison => {
      const nowIds = lane.slotIds.filter((id) => {
        const slot = slots.get(id);
        return slot !== undefined && !isDone(slot);
      });
      const suggestedIds = [
        // The suggestion orders planned aircraft only; those already in the readiness steps keep their places.
        ...nowIds.filter((id) => slots.get(id)?.status !== 'planned'),
        ...(suggestion.lanes.find((candidate) => candidate.catapultId === lane.catapultId)?.slotIds ?? []),
      ];
      const joining = suggestedIds.filter((id) => !nowIds.includes(id));
      const leaving = nowIds.filter((id) => !suggestedIds.includes(id));
      return {
        catapultId: lane.catapultId,
        number: lane.number,
        now: { count: nowIds.length, lastAt: latest(nowIds.map((id) => slots.get(id)?.projectedLaunchAt ?? null)) },
        suggested: {
          count: suggestedIds.length,
          lastAt: latest(suggestedIds.map((id) => projected.get(id)?.launchAt ?? null)),
        },
        joining: joining.map(side),
        leaving: leaving.map(side),
        reordered:
          joining.length === 0 && leaving.length === 0 && nowIds.some((id, index) => suggestedIds[index] !== id),
      };
    });
  const placed = new Set(suggestion.lanes.flatMap((lane) => lane.slotIds));
  const now = snapshot.lastLaunchAt;
  const suggested = suggestion.lastLaunchAt;
  return {
    lanes,
    lastLaunch: {
      now,
      suggested,
      gainMs: now !== null && suggested !== null ? Date.parse(now) - Date.parse(suggested) : null,
    },
    missesWindow: {
      now: snapshot.slots.filter((slot) => slot.catapultId !== null && !isDone(slot) && slot.missesWindow).length,
      suggested: suggestion.projected.filter((launch) => launch.missesWindow).length,
    },
    leftInPool: snapshot.slots
      // A held spare waits aside by design; one the handler called is one of the cycle's aircraft like any other.
      .filter((slot) => slot.status === 'planned' && !slot.heldSpare && !placed.has(slot.id))
      .map((slot) => slot.sideNumber),
  };
}
