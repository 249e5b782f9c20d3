import { Box, Button, Flex, HStack, Text } from '@chakra-ui/react';
import { ROLE_LABELS } from '@catline/contracts';
import { NavLink, Outlet } from 'react-router-dom';
import { LineupIcon } from '../components/icons.js';
import { useSignOut } from '../features/auth/api/sign-out.js';
import { useSessionUser } from '../lib/session-store.js';
import { SCREENS_BY_ROLE } from './landing.js';
import { ThemeSwitch } from './theme-switch.js';

export function AppShell() {
  const user = useSessionUser();
  const signOut = useSignOut();
  return (
    <Flex direction="column" minH="100dvh">
      <Box as="header" borderBottomWidth="1px" bg="bg.panel" position="sticky" top="0" zIndex="sticky">
        <Flex px={{ base: '3', md: '5' }} py="2" gap="3" align="center" wrap="wrap">
          <HStack gap="2" color="accent.fg" fontWeight="700" fontSize="lg">
            <LineupIcon />
            <Text as="span">Catline</Text>
          </HStack>
          <Box flex="1" />
          <ThemeSwitch />
          <Text fontSize="sm" color="fg.muted" display={{ base: 'none', md: 'block' }} data-testid="signed-in-as">
            {user.name} · {ROLE_LABELS[user.role]}
          </Text>
          <Button size="xs" variant="outline" onClick={() => signOut.mutate()} loading={signOut.isPending}>
            Sign out
          </Button>
        </Flex>
        <Box as="nav" aria-label="Screens" px={{ base: '1', md: '3' }} overflowX="auto">
          <HStack gap="0" as="ul" listStyleType="none" m="0" p="0">
            {SCREENS_BY_ROLE[user.role].map((screen) => (
              <Box as="li" key={screen.path} flexShrink={0}>
                <NavLink to={screen.path}>
                  {({ isActive }) => (
                    <Box
                      px="3"
                      py="2"
                      fontWeight="600"
                      fontSize="sm"
                      borderBottomWidth="3px"
                      borderColor={isActive ? 'accent.solid' : 'transparent'}
                      color={isActive ? 'fg' : 'fg.muted'}
                      _hover={{ color: 'fg' }}
                    >
                      {screen.label}
                    </Box>
                  )}
                </NavLink>
              </Box>
            ))}
          </HStack>
        </Box>
      </Box>
      <Box as="main" flex="1" px={{ base: '3', md: '5' }} py={{ base: '3', md: '4' }} minW="0">
        <Outlet />
      </Box>
    </Flex>
  );
}
