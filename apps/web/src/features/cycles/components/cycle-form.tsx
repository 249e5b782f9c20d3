import { useState, type FormEvent } from 'react';
import { Alert, Button, HStack, Input, SimpleGrid, Stack } from '@chakra-ui/react';
import { WEATHER_CASES, type WeatherCase } from '@catline/contracts';
import { CheckField } from '../../../components/check-field.js';
import { FormField } from '../../../components/form-field.js';
import { SelectInput } from '../../../components/select-field.js';
import { type CycleFormErrors, type CycleFormValues, validateCycleForm } from '../cycle-form-model.js';

interface CycleFormProps {
  initial: CycleFormValues;
  /** Only a new cycle takes a number; conditions edits keep it. */
  withNumber: boolean;
  submitLabel: string;
  pending: boolean;
  serverError: string | null;
  readOnly?: boolean;
  onSubmit: (values: CycleFormValues) => void;
  onCancel?: () => void;
}

const numberFields = [
  ['shipCourseDeg', 'Ship course (°T)'],
  ['shipSpeedKt', 'Ship speed (kt)'],
  ['trueWindFromDeg', 'True wind from (°T)'],
  ['trueWindSpeedKt', 'True wind speed (kt)'],
  ['temperatureC', 'Temperature (°C)'],
  ['pressureHpa', 'Pressure (hPa)'],
] as const;

export function CycleForm({ initial, withNumber, submitLabel, pending, serverError, readOnly, onSubmit, onCancel }: CycleFormProps) {
  const [values, setValues] = useState(initial);
  const [errors, setErrors] = useState<CycleFormErrors>({});
  const set = <K extends keyof CycleFormValues>(field: K, value: CycleFormValues[K]) => setValues((current) => ({ ...current, [field]: value }));

  const submit = (event: FormEvent) => {
    event.preventDefault();
    const found = validateCycleForm(values, withNumber);
    setErrors(found);
    if (Object.keys(found).length === 0) onSubmit(values);
  };

  return (
    <form onSubmit={submit} noValidate aria-label={submitLabel}>
      <Stack gap="4">
        {serverError && (
          <Alert.Root status="error" colorPalette="nogo" role="alert">
            <Alert.Indicator />
            <Alert.Title>{serverError}</Alert.Title>
          </Alert.Root>
        )}
        <SimpleGrid columns={{ base: 1, sm: 2, lg: 4 }} gap="3">
          {withNumber && (
            <FormField label="Cycle number" error={errors.number} required>
              <Input inputMode="numeric" value={values.number} onChange={(event) => set('number', event.currentTarget.value)} disabled={readOnly} />
            </FormField>
          )}
          <FormField label="Window opens" error={errors.windowStartAt} required>
            <Input type="datetime-local" value={values.windowStartAt} onChange={(event) => set('windowStartAt', event.currentTarget.value)} disabled={readOnly} />
          </FormField>
          <FormField label="Planned first launch" error={errors.plannedLaunchAt} required>
            <Input type="datetime-local" value={values.plannedLaunchAt} onChange={(event) => set('plannedLaunchAt', event.currentTarget.value)} disabled={readOnly} />
          </FormField>
          <FormField label="Window closes" error={errors.windowEndAt} required>
            <Input type="datetime-local" value={values.windowEndAt} onChange={(event) => set('windowEndAt', event.currentTarget.value)} disabled={readOnly} />
          </FormField>
          {numberFields.map(([field, label]) => (
            <FormField key={field} label={label} error={errors[field]} required>
              <Input inputMode="decimal" value={values[field]} onChange={(event) => set(field, event.currentTarget.value)} disabled={readOnly} />
            </FormField>
          ))}
          <FormField label="Weather case" required>
            <SelectInput
              value={values.weatherCase}
              onChange={(value) => set('weatherCase', value as WeatherCase)}
              choices={WEATHER_CASES.map((weatherCase) => ({ value: weatherCase, label: `Case ${weatherCase}` }))}
              disabled={readOnly}
            />
          </FormField>
        </SimpleGrid>
        <HStack gap="6" wrap="wrap">
          <CheckField label="Night cycle" checked={values.night} onChange={(checked) => set('night', checked)} disabled={readOnly} />
          <CheckField label="Landing area in use (waist catapults closed)" checked={values.landingAreaInUse} onChange={(checked) => set('landingAreaInUse', checked)} disabled={readOnly} />
        </HStack>
        {!readOnly && (
          <HStack gap="2">
            <Button type="submit" colorPalette="accent" loading={pending}>
              {submitLabel}
            </Button>
            {onCancel && (
              <Button variant="outline" onClick={onCancel}>
                Cancel
              </Button>
            )}
          </HStack>
        )}
      </Stack>
    </form>
  );
}
