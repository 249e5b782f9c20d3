import { Alert, Box } from '@chakra-ui/react';
import { Navigate, useLocation } from 'react-router-dom';
import { AuthPage } from '../../features/auth/components/auth-page.js';
import { PageLink } from '../../features/auth/components/page-link.js';
import { SignInForm } from '../../features/auth/components/sign-in-form.js';
import { useSession } from '../../lib/session-store.js';
import { landingPath } from '../landing.js';
import type { SignInState } from '../require-session.js';

export function SignInRoute() {
  const { status, user, endedNotice } = useSession();
  const location = useLocation();
  const { from, notice } = (location.state as SignInState | null) ?? {};

  if (status === 'signed-in' && user)
    return <Navigate to={from && from !== '/' ? from : landingPath(user.role)} replace />;

  return (
    <AuthPage intro="The live launch board. Sign in with your ship account.">
      {notice && (
        <Alert.Root status="success" colorPalette="go" role="status" data-testid="sign-in-notice">
          <Alert.Indicator />
          <Alert.Title>{notice}</Alert.Title>
        </Alert.Root>
      )}
      {endedNotice && (
        <Alert.Root status="warning" colorPalette="caution" data-testid="session-notice">
          <Alert.Indicator />
          <Alert.Title>{endedNotice}</Alert.Title>
        </Alert.Root>
      )}
      <SignInForm />
      <Box>
        <PageLink to="/forgot-password">Forgot password?</PageLink>
      </Box>
    </AuthPage>
  );
}
