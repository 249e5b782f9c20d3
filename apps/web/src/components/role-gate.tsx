import type { ReactNode } from 'react';
import type { Role } from '@catline/contracts';
import { useHasRole } from '../lib/session-store.js';

/** Hides what a role cannot do. It is only courtesy: the server decides on every request. */
export function RoleGate({
  roles,
  children,
  otherwise = null,
}: {
  roles: Role[];
  children: ReactNode;
  otherwise?: ReactNode;
}) {
  return <>{useHasRole(...roles) ? children : otherwise}</>;
}
