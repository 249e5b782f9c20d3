import { Box, HStack } from '@chakra-ui/react';
import { NavLink } from 'react-router-dom';

const pages = [
  { to: '/reports', label: 'Cycle report' },
  { to: '/reports/shot-counts', label: 'Shot counts' },
];

/** Moves between the report screens; the replay and the launch sheet open from a cycle's report. */
export function ReportsNav() {
  return (
    <HStack as="nav" aria-label="Reports" gap="1" className="no-print">
      {pages.map((page) => (
        <NavLink key={page.to} to={page.to} end>
          {({ isActive }) => (
            <Box
              px="2.5"
              py="1"
              rounded="card"
              fontSize="sm"
              fontWeight="600"
              bg={isActive ? 'accent.subtle' : undefined}
              color={isActive ? 'accent.fg' : 'fg.muted'}
              _hover={{ color: 'fg' }}
            >
              {page.label}
            </Box>
          )}
        </NavLink>
      ))}
    </HStack>
  );
}
