import { Alert, Button, Input, SimpleGrid, Stack } from '@chakra-ui/react';
import type { AircraftTypeView, DeckSpot, SquadronView } from '@catline/contracts';
import { zodResolver } from '@hookform/resolvers/zod';
import { useForm } from 'react-hook-form';
import { SelectControl } from '../../../components/form-controls.js';
import { FormField } from '../../../components/form-field.js';
import { errorMessage } from '../../../lib/api-error.js';
import { useCreateAircraft } from '../api/create-aircraft.js';
import { aircraftSchema, blankAircraft } from '../fleet-model.js';

export function AircraftForm({
  types,
  squadrons,
  spots,
}: {
  types: AircraftTypeView[];
  squadrons: SquadronView[];
  spots: DeckSpot[];
}) {
  const create = useCreateAircraft();
  const {
    register,
    control,
    handleSubmit,
    reset,
    formState: { errors },
  } = useForm({ resolver: zodResolver(aircraftSchema), defaultValues: blankAircraft });

  return (
    <form
      onSubmit={handleSubmit((aircraft) =>
        create.mutate({ ...aircraft, serviceable: true }, { onSuccess: () => reset() }),
      )}
      noValidate
      aria-label="Add an aircraft"
    >
      <Stack gap="3">
        {create.isError && (
          <Alert.Root status="error" colorPalette="nogo" role="alert">
            <Alert.Indicator />
            <Alert.Title>{errorMessage(create.error)}</Alert.Title>
          </Alert.Root>
        )}
        <SimpleGrid columns={{ base: 1, sm: 2, lg: 4 }} gap="3">
          <FormField label="Side number" error={errors.sideNumber?.message} required>
            <Input {...register('sideNumber')} />
          </FormField>
          <FormField label="Type" error={errors.typeId?.message} required>
            <SelectControl
              control={control}
              name="typeId"
              placeholder="Pick a type"
              choices={types.map((type) => ({ value: String(type.id), label: `${type.designation} · ${type.name}` }))}
            />
          </FormField>
          <FormField label="Squadron" error={errors.squadronId?.message} required>
            <SelectControl
              control={control}
              name="squadronId"
              placeholder="Pick a squadron"
              choices={squadrons.map((squadron) => ({
                value: String(squadron.id),
                label: `${squadron.code} · ${squadron.name}`,
              }))}
            />
          </FormField>
          <FormField label="Parked at" error={errors.parkedSpot?.message} required>
            <SelectControl
              control={control}
              name="parkedSpot"
              placeholder="Pick a deck spot"
              choices={spots.map((spot) => ({ value: spot.name, label: spot.name }))}
            />
          </FormField>
        </SimpleGrid>
        <Button type="submit" colorPalette="accent" alignSelf="flex-start" loading={create.isPending}>
          Add aircraft
        </Button>
      </Stack>
    </form>
  );
}
