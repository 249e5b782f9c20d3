import { useEffect, type ReactNode } from 'react';
import { ChakraProvider } from '@chakra-ui/react';
import { QueryClientProvider } from '@tanstack/react-query';
import { lastSignedInUser, restoreSession } from '../lib/api-client.js';
import { forgetKeptFigures, keepLiveFigures, restoreKeptFigures } from '../lib/live/kept-figures.js';
import { queryClient } from '../lib/query-client.js';
import { getSession, onSessionEnd } from '../lib/session-store.js';
import { system } from '../theme/system.js';

// One person's data must not show to the next person who signs in on the same tablet.
onSessionEnd(() => {
  queryClient.clear();
  forgetKeptFigures();
});

// Before anything renders, so a screen reopened without the network starts from its last picture.
const lastUser = lastSignedInUser();
if (lastUser) restoreKeptFigures(queryClient, lastUser.id);
keepLiveFigures(queryClient, () => getSession().user?.id ?? null);

export function AppProviders({ children }: { children: ReactNode }) {
  useEffect(() => {
    if (getSession().status === 'restoring') restoreSession();
  }, []);
  return (
    <ChakraProvider value={system}>
      <QueryClientProvider client={queryClient}>{children}</QueryClientProvider>
    </ChakraProvider>
  );
}
