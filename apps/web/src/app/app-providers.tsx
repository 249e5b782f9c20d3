import { useEffect, type ReactNode } from 'react';
import { ChakraProvider } from '@chakra-ui/react';
import { QueryClientProvider } from '@tanstack/react-query';
import { forgetSession, mayRestoreSession, refreshSession } from '../lib/api-client.js';
import { queryClient } from '../lib/query-client.js';
import { getSession, onAccessTokenChange } from '../lib/session-store.js';
import { system } from '../theme/system.js';

// One person's data must not show to the next person who signs in on the same tablet.
onAccessTokenChange((token) => {
  if (!token) queryClient.clear();
});

export function AppProviders({ children }: { children: ReactNode }) {
  useEffect(() => {
    // A reload keeps the person signed in through the refresh cookie.
    if (getSession().status !== 'restoring') return;
    if (!mayRestoreSession()) {
      forgetSession();
      return;
    }
    void refreshSession().then((session) => {
      if (!session) forgetSession();
    });
  }, []);
  return (
    <ChakraProvider value={system}>
      <QueryClientProvider client={queryClient}>{children}</QueryClientProvider>
    </ChakraProvider>
  );
}
