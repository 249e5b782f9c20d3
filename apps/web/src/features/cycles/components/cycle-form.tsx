import { Alert, Button, HStack, Input, SimpleGrid, Stack } from '@chakra-ui/react';
import { WEATHER_CASES, zoneName } from '@catline/contracts';
import { zodResolver } from '@hookform/resolvers/zod';
import { useForm, useWatch } from 'react-hook-form';
import { CheckControl, SelectControl } from '../../../components/form-controls.js';
import { FormField } from '../../../components/form-field.js';
import { cycleFormSchema, type CycleFormValues } from '../cycle-form-model.js';

type FigureField = Exclude<keyof CycleFormValues, 'weatherCase' | 'night' | 'windFrame'>;

interface CycleFormProps {
  initial: CycleFormValues;
  /** Only a new cycle takes a number; conditions edits keep it. */
  withNumber: boolean;
  /** The ship's zone: the times are typed on its clock, and the labels name it. */
  timeZone: string;
  submitLabel: string;
  pending: boolean;
  serverError: string | null;
  readOnly?: boolean;
  onSubmit: (values: CycleFormValues) => void;
  onCancel?: () => void;
}

const shipFields: [FigureField, string][] = [
  ['shipCourseDeg', 'Ship course (°T)'],
  ['shipSpeedKt', 'Ship speed (kt)'],
];
const trueWindFields: [FigureField, string][] = [
  ['trueWindFromDeg', 'True wind from (°T)'],
  ['trueWindSpeedKt', 'True wind speed (kt)'],
];
// Read off the deck's anemometer: where the wind comes from off the bow, and its speed over the deck.
const relativeWindFields: [FigureField, string][] = [
  ['relativeWindBearingDeg', 'Wind off the bow (°, port −)'],
  ['relativeWindSpeedKt', 'Wind over the deck (kt)'],
];
const gustFields: [FigureField, string][] = [
  ['windGustKt', 'Gust (kt, optional)'],
  ['windLullKt', 'Lull (kt, optional)'],
];
const airFields: [FigureField, string][] = [
  ['temperatureC', 'Temperature (°C)'],
  ['pressureHpa', 'Pressure (hPa)'],
];

const WIND_FRAME_CHOICES = [
  { value: 'true', label: 'True wind' },
  { value: 'relative', label: 'Across the deck' },
];

export function CycleForm({
  initial,
  withNumber,
  timeZone,
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
  // A new cycle starts from the true wind; a reading across the deck, gust and lull come with a change.
  const acrossTheDeck = useWatch({ control, name: 'windFrame' }) === 'relative';
  const figureFields = [
    ...shipFields,
    ...(acrossTheDeck ? relativeWindFields : trueWindFields),
    ...(withNumber ? [] : gustFields),
    ...airFields,
  ];
  const zone = zoneName(timeZone);

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
          <FormField label={`Window opens (${zone})`} error={errors.windowStartAt?.message} required>
            <Input type="datetime-local" {...register('windowStartAt')} disabled={readOnly} />
          </FormField>
          <FormField label={`Planned first launch (${zone})`} error={errors.plannedLaunchAt?.message} required>
            <Input type="datetime-local" {...register('plannedLaunchAt')} disabled={readOnly} />
          </FormField>
          <FormField label={`Window closes (${zone})`} error={errors.windowEndAt?.message} required>
            <Input type="datetime-local" {...register('windowEndAt')} disabled={readOnly} />
          </FormField>
          {!withNumber && (
            <FormField label="Wind entered as" required>
              <SelectControl control={control} name="windFrame" choices={WIND_FRAME_CHOICES} disabled={readOnly} />
            </FormField>
          )}
          {figureFields.map(([field, label]) => (
            <FormField key={field} label={label} error={errors[field]?.message} required={!label.includes('optional')}>
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
