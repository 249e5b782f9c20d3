import { useState } from 'react';
import { Alert, CloseButton } from '@chakra-ui/react';
import { ApiRequestError, errorMessage } from '../lib/api-error.js';
import { refusalText } from '../lib/refusal-texts.js';

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

/** Turns a refused command into a notice whose title says why, by the server's refusal code. */
export function refusalNotice(error: unknown, action: string): Notice {
  const code = error instanceof ApiRequestError ? error.code : 'unknown';
  return { tone: 'refused', ...refusalText(action, { code, message: errorMessage(error) }) };
}

export function useNotice() {
  const [notice, setNotice] = useState<Notice | null>(null);
  return { notice, show: setNotice, dismiss: () => setNotice(null) };
}
