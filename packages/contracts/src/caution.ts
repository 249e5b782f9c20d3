/**
 * The caution every screen, print, file and mail that shows a launch figure carries: Catline plans
 * and coordinates, it does not authorise a launch.
 */
export const LAUNCH_CAUTION =
  "Planning aid only. Launch settings come from the ship's approved launch data and the catapult officer's own checks; the ship's procedures and the service's regulations govern.";
