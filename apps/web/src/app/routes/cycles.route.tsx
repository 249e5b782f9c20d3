import { CyclesScreen } from '../../features/cycles/components/cycles-screen.js';

export function CyclesRoute() {
  return <CyclesScreen />;
}
