import type { CreateCycleRequest, CycleConditions, CycleView, UpdateCycleConditionsRequest, WeatherCase } from '@catline/contracts';

/** Form values as typed: strings until they pass validation. */
export interface CycleFormValues {
  number: string;
  plannedLaunchAt: string;
  windowStartAt: string;
  windowEndAt: string;
  shipCourseDeg: string;
  shipSpeedKt: string;
  trueWindFromDeg: string;
  trueWindSpeedKt: string;
  temperatureC: string;
  pressureHpa: string;
  weatherCase: WeatherCase;
  night: boolean;
  landingAreaInUse: boolean;
}

export type CycleFormErrors = Partial<Record<keyof CycleFormValues, string>>;

const pad = (n: number) => String(n).padStart(2, '0');

/** `datetime-local` works in the device's local time without a zone. */
export function toLocalInput(iso: string): string {
  const date = new Date(iso);
  return `${date.getFullYear()}-${pad(date.getMonth() + 1)}-${pad(date.getDate())}T${pad(date.getHours())}:${pad(date.getMinutes())}`;
}

const fromLocalInput = (value: string) => new Date(value).toISOString();

export function newCycleValues(now = new Date(), nextNumber = 1): CycleFormValues {
  const planned = new Date(now.getTime() + 30 * 60_000);
  planned.setSeconds(0, 0);
  return {
    number: String(nextNumber),
    plannedLaunchAt: toLocalInput(planned.toISOString()),
    windowStartAt: toLocalInput(new Date(planned.getTime() - 5 * 60_000).toISOString()),
    windowEndAt: toLocalInput(new Date(planned.getTime() + 20 * 60_000).toISOString()),
    shipCourseDeg: '0',
    shipSpeedKt: '20',
    trueWindFromDeg: '0',
    trueWindSpeedKt: '10',
    temperatureC: '15',
    pressureHpa: '1013',
    weatherCase: 'I',
    night: false,
    landingAreaInUse: false,
  };
}

export function valuesFromCycle(cycle: CycleView): CycleFormValues {
  return {
    number: String(cycle.number),
    plannedLaunchAt: toLocalInput(cycle.plannedLaunchAt),
    windowStartAt: toLocalInput(cycle.windowStartAt),
    windowEndAt: toLocalInput(cycle.windowEndAt),
    shipCourseDeg: String(cycle.shipCourseDeg),
    shipSpeedKt: String(cycle.shipSpeedKt),
    trueWindFromDeg: String(cycle.trueWindFromDeg),
    trueWindSpeedKt: String(cycle.trueWindSpeedKt),
    temperatureC: String(cycle.temperatureC),
    pressureHpa: String(cycle.pressureHpa),
    weatherCase: cycle.weatherCase,
    night: cycle.night,
    landingAreaInUse: cycle.landingAreaInUse,
  };
}

type NumericField = 'shipCourseDeg' | 'shipSpeedKt' | 'trueWindFromDeg' | 'trueWindSpeedKt' | 'temperatureC' | 'pressureHpa';

// Plausible bounds for a person's typing mistakes; the server holds the real rules.
const ranges: Record<NumericField, [number, number, string]> = {
  shipCourseDeg: [0, 359.9, 'a course from 0 to 359°'],
  shipSpeedKt: [0, 40, 'a speed from 0 to 40 kt'],
  trueWindFromDeg: [0, 359.9, 'a direction from 0 to 359°'],
  trueWindSpeedKt: [0, 80, 'a wind speed from 0 to 80 kt'],
  temperatureC: [-40, 55, 'a temperature from −40 to 55 °C'],
  pressureHpa: [900, 1080, 'a pressure from 900 to 1080 hPa'],
};

export function validateCycleForm(values: CycleFormValues, withNumber: boolean): CycleFormErrors {
  const errors: CycleFormErrors = {};
  if (withNumber && !/^\d+$/.test(values.number.trim())) errors.number = 'Enter the cycle number, a whole number.';
  for (const [field, [min, max, words]] of Object.entries(ranges) as [NumericField, [number, number, string]][]) {
    const value = Number(values[field]);
    if (values[field].trim() === '' || !Number.isFinite(value) || value < min || value > max) errors[field] = `Enter ${words}.`;
  }
  const times = (['windowStartAt', 'plannedLaunchAt', 'windowEndAt'] as const).map((field) => Date.parse(values[field]));
  (['windowStartAt', 'plannedLaunchAt', 'windowEndAt'] as const).forEach((field, index) => {
    if (Number.isNaN(times[index])) errors[field] = 'Enter a date and time.';
  });
  if (!errors.windowStartAt && !errors.plannedLaunchAt && times[0] > times[1]) errors.windowStartAt = 'The window must open before the planned launch.';
  if (!errors.windowEndAt && !errors.plannedLaunchAt && times[2] <= times[1]) errors.windowEndAt = 'The window must close after the planned launch.';
  return errors;
}

function conditionsOf(values: CycleFormValues): CycleConditions & Pick<CreateCycleRequest, 'plannedLaunchAt' | 'windowStartAt' | 'windowEndAt'> {
  return {
    plannedLaunchAt: fromLocalInput(values.plannedLaunchAt),
    windowStartAt: fromLocalInput(values.windowStartAt),
    windowEndAt: fromLocalInput(values.windowEndAt),
    shipCourseDeg: Number(values.shipCourseDeg),
    shipSpeedKt: Number(values.shipSpeedKt),
    trueWindFromDeg: Number(values.trueWindFromDeg),
    trueWindSpeedKt: Number(values.trueWindSpeedKt),
    temperatureC: Number(values.temperatureC),
    pressureHpa: Number(values.pressureHpa),
    weatherCase: values.weatherCase,
    night: values.night,
    landingAreaInUse: values.landingAreaInUse,
  };
}

export const toCreateRequest = (values: CycleFormValues, shipId: number): CreateCycleRequest => ({
  ...conditionsOf(values),
  shipId,
  number: Number(values.number),
});

export const toConditionsRequest = (values: CycleFormValues, basisVersion: number): UpdateCycleConditionsRequest => ({
  ...conditionsOf(values),
  basisVersion,
});
