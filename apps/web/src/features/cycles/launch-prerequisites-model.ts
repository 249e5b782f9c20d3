import type { CycleView } from '@catline/contracts';

/** The names of the cycle's launch prerequisites not yet ticked, in the ship profile's order. */
export const untickedPrerequisites = (cycle: Pick<CycleView, 'launchPrerequisites'>): string[] =>
  cycle.launchPrerequisites.filter((item) => !item.ticked).map((item) => item.name);

/** Why launching cannot start yet, for beside the start button; null once every prerequisite is ticked. */
export function startBlockedBy(cycle: Pick<CycleView, 'launchPrerequisites'>): string | null {
  const missing = untickedPrerequisites(cycle);
  if (missing.length === 0) return null;
  return `Tick every launch prerequisite first; not ticked: ${missing.join(', ')}.`;
}
