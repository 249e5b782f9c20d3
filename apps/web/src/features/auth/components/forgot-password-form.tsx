import { useState, type FormEvent } from 'react';
import { Alert, Button, Input, Stack } from '@chakra-ui/react';
import { FormField } from '../../../components/form-field.js';
import { errorMessage } from '../../../lib/api-error.js';
import { useRequestPasswordReset } from '../api/request-password-reset.js';
import { emailPattern } from '../auth-model.js';
import { PageLink } from './page-link.js';

/** Asks for a link to set a new password; shows the server's answer, which is the same for every e-mail. */
export function ForgotPasswordForm() {
  const request = useRequestPasswordReset();
  const [email, setEmail] = useState('');
  const [problem, setProblem] = useState<string | undefined>();

  const submit = (event: FormEvent) => {
    event.preventDefault();
    const found = emailPattern.test(email.trim()) ? undefined : 'Enter your e-mail address, like name@ship.example.';
    setProblem(found);
    if (!found) request.mutate({ email: email.trim() });
  };

  if (request.isSuccess) {
    return (
      <Stack gap="4">
        <Alert.Root status="success" colorPalette="go" role="status" data-testid="reset-requested">
          <Alert.Indicator />
          <Alert.Title>{request.data.message}</Alert.Title>
        </Alert.Root>
        <PageLink to="/sign-in">Back to sign in</PageLink>
      </Stack>
    );
  }

  return (
    <form onSubmit={submit} noValidate aria-label="Ask for a new password link">
      <Stack gap="4">
        {request.isError && (
          <Alert.Root status="error" colorPalette="nogo" role="alert">
            <Alert.Indicator />
            <Alert.Title>{errorMessage(request.error)}</Alert.Title>
          </Alert.Root>
        )}
        <FormField label="E-mail" error={problem} required>
          <Input type="email" autoComplete="username" value={email} onChange={(event) => setEmail(event.currentTarget.value)} size="lg" />
        </FormField>
        <Button type="submit" size="lg" colorPalette="accent" loading={request.isPending} loadingText="Sending…">
          Send me a link
        </Button>
        <PageLink to="/sign-in">Back to sign in</PageLink>
      </Stack>
    </form>
  );
}
