import { Box, Button, Flex, HStack, Text } from '@chakra-ui/react';
import { ROLE_LABELS } from '@catline/contracts';
import { NavLink, Outlet } from 'react-router-dom';
import { LineupIcon } from '../components/icons.js';
import { useSignOut } from '../features/auth/api/sign-out.js';
import { useSessionUser } from '../lib/session-store.js';
import { OwnShipTimeZone } from '../lib/ship-time.js';
import { SCREENS_BY_ROLE } from './landing.js';
import { ThemeSwitch } from './theme-switch.js';

export function AppShell() {
  const user = useSessionUser();
  const signOut = useSignOut();
  return (
    <Flex direction="column" minH="100dvh">
      <Box as="header" borderBottomWidth="1px" bg="bg.panel" position="sticky" top="0" zIndex="sticky">
        <Flex px={{ base: '2', md: '4' }} py="1" columnGap="3" align="center" wrap="wrap">
          <HStack gap="2" color="accent.fg" fontWeight="700" fontSize="lg" minH="tap">
            <LineupIcon />
            <Text as="span">Catline</Text>
          </HStack>
          {/* Beside the name on a wide screen; a row of its own below the controls on a narrow one. */}
          <Box
            as="nav"
            aria-label="Screens"
            overflowX="auto"
            order={{ base: 1, lg: 0 }}
            flexBasis={{ base: '100%', lg: 'auto' }}
            minW="0"
          >
            <HStack gap="0" as="ul" listStyleType="none" m="0" p="0">
              {SCREENS_BY_ROLE[user.role].map((screen) => (
                <Box as="li" key={screen.path} flexShrink={0}>
                  <NavLink to={screen.path}>
                    {({ isActive }) => (
                      <Flex
                        align="center"
                        minH="tap"
                        px="3"
                        fontWeight="600"
                        fontSize="sm"
                        borderBottomWidth="3px"
                        borderTopWidth="3px"
                        borderTopColor="transparent"
                        borderBottomColor={isActive ? 'accent.solid' : 'transparent'}
                        color={isActive ? 'fg' : 'fg.muted'}
                        _hover={{ color: 'fg' }}
                      >
                        {screen.label}
                      </Flex>
                    )}
                  </NavLink>
                </Box>
              ))}
            </HStack>
          </Box>
          <Box flex="1" />
          <ThemeSwitch />
          <Text fontSize="sm" color="fg.muted" display={{ base: 'none', xl: 'block' }} data-testid="signed-in-as">
            {user.name} · {ROLE_LABELS[user.role]}
          </Text>
          <Button
            size="sm"
            minH="tap"
            variant="outline"
            onClick={() => signOut.mutate()}
            loading={signOut.isPending}
            title={`${user.name} · ${ROLE_LABELS[user.role]}`}
          >
            Sign out
          </Button>
        </Flex>
      </Box>
      <Box as="main" flex="1" px={{ base: '2', md: '4' }} py="2" minW="0">
        <OwnShipTimeZone>
          <Outlet />
        </OwnShipTimeZone>
      </Box>
    </Flex>
  );
}
