import { useState } from 'react';
import { Alert, CloseButton } from '@chakra-ui/react';
import { ApiRequestError, errorMessage } from '../lib/api-error.js';

export interface Notice {
  title: string;
  message: string;
  tone: 'refused' | 'done';
}

/** A notice that stays until dismissed: a refused change must not flash by unseen. */
export function NoticeBanner({ notice, onDismiss }: { notice: Notice; onDismiss: () => void }) {
  const palette = notice.tone === 'refused' ? 'nogo' : 'go';
  return (
    <Alert.Root
      status={notice.tone === 'refused' ? 'error' : 'success'}
      colorPalette={palette}
      variant="surface"
      role="alert"
      data-testid="notice"
      alignItems="flex-start"
    >
      <Alert.Indicator />
      <Alert.Content>
        <Alert.Title>{notice.title}</Alert.Title>
        <Alert.Description>{notice.message}</Alert.Description>
      </Alert.Content>
      <CloseButton size="sm" aria-label="Dismiss notice" onClick={onDismiss} />
    </Alert.Root>
  );
}

/** Turns a refused command into a notice; a 409 says plainly that someone else got there first. */
export function refusalNotice(error: unknown, action: string): Notice {
  if (error instanceof ApiRequestError && error.isConflict) {
    return {
      tone: 'refused',
      title: `${action} refused: the lineup changed first`,
      message: `${error.message} The board now shows the latest lineup.`,
    };
  }
  return { tone: 'refused', title: `${action} did not go through`, message: errorMessage(error) };
}

export function useNotice() {
  const [notice, setNotice] = useState<Notice | null>(null);
  return { notice, show: setNotice, dismiss: () => setNotice(null) };
}
