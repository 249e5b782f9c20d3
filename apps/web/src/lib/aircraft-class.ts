import { AIRCRAFT_CLASSES, type AircraftClass } from '@catline/contracts';
import type { Choice } from '../components/select-field.js';

/** The words every screen uses for a type's class. */
export const AIRCRAFT_CLASS_LABELS: Record<AircraftClass, string> = {
  jet: 'Jet',
  turboprop: 'Turboprop',
  helicopter: 'Helicopter',
};

export const aircraftClassChoices: Choice[] = AIRCRAFT_CLASSES.map((value) => ({
  value,
  label: AIRCRAFT_CLASS_LABELS[value],
}));
