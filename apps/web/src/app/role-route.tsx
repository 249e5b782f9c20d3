import type { Role } from '@catline/contracts';
import { Outlet } from 'react-router-dom';
import { EmptyState } from '../components/query-states.js';
import { useHasRole } from '../lib/session-store.js';

/** A screen meant for some roles only; the server refuses the others anyway. */
export function RoleRoute({ roles, screen }: { roles: readonly Role[]; screen: string }) {
  if (useHasRole(...roles)) return <Outlet />;
  return <EmptyState title={`${screen} is not part of your role`}>Pick another screen from the menu above.</EmptyState>;
}
