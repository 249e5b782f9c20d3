import { useState, type FormEvent } from 'react';
import { Alert, Button, HStack, Input, SimpleGrid, Stack } from '@chakra-ui/react';
import { CheckField } from '../../../components/check-field.js';
import { FormField } from '../../../components/form-field.js';
import { SelectInput } from '../../../components/select-field.js';
import { errorMessage } from '../../../lib/api-error.js';
import { useAircraft } from '../../../lib/queries/aircraft-query.js';
import { useAddSlot } from '../api/add-slot.js';
import { usePilots } from '../api/get-pilots.js';

const blank = { aircraftId: '', pilotId: '', mission: '', fuelLb: '', stores: '', grossWeightLb: '', tanker: false, earlyWarning: false, spare: false };
type Values = typeof blank;
type Errors = Partial<Record<keyof Values, string>>;

function validate(values: Values): Errors {
  const errors: Errors = {};
  if (!values.aircraftId) errors.aircraftId = 'Pick an aircraft.';
  if (!values.mission.trim()) errors.mission = 'Say what the sortie is for.';
  if (!/^\d+$/.test(values.fuelLb.trim())) errors.fuelLb = 'Enter the fuel in whole pounds.';
  if (!/^\d+$/.test(values.grossWeightLb.trim()) || Number(values.grossWeightLb) <= 0) errors.grossWeightLb = 'Enter the gross weight in whole pounds.';
  return errors;
}

/** Air operations puts one aircraft of the air plan into the cycle's deck pool. */
export function AddSlotForm({ cycleId }: { cycleId: number }) {
  const aircraft = useAircraft();
  const pilots = usePilots();
  const addSlot = useAddSlot(cycleId);
  const [values, setValues] = useState(blank);
  const [errors, setErrors] = useState<Errors>({});
  const set = <K extends keyof Values>(field: K, value: Values[K]) => setValues((current) => ({ ...current, [field]: value }));

  const submit = (event: FormEvent) => {
    event.preventDefault();
    const found = validate(values);
    setErrors(found);
    if (Object.keys(found).length > 0) return;
    addSlot.mutate(
      {
        aircraftId: Number(values.aircraftId),
        pilotId: values.pilotId ? Number(values.pilotId) : undefined,
        mission: values.mission.trim(),
        fuelLb: Number(values.fuelLb),
        stores: values.stores.trim(),
        grossWeightLb: Number(values.grossWeightLb),
        tanker: values.tanker,
        earlyWarning: values.earlyWarning,
        spare: values.spare,
      },
      { onSuccess: () => setValues(blank) },
    );
  };

  return (
    <form onSubmit={submit} noValidate aria-label="Add an aircraft to the cycle">
      <Stack gap="3">
        {addSlot.isError && (
          <Alert.Root status="error" colorPalette="nogo" role="alert">
            <Alert.Indicator />
            <Alert.Title>{errorMessage(addSlot.error)}</Alert.Title>
          </Alert.Root>
        )}
        <SimpleGrid columns={{ base: 1, sm: 2, lg: 3 }} gap="3">
          <FormField label="Aircraft" error={errors.aircraftId} required>
            <SelectInput
              value={values.aircraftId}
              onChange={(value) => set('aircraftId', value)}
              placeholder={aircraft.isPending ? 'Loading…' : 'Pick an aircraft'}
              choices={(aircraft.data ?? [])
                .filter((candidate) => candidate.serviceable)
                .map((candidate) => ({ value: String(candidate.id), label: `${candidate.sideNumber} · ${candidate.typeDesignation} · ${candidate.squadronCode}` }))}
            />
          </FormField>
          <FormField label="Pilot">
            <SelectInput
              value={values.pilotId}
              onChange={(value) => set('pilotId', value)}
              placeholder="No pilot yet"
              choices={(pilots.data ?? []).map((pilot) => ({ value: String(pilot.id), label: pilot.name }))}
            />
          </FormField>
          <FormField label="Mission" error={errors.mission} required>
            <Input value={values.mission} onChange={(event) => set('mission', event.currentTarget.value)} maxLength={60} />
          </FormField>
          <FormField label="Fuel (lb)" error={errors.fuelLb} required>
            <Input inputMode="numeric" value={values.fuelLb} onChange={(event) => set('fuelLb', event.currentTarget.value)} />
          </FormField>
          <FormField label="Gross weight (lb)" error={errors.grossWeightLb} required>
            <Input inputMode="numeric" value={values.grossWeightLb} onChange={(event) => set('grossWeightLb', event.currentTarget.value)} />
          </FormField>
          <FormField label="Stores">
            <Input value={values.stores} onChange={(event) => set('stores', event.currentTarget.value)} maxLength={120} />
          </FormField>
        </SimpleGrid>
        <HStack gap="6" wrap="wrap">
          <CheckField label="Tanker" checked={values.tanker} onChange={(checked) => set('tanker', checked)} />
          <CheckField label="Early warning" checked={values.earlyWarning} onChange={(checked) => set('earlyWarning', checked)} />
          <CheckField label="Spare" checked={values.spare} onChange={(checked) => set('spare', checked)} />
        </HStack>
        <Button type="submit" colorPalette="accent" alignSelf="flex-start" loading={addSlot.isPending}>
          Add to deck pool
        </Button>
      </Stack>
    </form>
  );
}
