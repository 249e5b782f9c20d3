import { useState, type FormEvent } from 'react';
import { Alert, Button, Input, SimpleGrid, Stack } from '@chakra-ui/react';
import { PASSWORD_MIN_LENGTH, ROLE_LABELS, ROLES, type CatapultView, type Role, type SquadronView, type UserView } from '@catline/contracts';
import { FormField } from '../../../components/form-field.js';
import { SelectInput } from '../../../components/select-field.js';
import { errorMessage } from '../../../lib/api-error.js';
import { useCreateUser } from '../api/create-user.js';

const blank = { name: '', email: '', role: 'observer' as Role, password: '', catapultId: '', squadronId: '' };
type Values = typeof blank;
type Errors = Partial<Record<keyof Values, string>>;

export const roleChoices = ROLES.map((role) => ({ value: role, label: ROLE_LABELS[role] }));

export function UserForm({ catapults, squadrons }: { catapults: CatapultView[]; squadrons: SquadronView[] }) {
  const create = useCreateUser();
  const [values, setValues] = useState(blank);
  const [errors, setErrors] = useState<Errors>({});
  const [created, setCreated] = useState<{ user: UserView; invited: boolean } | null>(null);
  const set = <K extends keyof Values>(field: K, value: Values[K]) => setValues((current) => ({ ...current, [field]: value }));

  const submit = (event: FormEvent) => {
    event.preventDefault();
    const found: Errors = {
      name: values.name.trim() ? undefined : 'Enter the name.',
      email: /^[^\s@]+@[^\s@]+\.[^\s@]+$/.test(values.email.trim()) ? undefined : 'Enter an e-mail address.',
      password: values.password === '' || values.password.length >= PASSWORD_MIN_LENGTH ? undefined : `At least ${PASSWORD_MIN_LENGTH} characters, or leave it empty to send an invitation.`,
      catapultId: values.role === 'catapult_officer' && !values.catapultId ? 'A catapult officer runs one catapult: pick it.' : undefined,
    };
    setErrors(found);
    if (Object.values(found).some(Boolean)) return;
    setCreated(null);
    create.mutate(
      {
        name: values.name.trim(),
        email: values.email.trim(),
        role: values.role,
        password: values.password === '' ? undefined : values.password,
        catapultId: values.role === 'catapult_officer' ? Number(values.catapultId) : undefined,
        squadronId: values.role === 'pilot' && values.squadronId ? Number(values.squadronId) : undefined,
      },
      {
        onSuccess: (user) => {
          setCreated({ user, invited: values.password === '' });
          setValues(blank);
        },
      },
    );
  };

  return (
    <form onSubmit={submit} noValidate aria-label="Add a person">
      <Stack gap="3">
        {create.isError && (
          <Alert.Root status="error" colorPalette="nogo" role="alert">
            <Alert.Indicator />
            <Alert.Title>{errorMessage(create.error)}</Alert.Title>
          </Alert.Root>
        )}
        {created && (
          <Alert.Root status="success" colorPalette="go" role="status" data-testid="person-added">
            <Alert.Indicator />
            <Alert.Content>
              <Alert.Title>{created.invited ? 'Invitation sent' : `${created.user.name} added`}</Alert.Title>
              <Alert.Description>
                {created.invited
                  ? `${created.user.name} gets an e-mail at ${created.user.email} with a link to choose a password. The link works once.`
                  : 'They can sign in with the first password you gave them.'}
              </Alert.Description>
            </Alert.Content>
          </Alert.Root>
        )}
        <SimpleGrid columns={{ base: 1, sm: 2, lg: 3 }} gap="3">
          <FormField label="Name" error={errors.name} required>
            <Input value={values.name} onChange={(event) => set('name', event.currentTarget.value)} />
          </FormField>
          <FormField label="E-mail" error={errors.email} required>
            <Input type="email" value={values.email} onChange={(event) => set('email', event.currentTarget.value)} />
          </FormField>
          <FormField label="First password" error={errors.password} helper="Leave empty to e-mail them an invitation to choose their own.">
            <Input type="password" autoComplete="new-password" value={values.password} onChange={(event) => set('password', event.currentTarget.value)} />
          </FormField>
          <FormField label="Role" required>
            <SelectInput value={values.role} onChange={(value) => set('role', value as Role)} choices={roleChoices} />
          </FormField>
          {values.role === 'catapult_officer' && (
            <FormField label="Catapult" error={errors.catapultId} required>
              <SelectInput value={values.catapultId} onChange={(value) => set('catapultId', value)} placeholder="Pick a catapult" choices={catapults.map((catapult) => ({ value: String(catapult.id), label: `Cat ${catapult.number} (${catapult.position})` }))} />
            </FormField>
          )}
          {values.role === 'pilot' && (
            <FormField label="Squadron">
              <SelectInput value={values.squadronId} onChange={(value) => set('squadronId', value)} placeholder="No squadron" choices={squadrons.map((squadron) => ({ value: String(squadron.id), label: `${squadron.code} · ${squadron.name}` }))} />
            </FormField>
          )}
        </SimpleGrid>
        <Button type="submit" colorPalette="accent" alignSelf="flex-start" loading={create.isPending}>
          Add person
        </Button>
      </Stack>
    </form>
  );
}
