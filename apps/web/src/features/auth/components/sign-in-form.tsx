import { Alert, Button, Input, Stack } from '@chakra-ui/react';
import { zodResolver } from '@hookform/resolvers/zod';
import { useForm } from 'react-hook-form';
import { FormField } from '../../../components/form-field.js';
import { errorMessage } from '../../../lib/api-error.js';
import { useSignIn } from '../api/sign-in.js';
import { signInSchema } from '../auth-model.js';

export function SignInForm() {
  const signIn = useSignIn();
  const {
    register,
    handleSubmit,
    formState: { errors },
  } = useForm({ resolver: zodResolver(signInSchema), defaultValues: { email: '', password: '' } });

  return (
    <form onSubmit={handleSubmit((values) => signIn.mutate(values))} noValidate>
      <Stack gap="4">
        {signIn.isError && (
          <Alert.Root status="error" colorPalette="nogo" role="alert" data-testid="sign-in-error">
            <Alert.Indicator />
            <Alert.Title>{errorMessage(signIn.error)}</Alert.Title>
          </Alert.Root>
        )}
        <FormField label="E-mail" error={errors.email?.message} required>
          <Input type="email" autoComplete="username" {...register('email')} size="lg" />
        </FormField>
        <FormField label="Password" error={errors.password?.message} required>
          <Input type="password" autoComplete="current-password" {...register('password')} size="lg" />
        </FormField>
        <Button type="submit" size="lg" colorPalette="accent" loading={signIn.isPending} loadingText="Signing in…">
          Sign in
        </Button>
      </Stack>
    </form>
  );
}
