import { Alert, Button, HStack, Input, SimpleGrid, Stack } from '@chakra-ui/react';
import { MISSION_MAX_LENGTH, STORES_MAX_LENGTH } from '@catline/contracts';
import { zodResolver } from '@hookform/resolvers/zod';
import { useForm } from 'react-hook-form';
import { CheckControl, SelectControl } from '../../../components/form-controls.js';
import { FormField } from '../../../components/form-field.js';
import { errorMessage } from '../../../lib/api-error.js';
import { useAircraft } from '../../../lib/queries/aircraft-query.js';
import { addSlotSchema, blankSlot } from '../add-slot-model.js';
import { useAddSlot } from '../api/add-slot.js';
import { usePilots } from '../api/get-pilots.js';

/** Air operations puts one aircraft of the air plan into the cycle's deck pool. */
export function AddSlotForm({ cycleId }: { cycleId: number }) {
  const aircraft = useAircraft();
  const pilots = usePilots();
  const addSlot = useAddSlot(cycleId);
  const {
    register,
    control,
    handleSubmit,
    reset,
    formState: { errors },
  } = useForm({ resolver: zodResolver(addSlotSchema), defaultValues: blankSlot });

  return (
    <form
      onSubmit={handleSubmit((slot) => addSlot.mutate(slot, { onSuccess: () => reset() }))}
      noValidate
      aria-label="Add an aircraft to the cycle"
    >
      <Stack gap="3">
        {addSlot.isError && (
          <Alert.Root status="error" colorPalette="nogo" role="alert">
            <Alert.Indicator />
            <Alert.Title>{errorMessage(addSlot.error)}</Alert.Title>
          </Alert.Root>
        )}
        <SimpleGrid columns={{ base: 1, sm: 2, lg: 3 }} gap="3">
          <FormField label="Aircraft" error={errors.aircraftId?.message} required>
            <SelectControl
              control={control}
              name="aircraftId"
              placeholder={aircraft.isPending ? 'Loading…' : 'Pick an aircraft'}
              choices={(aircraft.data ?? [])
                .filter((candidate) => candidate.serviceable)
                .map((candidate) => ({
                  value: String(candidate.id),
                  label: `${candidate.sideNumber} · ${candidate.typeDesignation} · ${candidate.squadronCode}`,
                }))}
            />
          </FormField>
          <FormField label="Pilot">
            <SelectControl
              control={control}
              name="pilotId"
              placeholder="No pilot yet"
              choices={(pilots.data ?? []).map((pilot) => ({ value: String(pilot.id), label: pilot.name }))}
            />
          </FormField>
          <FormField label="Mission" error={errors.mission?.message} required>
            <Input {...register('mission')} maxLength={MISSION_MAX_LENGTH} />
          </FormField>
          <FormField label="Fuel (lb)" error={errors.fuelLb?.message} required>
            <Input inputMode="numeric" {...register('fuelLb')} />
          </FormField>
          <FormField label="Gross weight (lb)" error={errors.grossWeightLb?.message} required>
            <Input inputMode="numeric" {...register('grossWeightLb')} />
          </FormField>
          <FormField label="Stores" error={errors.stores?.message}>
            <Input {...register('stores')} maxLength={STORES_MAX_LENGTH} />
          </FormField>
        </SimpleGrid>
        <HStack gap="6" wrap="wrap">
          <CheckControl control={control} name="tanker" label="Tanker" />
          <CheckControl control={control} name="earlyWarning" label="Early warning" />
          <CheckControl control={control} name="spare" label="Spare" />
        </HStack>
        <Button type="submit" colorPalette="accent" alignSelf="flex-start" loading={addSlot.isPending}>
          Add to deck pool
        </Button>
      </Stack>
    </form>
  );
}
