import { Alert, Button, Input, NativeSelect, SimpleGrid, Stack } from '@chakra-ui/react';
import { zodResolver } from '@hookform/resolvers/zod';
import { useForm } from 'react-hook-form';
import { FormField } from '../../../components/form-field.js';
import { ShipPicker, useShipChoice } from '../../../components/ship-picker.js';
import { aircraftClassChoices } from '../../../lib/aircraft-class.js';
import { errorMessage } from '../../../lib/api-error.js';
import { aircraftTypeSchema, blankAircraftType } from '../aircraft-type-model.js';
import { useCreateAircraftType } from '../api/create-aircraft-type.js';

type Field = Exclude<keyof typeof blankAircraftType, 'aircraftClass'>;

export function AircraftTypeForm({ onCreated }: { onCreated: (id: number) => void }) {
  const create = useCreateAircraftType();
  const ship = useShipChoice();
  const {
    register,
    handleSubmit,
    reset,
    formState: { errors },
  } = useForm({ resolver: zodResolver(aircraftTypeSchema), defaultValues: blankAircraftType });

  const field = (key: Field, label: string, helper?: string, numeric = true) => (
    <FormField
      key={key}
      label={label}
      error={errors[key]?.message}
      helper={helper}
      required={key !== 'afterburnerFromLb' && key !== 'operatingWeightLb' && key !== 'holdbackElement'}
    >
      <Input inputMode={numeric ? 'decimal' : 'text'} {...register(key)} />
    </FormField>
  );

  return (
    <form
      onSubmit={handleSubmit((type) =>
        create.mutate(
          { ...type, shipId: ship.ship?.id },
          {
            onSuccess: (created) => {
              reset();
              onCreated(created.id);
            },
          },
        ),
      )}
      noValidate
      aria-label="Add an aircraft type"
    >
      <Stack gap="3">
        {create.isError && (
          <Alert.Root status="error" colorPalette="nogo" role="alert">
            <Alert.Indicator />
            <Alert.Title>{errorMessage(create.error)}</Alert.Title>
          </Alert.Root>
        )}
        <SimpleGrid columns={{ base: 1, sm: 2, lg: 4 }} gap="3">
          <ShipPicker choice={ship} label="Ship it belongs to" />
          {field('designation', 'Designation', undefined, false)}
          {field('name', 'Name', undefined, false)}
          <FormField
            label="Class"
            error={errors.aircraftClass?.message}
            helper="Which of the ship's departures its aircraft fly."
            required
          >
            <NativeSelect.Root>
              <NativeSelect.Field {...register('aircraftClass')}>
                {aircraftClassChoices.map((choice) => (
                  <option key={choice.value} value={choice.value}>
                    {choice.label}
                  </option>
                ))}
              </NativeSelect.Field>
              <NativeSelect.Indicator />
            </NativeSelect.Root>
          </FormField>
          {field('maxGrossWeightLb', 'Max gross weight (lb)')}
          {field('operatingWeightLb', 'Operating weight (lb)', 'With crew, no fuel or stores; empty if not known.')}
          {field('crosswindLimitKt', 'Crosswind limit (kt)')}
          {field('thrustLbf', 'Thrust (lbf)')}
          {field('requiredExcessKt', 'Required excess (kt)')}
          {field('afterburnerFromLb', 'Afterburner from (lb)', 'Empty when never required.')}
          {field('maxEndSpeedKt', 'Max end speed (kt)', 'Overstress: a shot giving more is refused.')}
          {field(
            'holdbackElement',
            'Holdback release element',
            'As marked on it, e.g. RE-14; shown at the hook-up.',
            false,
          )}
        </SimpleGrid>
        <SimpleGrid columns={{ base: 1, md: 2 }} gap="3">
          {field('trimBands', 'Trim bands', 'e.g. 44000:15, 48000:17, *:18', false)}
          {field('launchTable', 'Launch table', 'e.g. 34000:124, 40000:133, 46000:143', false)}
        </SimpleGrid>
        <Button type="submit" colorPalette="accent" alignSelf="flex-start" loading={create.isPending}>
          Add type
        </Button>
      </Stack>
    </form>
  );
}
