import { useState, type FormEvent } from 'react';
import { Alert, Button, Input, SimpleGrid, Stack } from '@chakra-ui/react';
import { FormField } from '../../../components/form-field.js';
import { errorMessage } from '../../../lib/api-error.js';
import { useCreateSquadron } from '../api/create-squadron.js';

const blank = { name: '', code: '', email: '' };
type Errors = Partial<Record<keyof typeof blank, string>>;

export function SquadronForm() {
  const create = useCreateSquadron();
  const [values, setValues] = useState(blank);
  const [errors, setErrors] = useState<Errors>({});
  const set = (field: keyof typeof blank, value: string) => setValues((current) => ({ ...current, [field]: value }));

  const submit = (event: FormEvent) => {
    event.preventDefault();
    const found: Errors = {
      name: values.name.trim() ? undefined : 'Enter the squadron name.',
      code: /^[A-Za-z0-9-]{1,12}$/.test(values.code.trim()) ? undefined : 'Up to 12 letters, digits or dashes.',
      email: /^[^\s@]+@[^\s@]+\.[^\s@]+$/.test(values.email.trim()) ? undefined : 'Enter the duty officer e-mail address.',
    };
    setErrors(found);
    if (Object.values(found).some(Boolean)) return;
    create.mutate({ name: values.name.trim(), code: values.code.trim(), email: values.email.trim() }, { onSuccess: () => setValues(blank) });
  };

  return (
    <form onSubmit={submit} noValidate aria-label="Add a squadron">
      <Stack gap="3">
        {create.isError && (
          <Alert.Root status="error" colorPalette="nogo" role="alert">
            <Alert.Indicator />
            <Alert.Title>{errorMessage(create.error)}</Alert.Title>
          </Alert.Root>
        )}
        <SimpleGrid columns={{ base: 1, sm: 3 }} gap="3">
          <FormField label="Name" error={errors.name} required>
            <Input value={values.name} onChange={(event) => set('name', event.currentTarget.value)} />
          </FormField>
          <FormField label="Code" error={errors.code} required>
            <Input value={values.code} onChange={(event) => set('code', event.currentTarget.value.toUpperCase())} />
          </FormField>
          <FormField label="E-mail for reports" error={errors.email} required>
            <Input type="email" value={values.email} onChange={(event) => set('email', event.currentTarget.value)} />
          </FormField>
        </SimpleGrid>
        <Button type="submit" colorPalette="accent" alignSelf="flex-start" loading={create.isPending}>
          Add squadron
        </Button>
      </Stack>
    </form>
  );
}
