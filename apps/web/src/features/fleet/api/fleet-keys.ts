import { aircraftKeys } from '../../../lib/queries/aircraft-query.js';
import { squadronKeys } from '../../../lib/queries/squadrons-query.js';

export const fleetKeys = { aircraft: aircraftKeys, squadrons: squadronKeys };
