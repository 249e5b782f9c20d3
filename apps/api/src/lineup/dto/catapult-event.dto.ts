import type { CatapultEventRequest } from '@catline/contracts';
import { VersionField } from './fields.js';

export class CatapultEventDto implements CatapultEventRequest {
  @VersionField('The slot version the event is based on.')
  slotVersion: number;
}
