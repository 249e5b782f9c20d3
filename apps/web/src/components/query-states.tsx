import type { ReactNode } from 'react';
import { Box, Button, Heading, Spinner, Stack, Text } from '@chakra-ui/react';
import type { UseQueryResult } from '@tanstack/react-query';
import { errorMessage } from '../lib/api-error.js';

export function LoadingState({ label = 'Loading…' }: { label?: string }) {
  return (
    <Stack role="status" align="center" justify="center" py="10" gap="3" color="fg.muted">
      <Spinner size="lg" borderWidth="3px" />
      <Text>{label}</Text>
    </Stack>
  );
}

export function EmptyState({ title, children }: { title: string; children?: ReactNode }) {
  return (
    <Box
      data-testid="empty-state"
      textAlign="center"
      py="8"
      px="4"
      borderWidth="1px"
      borderStyle="dashed"
      rounded="card"
      color="fg.muted"
    >
      <Heading as="h3" size="md" color="fg" mb="1">
        {title}
      </Heading>
      {children && <Box fontSize="sm">{children}</Box>}
    </Box>
  );
}

export function ErrorState({
  error,
  onRetry,
  title = 'This could not be loaded',
}: {
  error: unknown;
  onRetry?: () => void;
  title?: string;
}) {
  return (
    <Box
      role="alert"
      py="6"
      px="4"
      borderWidth="1px"
      borderColor="nogo.border"
      bg="nogo.subtle"
      color="nogo.fg"
      rounded="card"
    >
      <Heading as="h3" size="md" mb="1">
        {title}
      </Heading>
      <Text mb={onRetry ? '3' : '0'}>{errorMessage(error)}</Text>
      {onRetry && (
        <Button size="sm" variant="outline" colorPalette="nogo" onClick={onRetry}>
          Try again
        </Button>
      )}
    </Box>
  );
}

interface QueryViewProps<T> {
  query: UseQueryResult<T>;
  loadingLabel?: string;
  errorTitle?: string;
  children: (data: T) => ReactNode;
  /** The child marks its data as not live itself (LiveFigures): a failed read again keeps showing it. */
  keepsStaleData?: boolean;
}

/** Loading, error or the data: never a blank screen. Empty lists are the child's to describe. */
export function QueryView<T>({ query, loadingLabel, errorTitle, children, keepsStaleData }: QueryViewProps<T>) {
  if (query.isPending) return <LoadingState label={loadingLabel} />;
  const kept = keepsStaleData ? query.data : undefined;
  if (kept !== undefined) return <>{children(kept)}</>;
  if (query.isError) return <ErrorState error={query.error} title={errorTitle} onRetry={() => void query.refetch()} />;
  return <>{children(query.data)}</>;
}
