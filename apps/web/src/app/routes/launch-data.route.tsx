import { LaunchDataScreen } from '../../features/launch-data/components/launch-data-screen.js';

export function LaunchDataRoute() {
  return <LaunchDataScreen />;
}
