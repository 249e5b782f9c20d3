import { useState, type FormEvent } from 'react';
import { Alert, Button, Input, Stack, Text } from '@chakra-ui/react';
import type { UseMutationResult } from '@tanstack/react-query';
import type { SetPasswordWithTokenRequest } from '@catline/contracts';
import { useLocation, useNavigate } from 'react-router-dom';
import { FormField } from '../../../components/form-field.js';
import { errorMessage } from '../../../lib/api-error.js';
import { type NewPasswordProblems, newPasswordProblems, tokenFromHash } from '../auth-model.js';
import { PageLink } from './page-link.js';

interface SetPasswordFormProps {
  send: UseMutationResult<void, Error, SetPasswordWithTokenRequest>;
  submitLabel: string;
  /** Shown on the sign-in page once the password is set. */
  doneNotice: string;
  /** Where a person with a used or broken link gets a new one. */
  newLink: { to: string; label: string } | null;
}

/** Sets a password with the one-time token from a mailed link, then sends the person to sign in. */
export function SetPasswordForm({ send, submitLabel, doneNotice, newLink }: SetPasswordFormProps) {
  const location = useLocation();
  const navigate = useNavigate();
  const [token] = useState(() => tokenFromHash(location.hash));
  const [password, setPassword] = useState('');
  const [repeated, setRepeated] = useState('');
  const [problems, setProblems] = useState<NewPasswordProblems>({});

  const submit = (event: FormEvent) => {
    event.preventDefault();
    const found = newPasswordProblems(password, repeated);
    setProblems(found);
    if (!token || found.password || found.repeated) return;
    send.mutate({ token, newPassword: password }, { onSuccess: () => void navigate('/sign-in', { replace: true, state: { notice: doneNotice } }) });
  };

  if (!token) {
    return (
      <Stack gap="4">
        <Alert.Root status="warning" colorPalette="caution" role="alert" data-testid="link-incomplete">
          <Alert.Indicator />
          <Alert.Title>This page opens from the link in your e-mail, and that link did not arrive whole. Open it again from the mail, or copy the entire address.</Alert.Title>
        </Alert.Root>
        {newLink && <PageLink to={newLink.to}>{newLink.label}</PageLink>}
      </Stack>
    );
  }

  return (
    <form onSubmit={submit} noValidate aria-label={submitLabel}>
      <Stack gap="4">
        {send.isError && (
          <Stack gap="2">
            <Alert.Root status="error" colorPalette="nogo" role="alert" data-testid="set-password-error">
              <Alert.Indicator />
              <Alert.Title>{errorMessage(send.error)}</Alert.Title>
            </Alert.Root>
            {newLink && <PageLink to={newLink.to}>{newLink.label}</PageLink>}
          </Stack>
        )}
        <FormField label="New password" error={problems.password} required>
          <Input type="password" autoComplete="new-password" value={password} onChange={(event) => setPassword(event.currentTarget.value)} size="lg" />
        </FormField>
        <FormField label="New password again" error={problems.repeated} required>
          <Input type="password" autoComplete="new-password" value={repeated} onChange={(event) => setRepeated(event.currentTarget.value)} size="lg" />
        </FormField>
        <Text fontSize="sm" color="fg.muted">
          The link works once. After this you sign in with your e-mail and this password.
        </Text>
        <Button type="submit" size="lg" colorPalette="accent" loading={send.isPending} loadingText="Saving…">
          {submitLabel}
        </Button>
      </Stack>
    </form>
  );
}
