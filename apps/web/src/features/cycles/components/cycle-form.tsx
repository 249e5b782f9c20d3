import { Alert, Button, HStack, Input, SimpleGrid, Stack } from '@chakra-ui/react';
import { WEATHER_CASES } from '@catline/contracts';
import { zodResolver } from '@hookform/resolvers/zod';
import { useForm } from 'react-hook-form';
import { CheckControl, SelectControl } from '../../../components/form-controls.js';
import { FormField } from '../../../components/form-field.js';
import { cycleFormSchema, type CycleFormValues } from '../cycle-form-model.js';

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

export function CycleForm({
  initial,
  withNumber,
  submitLabel,
  pending,
  serverError,
  readOnly,
  onSubmit,
  onCancel,
}: CycleFormProps) {
  const {
    register,
    control,
    handleSubmit,
    formState: { errors },
  } = useForm({ resolver: zodResolver(cycleFormSchema(withNumber)), defaultValues: initial });

  return (
    <form onSubmit={handleSubmit(onSubmit)} noValidate aria-label={submitLabel}>
      <Stack gap="4">
        {serverError && (
          <Alert.Root status="error" colorPalette="nogo" role="alert">
            <Alert.Indicator />
            <Alert.Title>{serverError}</Alert.Title>
          </Alert.Root>
        )}
        <SimpleGrid columns={{ base: 1, sm: 2, lg: 4 }} gap="3">
          {withNumber && (
            <FormField label="Cycle number" error={errors.number?.message} required>
              <Input inputMode="numeric" {...register('number')} disabled={readOnly} />
            </FormField>
          )}
          <FormField label="Window opens" error={errors.windowStartAt?.message} required>
            <Input type="datetime-local" {...register('windowStartAt')} disabled={readOnly} />
          </FormField>
          <FormField label="Planned first launch" error={errors.plannedLaunchAt?.message} required>
            <Input type="datetime-local" {...register('plannedLaunchAt')} disabled={readOnly} />
          </FormField>
          <FormField label="Window closes" error={errors.windowEndAt?.message} required>
            <Input type="datetime-local" {...register('windowEndAt')} disabled={readOnly} />
          </FormField>
          {numberFields.map(([field, label]) => (
            <FormField key={field} label={label} error={errors[field]?.message} required>
              <Input inputMode="decimal" {...register(field)} disabled={readOnly} />
            </FormField>
          ))}
          <FormField label="Weather case" required>
            <SelectControl
              control={control}
              name="weatherCase"
              choices={WEATHER_CASES.map((weatherCase) => ({ value: weatherCase, label: `Case ${weatherCase}` }))}
              disabled={readOnly}
            />
          </FormField>
        </SimpleGrid>
        <HStack gap="6" wrap="wrap">
          <CheckControl control={control} name="night" label="Night cycle" disabled={readOnly} />
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
