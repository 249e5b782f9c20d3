import type { MarkDownRequest } from '@catline/contracts';
import { IdField, VersionField } from './fields.js';

export class MarkDownDto implements MarkDownRequest {
  @VersionField('The slot version the command is based on.')
  slotVersion: number;

  @IdField("A planned slot from the deck pool that takes the down aircraft's place.", { optional: true })
  spareSlotId?: number;
}
