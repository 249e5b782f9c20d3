import { FUEL_LB, GROSS_WEIGHT_LB, MISSION_MAX_LENGTH, STORES_MAX_LENGTH } from '@catline/contracts';
import * as z from 'zod/mini';
import { formatWhole } from '../../lib/format.js';
import { chosenId, optionalText, requiredText, typedNumber } from '../../lib/form-rules.js';

/** An aircraft for the deck pool as typed; the schema hands on the add-slot request. */
export const addSlotSchema = z.object({
  aircraftId: chosenId('Pick an aircraft.'),
  // Empty for a slot without a pilot yet.
  pilotId: z.pipe(
    z.string(),
    z.transform((id: string) => (id ? Number(id) : undefined)),
  ),
  mission: requiredText(MISSION_MAX_LENGTH, 'Say what the sortie is for.'),
  fuelLb: typedNumber(FUEL_LB, `Enter the fuel in whole pounds, up to ${formatWhole(FUEL_LB.max)}.`, { whole: true }),
  stores: optionalText(STORES_MAX_LENGTH),
  grossWeightLb: typedNumber(
    GROSS_WEIGHT_LB,
    `Enter the gross weight in whole pounds, from ${GROSS_WEIGHT_LB.min} to ${formatWhole(GROSS_WEIGHT_LB.max)}.`,
    { whole: true },
  ),
  tanker: z.boolean(),
  earlyWarning: z.boolean(),
  spare: z.boolean(),
});

export const blankSlot: z.input<typeof addSlotSchema> = {
  aircraftId: '',
  pilotId: '',
  mission: '',
  fuelLb: '',
  stores: '',
  grossWeightLb: '',
  tanker: false,
  earlyWarning: false,
  spare: false,
};
