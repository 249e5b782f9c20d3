import { PeopleScreen } from '../../features/people/components/people-screen.js';

export function PeopleRoute() {
  return <PeopleScreen />;
}
