import { ReplayScreen } from '../../features/reports/components/replay-screen.js';

export function ReplayRoute() {
  return <ReplayScreen />;
}
