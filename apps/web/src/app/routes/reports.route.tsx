import { ReportsScreen } from '../../features/reports/components/reports-screen.js';

export function ReportsRoute() {
  return <ReportsScreen />;
}
