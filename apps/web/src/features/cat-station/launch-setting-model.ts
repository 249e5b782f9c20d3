import type { LaunchFigures } from '@catline/contracts';

/**
 * The warning shown when Catline's energy model disagrees with the approved setting by more than the
 * ship's tolerance. A warning, never a no-go: the approved launch data govern the shot, and the crew
 * checks the data (type, configuration, weight) before the read-back.
 */
export function crossCheckWarning(figures: LaunchFigures): string | null {
  if (!figures.crossCheckFlagged || figures.catapultSetting === null) return null;
  const estimate =
    figures.crossCheckSetting === null
      ? 'Catline’s energy model reaches no setting for this shot'
      : `Catline’s energy model gives setting ${figures.crossCheckSetting}`;
  return `${estimate}, further from the approved setting ${figures.catapultSetting} than the ship allows. Check the launch data before the read-back.`;
}
