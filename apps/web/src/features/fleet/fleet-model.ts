import {
  NAME_MAX_LENGTH,
  SIDE_NUMBER_MAX_LENGTH,
  SIDE_NUMBER_PATTERN,
  SQUADRON_CODE_MAX_LENGTH,
  SQUADRON_CODE_PATTERN,
} from '@catline/contracts';
import * as z from 'zod/mini';
import { chosenId, emailText, patternText, requiredText } from '../../lib/form-rules.js';

/** A new squadron as typed; the schema hands on the create request. */
export const squadronSchema = z.object({
  name: requiredText(NAME_MAX_LENGTH, 'Enter the squadron name.'),
  code: patternText(SQUADRON_CODE_PATTERN, `Up to ${SQUADRON_CODE_MAX_LENGTH} letters, digits or dashes.`),
  email: emailText('Enter the duty officer e-mail address.'),
});

export const blankSquadron: z.input<typeof squadronSchema> = { name: '', code: '', email: '' };

/** A new aircraft as typed; the schema hands on the create request, serviceable. */
export const aircraftSchema = z.object({
  sideNumber: patternText(SIDE_NUMBER_PATTERN, `Up to ${SIDE_NUMBER_MAX_LENGTH} letters, digits or dashes.`),
  typeId: chosenId('Pick a type.'),
  squadronId: chosenId('Pick a squadron.'),
  parkedSpot: z.string().check(z.minLength(1, 'Pick where it is parked.')),
});

export const blankAircraft: z.input<typeof aircraftSchema> = {
  sideNumber: '',
  typeId: '',
  squadronId: '',
  parkedSpot: '',
};
