import { useState } from 'react';
import { Alert, Button, Input, SimpleGrid, Stack } from '@chakra-ui/react';
import {
  isCatapultRole,
  ROLE_LABELS,
  ROLES,
  type CatapultView,
  type SquadronView,
  type UserView,
} from '@catline/contracts';
import { zodResolver } from '@hookform/resolvers/zod';
import { useForm, useWatch } from 'react-hook-form';
import { SelectControl } from '../../../components/form-controls.js';
import { FormField } from '../../../components/form-field.js';
import { ofShip, ShipPicker, useShipChoice } from '../../../components/ship-picker.js';
import { errorMessage } from '../../../lib/api-error.js';
import { useCreateUser } from '../api/create-user.js';
import { blankUser, userSchema } from '../user-form-model.js';

export const roleChoices = ROLES.map((role) => ({ value: role, label: ROLE_LABELS[role] }));

export function UserForm({ squadrons }: { squadrons: SquadronView[] }) {
  const create = useCreateUser();
  const ship = useShipChoice();
  // A catapult officer works a catapult of the ship they join.
  const catapults: CatapultView[] = ship.ship?.catapults ?? [];
  // A pilot flies with a squadron of the same ship.
  const shipSquadrons = ofShip(squadrons, ship.ship);
  const {
    register,
    control,
    handleSubmit,
    reset,
    setValue,
    formState: { errors },
  } = useForm({ resolver: zodResolver(userSchema), defaultValues: blankUser });
  const chooseShip = (shipId: number) => {
    ship.choose(shipId);
    setValue('catapultId', '');
    setValue('squadronId', '');
  };
  const role = useWatch({ control, name: 'role' });
  const [created, setCreated] = useState<{ user: UserView; invited: boolean } | null>(null);

  const submit = handleSubmit((person) => {
    setCreated(null);
    create.mutate(
      { ...person, shipId: ship.ship?.id },
      {
        onSuccess: (user) => {
          setCreated({ user, invited: person.password === undefined });
          reset();
        },
      },
    );
  });

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
          <ShipPicker choice={{ ...ship, choose: chooseShip }} label="Ship they belong to" />
          <FormField label="Name" error={errors.name?.message} required>
            <Input {...register('name')} />
          </FormField>
          <FormField label="E-mail" error={errors.email?.message} required>
            <Input type="email" {...register('email')} />
          </FormField>
          <FormField
            label="First password"
            error={errors.password?.message}
            helper="Leave empty to e-mail them an invitation to choose their own."
          >
            <Input type="password" autoComplete="new-password" {...register('password')} />
          </FormField>
          <FormField label="Role" required>
            <SelectControl control={control} name="role" choices={roleChoices} />
          </FormField>
          {isCatapultRole(role) && (
            <FormField label="Catapult" error={errors.catapultId?.message} required>
              <SelectControl
                control={control}
                name="catapultId"
                placeholder="Pick a catapult"
                choices={catapults.map((catapult) => ({
                  value: String(catapult.id),
                  label: `Cat ${catapult.number} (${catapult.position})`,
                }))}
              />
            </FormField>
          )}
          {role === 'pilot' && (
            <FormField label="Squadron">
              <SelectControl
                control={control}
                name="squadronId"
                placeholder="No squadron"
                choices={shipSquadrons.map((squadron) => ({
                  value: String(squadron.id),
                  label: `${squadron.code} · ${squadron.name}`,
                }))}
              />
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
