import { CatStationScreen } from '../../features/cat-station/components/cat-station-screen.js';

export function CatStationRoute() {
  return <CatStationScreen />;
}
