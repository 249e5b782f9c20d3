import { LaunchSheetScreen } from '../../features/reports/components/launch-sheet-screen.js';

export function LaunchSheetRoute() {
  return <LaunchSheetScreen />;
}
