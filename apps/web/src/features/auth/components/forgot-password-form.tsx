import { Alert, Button, Input, Stack } from '@chakra-ui/react';
import { zodResolver } from '@hookform/resolvers/zod';
import { useForm } from 'react-hook-form';
import { FormField } from '../../../components/form-field.js';
import { errorMessage } from '../../../lib/api-error.js';
import { useRequestPasswordReset } from '../api/request-password-reset.js';
import { passwordLinkSchema } from '../auth-model.js';
import { PageLink } from './page-link.js';

/** Asks for a link to set a new password; shows the server's answer, which is the same for every e-mail. */
export function ForgotPasswordForm() {
  const request = useRequestPasswordReset();
  const {
    register,
    handleSubmit,
    formState: { errors },
  } = useForm({ resolver: zodResolver(passwordLinkSchema), defaultValues: { email: '' } });

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
    <form
      onSubmit={handleSubmit((values) => request.mutate(values))}
      noValidate
      aria-label="Ask for a new password link"
    >
      <Stack gap="4">
        {request.isError && (
          <Alert.Root status="error" colorPalette="nogo" role="alert">
            <Alert.Indicator />
            <Alert.Title>{errorMessage(request.error)}</Alert.Title>
          </Alert.Root>
        )}
        <FormField label="E-mail" error={errors.email?.message} required>
          <Input type="email" autoComplete="username" {...register('email')} size="lg" />
        </FormField>
        <Button type="submit" size="lg" colorPalette="accent" loading={request.isPending} loadingText="Sending…">
          Send me a link
        </Button>
        <PageLink to="/sign-in">Back to sign in</PageLink>
      </Stack>
    </form>
  );
}
