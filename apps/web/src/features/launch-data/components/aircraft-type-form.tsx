import { useState, type FormEvent } from 'react';
import { Alert, Button, Input, SimpleGrid, Stack } from '@chakra-ui/react';
import { FormField } from '../../../components/form-field.js';
import { errorMessage } from '../../../lib/api-error.js';
import { useCreateAircraftType } from '../api/create-aircraft-type.js';
import { parseLaunchTable, parseTrimBands } from '../launch-data-model.js';

const blank = {
  designation: '',
  name: '',
  maxGrossWeightLb: '',
  crosswindLimitKt: '',
  thrustLbf: '',
  requiredExcessKt: '',
  afterburnerFromLb: '',
  trimBands: '',
  launchTable: '',
};
type Values = typeof blank;
type Errors = Partial<Record<keyof Values, string>>;

const positive = (text: string) => text.trim() !== '' && Number.isFinite(Number(text)) && Number(text) > 0;

/** The launch table typed as `34000:124, 40000:133` (gross weight : minimum launch airspeed). */
function launchRowsOf(text: string) {
  const rows = text.split(',').map((pair) => pair.trim()).filter(Boolean).map((pair) => {
    const [grossWeightLb = '', minLaunchAirspeedKt = ''] = pair.split(':').map((piece) => piece.trim());
    return { grossWeightLb, minLaunchAirspeedKt };
  });
  return parseLaunchTable(rows);
}

export function AircraftTypeForm({ onCreated }: { onCreated: (id: number) => void }) {
  const create = useCreateAircraftType();
  const [values, setValues] = useState(blank);
  const [errors, setErrors] = useState<Errors>({});
  const set = (field: keyof Values, value: string) => setValues((current) => ({ ...current, [field]: value }));

  const submit = (event: FormEvent) => {
    event.preventDefault();
    const trimBands = parseTrimBands(values.trimBands);
    const table = launchRowsOf(values.launchTable);
    const found: Errors = {
      designation: values.designation.trim() ? undefined : 'Enter the designation.',
      name: values.name.trim() ? undefined : 'Enter the name.',
      maxGrossWeightLb: positive(values.maxGrossWeightLb) ? undefined : 'Enter the maximum gross weight in pounds.',
      crosswindLimitKt: positive(values.crosswindLimitKt) ? undefined : 'Enter the crosswind limit in knots.',
      thrustLbf: positive(values.thrustLbf) ? undefined : 'Enter the thrust in pounds-force.',
      requiredExcessKt: values.requiredExcessKt.trim() !== '' && Number(values.requiredExcessKt) >= 0 ? undefined : 'Enter the required excess in knots (0 or more).',
      afterburnerFromLb: values.afterburnerFromLb.trim() === '' || positive(values.afterburnerFromLb) ? undefined : 'Leave empty, or enter a weight in pounds.',
      trimBands: trimBands ? undefined : 'Write bands as 44000:15, 48000:17, *:18 — the last one with *.',
      launchTable: 'problem' in table ? table.problem : undefined,
    };
    setErrors(found);
    if (Object.values(found).some(Boolean) || !trimBands || 'problem' in table) return;
    create.mutate(
      {
        designation: values.designation.trim(),
        name: values.name.trim(),
        maxGrossWeightLb: Number(values.maxGrossWeightLb),
        crosswindLimitKt: Number(values.crosswindLimitKt),
        thrustLbf: Number(values.thrustLbf),
        requiredExcessKt: Number(values.requiredExcessKt),
        afterburnerFromLb: values.afterburnerFromLb.trim() ? Number(values.afterburnerFromLb) : null,
        trimBands,
        launchTable: table.rows,
      },
      {
        onSuccess: (type) => {
          setValues(blank);
          onCreated(type.id);
        },
      },
    );
  };

  const field = (key: keyof Values, label: string, helper?: string, numeric = true) => (
    <FormField key={key} label={label} error={errors[key]} helper={helper} required={key !== 'afterburnerFromLb'}>
      <Input inputMode={numeric ? 'decimal' : 'text'} value={values[key]} onChange={(event) => set(key, event.currentTarget.value)} />
    </FormField>
  );

  return (
    <form onSubmit={submit} noValidate aria-label="Add an aircraft type">
      <Stack gap="3">
        {create.isError && (
          <Alert.Root status="error" colorPalette="nogo" role="alert">
            <Alert.Indicator />
            <Alert.Title>{errorMessage(create.error)}</Alert.Title>
          </Alert.Root>
        )}
        <SimpleGrid columns={{ base: 1, sm: 2, lg: 4 }} gap="3">
          {field('designation', 'Designation', undefined, false)}
          {field('name', 'Name', undefined, false)}
          {field('maxGrossWeightLb', 'Max gross weight (lb)')}
          {field('crosswindLimitKt', 'Crosswind limit (kt)')}
          {field('thrustLbf', 'Thrust (lbf)')}
          {field('requiredExcessKt', 'Required excess (kt)')}
          {field('afterburnerFromLb', 'Afterburner from (lb)', 'Empty when never required.')}
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
