import { useState, type FormEvent } from 'react';
import { Alert, Button, Input, SimpleGrid, Stack } from '@chakra-ui/react';
import type { AircraftTypeView, DeckSpot, SquadronView } from '@catline/contracts';
import { FormField } from '../../../components/form-field.js';
import { SelectInput } from '../../../components/select-field.js';
import { errorMessage } from '../../../lib/api-error.js';
import { useCreateAircraft } from '../api/create-aircraft.js';

const blank = { sideNumber: '', typeId: '', squadronId: '', parkedSpot: '' };
type Errors = Partial<Record<keyof typeof blank, string>>;

export function AircraftForm({ types, squadrons, spots }: { types: AircraftTypeView[]; squadrons: SquadronView[]; spots: DeckSpot[] }) {
  const create = useCreateAircraft();
  const [values, setValues] = useState(blank);
  const [errors, setErrors] = useState<Errors>({});
  const set = (field: keyof typeof blank, value: string) => setValues((current) => ({ ...current, [field]: value }));

  const submit = (event: FormEvent) => {
    event.preventDefault();
    const found: Errors = {
      sideNumber: /^[A-Za-z0-9-]{1,8}$/.test(values.sideNumber.trim()) ? undefined : 'Up to 8 letters, digits or dashes.',
      typeId: values.typeId ? undefined : 'Pick a type.',
      squadronId: values.squadronId ? undefined : 'Pick a squadron.',
      parkedSpot: values.parkedSpot ? undefined : 'Pick where it is parked.',
    };
    setErrors(found);
    if (Object.values(found).some(Boolean)) return;
    create.mutate(
      { sideNumber: values.sideNumber.trim(), typeId: Number(values.typeId), squadronId: Number(values.squadronId), parkedSpot: values.parkedSpot, serviceable: true },
      { onSuccess: () => setValues(blank) },
    );
  };

  return (
    <form onSubmit={submit} noValidate aria-label="Add an aircraft">
      <Stack gap="3">
        {create.isError && (
          <Alert.Root status="error" colorPalette="nogo" role="alert">
            <Alert.Indicator />
            <Alert.Title>{errorMessage(create.error)}</Alert.Title>
          </Alert.Root>
        )}
        <SimpleGrid columns={{ base: 1, sm: 2, lg: 4 }} gap="3">
          <FormField label="Side number" error={errors.sideNumber} required>
            <Input value={values.sideNumber} onChange={(event) => set('sideNumber', event.currentTarget.value)} />
          </FormField>
          <FormField label="Type" error={errors.typeId} required>
            <SelectInput value={values.typeId} onChange={(value) => set('typeId', value)} placeholder="Pick a type" choices={types.map((type) => ({ value: String(type.id), label: `${type.designation} · ${type.name}` }))} />
          </FormField>
          <FormField label="Squadron" error={errors.squadronId} required>
            <SelectInput value={values.squadronId} onChange={(value) => set('squadronId', value)} placeholder="Pick a squadron" choices={squadrons.map((squadron) => ({ value: String(squadron.id), label: `${squadron.code} · ${squadron.name}` }))} />
          </FormField>
          <FormField label="Parked at" error={errors.parkedSpot} required>
            <SelectInput value={values.parkedSpot} onChange={(value) => set('parkedSpot', value)} placeholder="Pick a deck spot" choices={spots.map((spot) => ({ value: spot.name, label: spot.name }))} />
          </FormField>
        </SimpleGrid>
        <Button type="submit" colorPalette="accent" alignSelf="flex-start" loading={create.isPending}>
          Add aircraft
        </Button>
      </Stack>
    </form>
  );
}
