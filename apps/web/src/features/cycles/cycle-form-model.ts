import {
  CONDITION_RANGES,
  type CreateCycleRequest,
  CYCLE_NUMBER,
  fromShipLocalInput,
  shipLocalInput,
  type CycleConditions,
  type CycleView,
  type UpdateCycleConditionsRequest,
  WEATHER_CASES,
} from '@catline/contracts';
import * as z from 'zod/mini';
import { formatWhole } from '../../lib/format.js';
import { numberText, optionalNumberText } from '../../lib/form-rules.js';

// A `datetime-local` field holds a date and time without a zone: the form fills and reads it on the
// ship's clock, whatever zone the device is set to.

/** How the wind is entered: the true wind, or the wind across the deck (a conditions change only). */
export const WIND_FRAMES = ['true', 'relative'] as const;

// A gust or lull left empty is the steady wind's.
const trueWindEntry = {
  windFrame: 'true',
  relativeWindBearingDeg: '',
  relativeWindSpeedKt: '',
  windGustKt: '',
  windLullKt: '',
} as const;

export function newCycleValues(timeZone: string, now = new Date(), nextNumber = 1): CycleFormValues {
  const planned = new Date(now.getTime() + 30 * 60_000);
  planned.setSeconds(0, 0);
  return {
    number: String(nextNumber),
    plannedLaunchAt: shipLocalInput(planned, timeZone),
    windowStartAt: shipLocalInput(new Date(planned.getTime() - 5 * 60_000), timeZone),
    windowEndAt: shipLocalInput(new Date(planned.getTime() + 20 * 60_000), timeZone),
    shipCourseDeg: '0',
    shipSpeedKt: '20',
    trueWindFromDeg: '0',
    trueWindSpeedKt: '10',
    ...trueWindEntry,
    temperatureC: '15',
    pressureHpa: '1013',
    weatherCase: 'I',
    night: false,
  };
}

export function valuesFromCycle(cycle: CycleView): CycleFormValues {
  return {
    number: String(cycle.number),
    plannedLaunchAt: shipLocalInput(cycle.plannedLaunchAt, cycle.timeZone),
    windowStartAt: shipLocalInput(cycle.windowStartAt, cycle.timeZone),
    windowEndAt: shipLocalInput(cycle.windowEndAt, cycle.timeZone),
    shipCourseDeg: String(cycle.shipCourseDeg),
    shipSpeedKt: String(cycle.shipSpeedKt),
    trueWindFromDeg: String(cycle.trueWindFromDeg),
    trueWindSpeedKt: String(cycle.trueWindSpeedKt),
    ...trueWindEntry,
    temperatureC: String(cycle.temperatureC),
    pressureHpa: String(cycle.pressureHpa),
    weatherCase: cycle.weatherCase,
    night: cycle.night,
  };
}

type ConditionFigure = keyof typeof CONDITION_RANGES;

const figureWords: Record<ConditionFigure, [words: string, unit: string]> = {
  shipCourseDeg: ['a course', '°'],
  shipSpeedKt: ['a speed', ' kt'],
  trueWindFromDeg: ['a direction', '°'],
  trueWindSpeedKt: ['a wind speed', ' kt'],
  temperatureC: ['a temperature', ' °C'],
  pressureHpa: ['a pressure', ' hPa'],
  relativeWindBearingDeg: ['a bearing off the bow', '°'],
  relativeWindSpeedKt: ['a wind speed', ' kt'],
  windGustKt: ['a gust', ' kt'],
  windLullKt: ['a lull', ' kt'],
  latitudeDeg: ['a latitude', '°'],
  longitudeDeg: ['a longitude', '°'],
};

// A typographic minus, as people write a temperature below zero.
const figure = (value: number) => (value < 0 ? `−${formatWhole(-value)}` : formatWhole(value));

const figureMessage = (field: ConditionFigure) => {
  const [words, unit] = figureWords[field];
  const range = CONDITION_RANGES[field];
  return `Enter ${words} from ${figure(range.min)} to ${figure(range.max)}${unit}.`;
};

const conditionFigure = (field: ConditionFigure) => numberText(CONDITION_RANGES[field], figureMessage(field));
const optionalConditionFigure = (field: ConditionFigure) =>
  optionalNumberText(CONDITION_RANGES[field], figureMessage(field));

const RELATIVE_WIND_FIGURES = ['relativeWindBearingDeg', 'relativeWindSpeedKt'] as const;

const dateTime = z.string().check(z.refine((text) => !Number.isNaN(Date.parse(text)), 'Enter a date and time.'));

/**
 * The cycle form as typed (text until it passes), checked against the server's ranges. Only a new
 * cycle takes a number; a conditions change keeps it.
 */
export const cycleFormSchema = (withNumber: boolean) =>
  z
    .object({
      number: withNumber
        ? numberText(
            CYCLE_NUMBER,
            `Enter the cycle number, a whole number from ${CYCLE_NUMBER.min} to ${formatWhole(CYCLE_NUMBER.max)}.`,
            { whole: true },
          )
        : z.string(),
      plannedLaunchAt: dateTime,
      windowStartAt: dateTime,
      windowEndAt: dateTime,
      shipCourseDeg: conditionFigure('shipCourseDeg'),
      shipSpeedKt: conditionFigure('shipSpeedKt'),
      trueWindFromDeg: conditionFigure('trueWindFromDeg'),
      trueWindSpeedKt: conditionFigure('trueWindSpeedKt'),
      windFrame: z.enum(WIND_FRAMES),
      // Checked below, when the wind is entered across the deck.
      relativeWindBearingDeg: z.string(),
      relativeWindSpeedKt: z.string(),
      windGustKt: optionalConditionFigure('windGustKt'),
      windLullKt: optionalConditionFigure('windLullKt'),
      temperatureC: conditionFigure('temperatureC'),
      pressureHpa: conditionFigure('pressureHpa'),
      weatherCase: z.enum(WEATHER_CASES),
      night: z.boolean(),
    })
    .check(
      z.superRefine((values, context) => {
        const [opens, planned, closes] = [values.windowStartAt, values.plannedLaunchAt, values.windowEndAt].map(
          Date.parse,
        );
        if (values.windFrame === 'relative')
          for (const field of RELATIVE_WIND_FIGURES) {
            if (!conditionFigure(field).safeParse(values[field]).success)
              context.addIssue({ code: 'custom', path: [field], message: figureMessage(field) });
          }
        if (Number.isNaN(planned)) return;
        if (opens > planned)
          context.addIssue({
            code: 'custom',
            path: ['windowStartAt'],
            message: 'The window must open before the planned launch.',
          });
        if (closes <= planned)
          context.addIssue({
            code: 'custom',
            path: ['windowEndAt'],
            message: 'The window must close after the planned launch.',
          });
      }),
    );

/** Form values as typed: text until they pass the schema. */
export type CycleFormValues = z.infer<ReturnType<typeof cycleFormSchema>>;

function conditionsOf(
  values: CycleFormValues,
  timeZone: string,
): CycleConditions & Pick<CreateCycleRequest, 'plannedLaunchAt' | 'windowStartAt' | 'windowEndAt'> {
  const instant = (local: string) => fromShipLocalInput(local, timeZone).toISOString();
  return {
    plannedLaunchAt: instant(values.plannedLaunchAt),
    windowStartAt: instant(values.windowStartAt),
    windowEndAt: instant(values.windowEndAt),
    shipCourseDeg: Number(values.shipCourseDeg),
    shipSpeedKt: Number(values.shipSpeedKt),
    trueWindFromDeg: Number(values.trueWindFromDeg),
    trueWindSpeedKt: Number(values.trueWindSpeedKt),
    temperatureC: Number(values.temperatureC),
    pressureHpa: Number(values.pressureHpa),
    weatherCase: values.weatherCase,
    night: values.night,
  };
}

export const toCreateRequest = (values: CycleFormValues, shipId: number, timeZone: string): CreateCycleRequest => ({
  ...conditionsOf(values, timeZone),
  shipId,
  number: Number(values.number),
});

type WindReadingRequest = Pick<
  UpdateCycleConditionsRequest,
  'trueWindFromDeg' | 'trueWindSpeedKt' | 'relativeWindBearingDeg' | 'relativeWindSpeedKt' | 'windGustKt' | 'windLullKt'
>;

/** The wind reading of a conditions change: true or across the deck, with a gust and a lull where typed. */
function windReadingOf(values: CycleFormValues): WindReadingRequest {
  const reading: WindReadingRequest =
    values.windFrame === 'relative'
      ? {
          relativeWindBearingDeg: Number(values.relativeWindBearingDeg),
          relativeWindSpeedKt: Number(values.relativeWindSpeedKt),
        }
      : { trueWindFromDeg: Number(values.trueWindFromDeg), trueWindSpeedKt: Number(values.trueWindSpeedKt) };
  if (values.windGustKt.trim() !== '') reading.windGustKt = Number(values.windGustKt);
  if (values.windLullKt.trim() !== '') reading.windLullKt = Number(values.windLullKt);
  return reading;
}

export function toConditionsRequest(
  values: CycleFormValues,
  cycle: Pick<CycleView, 'version' | 'timeZone'>,
): UpdateCycleConditionsRequest {
  const { trueWindFromDeg: _from, trueWindSpeedKt: _speed, ...rest } = conditionsOf(values, cycle.timeZone);
  return { ...rest, ...windReadingOf(values), basisVersion: cycle.version };
}
