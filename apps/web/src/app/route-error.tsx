import { Box, Button, Heading, Stack, Text } from '@chakra-ui/react';
import { isRouteErrorResponse, useRouteError } from 'react-router-dom';

/** What shows instead of a blank page when a screen fails to load or throws. */
export function RouteError() {
  const error = useRouteError();
  const message = isRouteErrorResponse(error)
    ? `${error.status} ${error.statusText}`
    : error instanceof Error
      ? error.message
      : 'Unknown error';
  return (
    <Box p="8" role="alert">
      <Stack gap="3" maxW="40rem">
        <Heading as="h1" size="xl">
          This screen could not open
        </Heading>
        <Text color="fg.muted">{message}</Text>
        <Box>
          <Button colorPalette="accent" onClick={() => window.location.reload()}>
            Reload Catline
          </Button>
        </Box>
      </Stack>
    </Box>
  );
}
