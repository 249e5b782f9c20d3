import { LineupScreen } from '../../features/lineup/components/lineup-screen.js';

export function LineupRoute() {
  return <LineupScreen />;
}
