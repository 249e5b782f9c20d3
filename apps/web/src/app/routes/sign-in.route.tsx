import { Alert, Box, Heading, Stack, Text } from '@chakra-ui/react';
import { Navigate, useLocation } from 'react-router-dom';
import { SignInForm } from '../../features/auth/components/sign-in-form.js';
import { useSession } from '../../lib/session-store.js';
import { landingPath } from '../landing.js';
import type { SignInState } from '../require-session.js';

export function SignInRoute() {
  const { status, user, endedNotice } = useSession();
  const location = useLocation();
  const from = (location.state as SignInState | null)?.from;

  if (status === 'signed-in' && user) return <Navigate to={from && from !== '/' ? from : landingPath(user.role)} replace />;

  return (
    <Box minH="100dvh" display="flex" alignItems="center" justifyContent="center" px="4" py="8" bg="bg.subtle">
      <Stack gap="5" w="full" maxW="26rem" bg="bg.panel" borderWidth="1px" rounded="card" p={{ base: '5', md: '8' }}>
        <Stack gap="1">
          <Heading as="h1" size="2xl" fontWeight="700">
            Catline
          </Heading>
          <Text color="fg.muted">The live launch board. Sign in with your ship account.</Text>
        </Stack>
        {endedNotice && (
          <Alert.Root status="warning" colorPalette="caution" data-testid="session-notice">
            <Alert.Indicator />
            <Alert.Title>{endedNotice}</Alert.Title>
          </Alert.Root>
        )}
        <SignInForm />
      </Stack>
    </Box>
  );
}
