import type { ReactNode } from 'react';
import { Link } from '@chakra-ui/react';
import { Link as RouterLink } from 'react-router-dom';

/** A link to another screen before sign-in. */
export function PageLink({ to, children }: { to: string; children: ReactNode }) {
  return (
    <Link asChild color="accent.fg" fontWeight="600" fontSize="sm">
      <RouterLink to={to}>{children}</RouterLink>
    </Link>
  );
}
