import { FleetScreen } from '../../features/fleet/components/fleet-screen.js';

export function FleetRoute() {
  return <FleetScreen />;
}
