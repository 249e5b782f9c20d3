import type { ReactNode } from 'react';
import { Box, Heading, Stack, Text } from '@chakra-ui/react';

/** The card the screens before sign-in share: sign in, forgot password, set a password. */
export function AuthPage({ intro, children }: { intro: string; children: ReactNode }) {
  return (
    <Box
      as="main"
      minH="100dvh"
      display="flex"
      alignItems="center"
      justifyContent="center"
      px="4"
      py="8"
      bg="bg.subtle"
    >
      <Stack gap="5" w="full" maxW="26rem" bg="bg.panel" borderWidth="1px" rounded="card" p={{ base: '5', md: '8' }}>
        <Stack gap="1">
          <Heading as="h1" size="2xl" fontWeight="700">
            Catline
          </Heading>
          <Text color="fg.muted">{intro}</Text>
        </Stack>
        {children}
      </Stack>
    </Box>
  );
}
