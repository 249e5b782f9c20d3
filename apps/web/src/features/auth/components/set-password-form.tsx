import { useState } from 'react';
import { Alert, Button, Input, Stack, Text } from '@chakra-ui/react';
import { zodResolver } from '@hookform/resolvers/zod';
import type { UseMutationResult } from '@tanstack/react-query';
import type { SetPasswordWithTokenRequest } from '@catline/contracts';
import { useForm } from 'react-hook-form';
import { useLocation, useNavigate } from 'react-router-dom';
import { FormField } from '../../../components/form-field.js';
import { errorMessage } from '../../../lib/api-error.js';
import { newPasswordSchema, tokenFromHash } from '../auth-model.js';
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
  const {
    register,
    handleSubmit,
    formState: { errors },
  } = useForm({ resolver: zodResolver(newPasswordSchema), defaultValues: { password: '', repeated: '' } });

  if (!token) {
    return (
      <Stack gap="4">
        <Alert.Root status="warning" colorPalette="caution" role="alert" data-testid="link-incomplete">
          <Alert.Indicator />
          <Alert.Title>
            This page opens from the link in your e-mail, and that link did not arrive whole. Open it again from the
            mail, or copy the entire address.
          </Alert.Title>
        </Alert.Root>
        {newLink && <PageLink to={newLink.to}>{newLink.label}</PageLink>}
      </Stack>
    );
  }

  return (
    <form
      onSubmit={handleSubmit(({ password }) =>
        send.mutate(
          { token, newPassword: password },
          { onSuccess: () => void navigate('/sign-in', { replace: true, state: { notice: doneNotice } }) },
        ),
      )}
      noValidate
      aria-label={submitLabel}
    >
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
        <FormField label="New password" error={errors.password?.message} required>
          <Input type="password" autoComplete="new-password" {...register('password')} size="lg" />
        </FormField>
        <FormField label="New password again" error={errors.repeated?.message} required>
          <Input type="password" autoComplete="new-password" {...register('repeated')} size="lg" />
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
