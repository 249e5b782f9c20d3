import type { LaunchPrerequisiteView, ShipProfile } from '@catline/contracts';
import type { Cycle } from '../database/entities/cycle.entity.js';

/**
 * The ship profile's launch prerequisites with the cycle's ticks. A tick is kept by name, so a list the
 * profile reorders keeps its ticks, and a prerequisite the profile drops no longer counts.
 */
export function launchPrerequisitesOf(cycle: Cycle, profile: ShipProfile): LaunchPrerequisiteView[] {
  const ticks = cycle.prerequisiteTicks ?? [];
  return (profile.launchPrerequisites ?? []).map((name) => {
    const tick = ticks.find((candidate) => candidate.name === name);
    return { name, ticked: tick !== undefined, tickedBy: tick?.tickedBy ?? null, tickedAt: tick?.tickedAt ?? null };
  });
}
