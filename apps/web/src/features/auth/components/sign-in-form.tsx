import { useState, type FormEvent } from 'react';
import { Alert, Button, Input, Stack } from '@chakra-ui/react';
import { FormField } from '../../../components/form-field.js';
import { errorMessage } from '../../../lib/api-error.js';
import { useSignIn } from '../api/sign-in.js';
import { emailPattern } from '../auth-model.js';

export function SignInForm() {
  const signIn = useSignIn();
  const [email, setEmail] = useState('');
  const [password, setPassword] = useState('');
  const [problems, setProblems] = useState<{ email?: string; password?: string }>({});

  const submit = (event: FormEvent) => {
    event.preventDefault();
    const found = {
      email: emailPattern.test(email.trim()) ? undefined : 'Enter your e-mail address, like name@ship.example.',
      password: password ? undefined : 'Enter your password.',
    };
    setProblems(found);
    if (found.email || found.password) return;
    signIn.mutate({ email: email.trim(), password });
  };

  return (
    <form onSubmit={submit} noValidate>
      <Stack gap="4">
      {signIn.isError && (
        <Alert.Root status="error" colorPalette="nogo" role="alert" data-testid="sign-in-error">
          <Alert.Indicator />
          <Alert.Title>{errorMessage(signIn.error)}</Alert.Title>
        </Alert.Root>
      )}
      <FormField label="E-mail" error={problems.email} required>
        <Input type="email" autoComplete="username" value={email} onChange={(event) => setEmail(event.currentTarget.value)} size="lg" />
      </FormField>
      <FormField label="Password" error={problems.password} required>
        <Input type="password" autoComplete="current-password" value={password} onChange={(event) => setPassword(event.currentTarget.value)} size="lg" />
      </FormField>
      <Button type="submit" size="lg" colorPalette="accent" loading={signIn.isPending} loadingText="Signing in…">
        Sign in
      </Button>
      </Stack>
    </form>
  );
}
