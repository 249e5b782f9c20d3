import { MyLaunchScreen } from '../../features/my-launch/components/my-launch-screen.js';

export function MyLaunchRoute() {
  return <MyLaunchScreen />;
}
