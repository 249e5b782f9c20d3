import {
  AIRCRAFT_CLASSES,
  AIRCRAFT_TYPE_RANGES as RANGES,
  DEFAULT_AIRCRAFT_CLASS,
  HOLDBACK_ELEMENT_PATTERN,
  NAME_MAX_LENGTH,
  type Range,
  type TrimBand,
  TYPE_DESIGNATION_MAX_LENGTH,
} from '@catline/contracts';
import * as z from 'zod/mini';
import { formatWhole } from '../../lib/format.js';
import { optionalTypedNumber, parsedText, requiredText, typedNumber } from '../../lib/form-rules.js';
import { parseLaunchTable, parseTrimBands } from './launch-data-model.js';

const span = ({ min, max }: Range) => `${formatWhole(min)} to ${formatWhole(max)}`;

/** The launch table typed as `34000:124, 40000:133` (gross weight : minimum launch airspeed). */
function launchRowsOf(text: string) {
  const rows = text
    .split(',')
    .map((pair) => pair.trim())
    .filter(Boolean)
    .map((pair) => {
      const [grossWeightLb = '', minLaunchAirspeedKt = ''] = pair.split(':').map((piece) => piece.trim());
      return { grossWeightLb, minLaunchAirspeedKt };
    });
  return parseLaunchTable(rows);
}

const holdbackMessage = 'Leave empty, or enter the element as marked on it: letters, digits, dashes or dots.';

/** The holdback release element as typed: the designation marked on it, or nothing (null) while not known. */
export const holdbackElementText = z.pipe(
  z.string().check(
    z.trim(),
    z.refine((text) => text === '' || HOLDBACK_ELEMENT_PATTERN.test(text), holdbackMessage),
  ),
  z.transform((text: string) => (text === '' ? null : text)),
);

/** A new aircraft type as typed; the schema hands on the create request. */
export const aircraftTypeSchema = z.object({
  designation: requiredText(TYPE_DESIGNATION_MAX_LENGTH, 'Enter the designation.'),
  name: requiredText(NAME_MAX_LENGTH, 'Enter the name.'),
  aircraftClass: z.enum(AIRCRAFT_CLASSES, 'Choose the class: jet, turboprop or helicopter.'),
  maxGrossWeightLb: typedNumber(
    RANGES.maxGrossWeightLb,
    `Enter the maximum gross weight in whole pounds, ${span(RANGES.maxGrossWeightLb)}.`,
    { whole: true },
  ),
  operatingWeightLb: optionalTypedNumber(
    RANGES.operatingWeightLb,
    'Leave empty, or enter the operating weight with crew in whole pounds.',
    { whole: true },
  ),
  crosswindLimitKt: typedNumber(
    RANGES.crosswindLimitKt,
    `Enter the crosswind limit in knots, ${span(RANGES.crosswindLimitKt)}.`,
  ),
  thrustLbf: typedNumber(RANGES.thrustLbf, `Enter the thrust in whole pounds-force, ${span(RANGES.thrustLbf)}.`, {
    whole: true,
  }),
  requiredExcessKt: typedNumber(
    RANGES.requiredExcessKt,
    `Enter the required excess in knots, ${span(RANGES.requiredExcessKt)}.`,
  ),
  afterburnerFromLb: optionalTypedNumber(RANGES.afterburnerFromLb, 'Leave empty, or enter a weight in whole pounds.', {
    whole: true,
  }),
  maxEndSpeedKt: typedNumber(
    RANGES.maxEndSpeedKt,
    `Enter the maximum end speed (overstress) in knots, ${span(RANGES.maxEndSpeedKt)}.`,
  ),
  holdbackElement: holdbackElementText,
  trimBands: parsedText<TrimBand[]>((text) => {
    const bands = parseTrimBands(text);
    return bands ? { value: bands } : { problem: 'Write bands as 44000:15, 48000:17, *:18 — the last one with *.' };
  }),
  launchTable: parsedText((text) => {
    const table = launchRowsOf(text);
    return 'rows' in table ? { value: table.rows } : table;
  }),
});

export const blankAircraftType: z.input<typeof aircraftTypeSchema> = {
  designation: '',
  name: '',
  aircraftClass: DEFAULT_AIRCRAFT_CLASS,
  maxGrossWeightLb: '',
  operatingWeightLb: '',
  crosswindLimitKt: '',
  thrustLbf: '',
  requiredExcessKt: '',
  afterburnerFromLb: '',
  maxEndSpeedKt: '',
  holdbackElement: '',
  trimBands: '',
  launchTable: '',
};
