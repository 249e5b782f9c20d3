import { ShotCountsScreen } from '../../features/reports/components/shot-counts-screen.js';

export function ShotCountsRoute() {
  return <ShotCountsScreen />;
}
