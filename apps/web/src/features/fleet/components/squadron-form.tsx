import { Alert, Button, Input, SimpleGrid, Stack } from '@chakra-ui/react';
import { zodResolver } from '@hookform/resolvers/zod';
import { useForm } from 'react-hook-form';
import { FormField } from '../../../components/form-field.js';
import { ShipPicker, useShipChoice } from '../../../components/ship-picker.js';
import { errorMessage } from '../../../lib/api-error.js';
import { useCreateSquadron } from '../api/create-squadron.js';
import { blankSquadron, squadronSchema } from '../fleet-model.js';

/** A new squadron, on the ship the screen shows unless a fleet admin picks another. */
export function SquadronForm({ shipId }: { shipId: number | undefined }) {
  const create = useCreateSquadron();
  const ship = useShipChoice(shipId);
  const {
    register,
    handleSubmit,
    reset,
    formState: { errors },
  } = useForm({ resolver: zodResolver(squadronSchema), defaultValues: blankSquadron });
  const code = register('code');

  return (
    <form
      onSubmit={handleSubmit((squadron) =>
        create.mutate({ ...squadron, shipId: ship.ship?.id }, { onSuccess: () => reset() }),
      )}
      noValidate
      aria-label="Add a squadron"
    >
      <Stack gap="3">
        {create.isError && (
          <Alert.Root status="error" colorPalette="nogo" role="alert">
            <Alert.Indicator />
            <Alert.Title>{errorMessage(create.error)}</Alert.Title>
          </Alert.Root>
        )}
        <SimpleGrid columns={{ base: 1, sm: 3 }} gap="3">
          <ShipPicker choice={ship} label="Ship it belongs to" />
          <FormField label="Name" error={errors.name?.message} required>
            <Input {...register('name')} />
          </FormField>
          <FormField label="Code" error={errors.code?.message} required>
            <Input
              {...code}
              onChange={(event) => {
                // Codes are written in capitals; the text changes as it is typed.
                event.currentTarget.value = event.currentTarget.value.toUpperCase();
                return code.onChange(event);
              }}
            />
          </FormField>
          <FormField label="E-mail for reports" error={errors.email?.message} required>
            <Input type="email" {...register('email')} />
          </FormField>
        </SimpleGrid>
        <Button type="submit" colorPalette="accent" alignSelf="flex-start" loading={create.isPending}>
          Add squadron
        </Button>
      </Stack>
    </form>
  );
}
