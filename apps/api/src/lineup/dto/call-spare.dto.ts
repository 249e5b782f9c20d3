import type { CallSpareRequest } from '@catline/contracts';
import { IdField, VersionField } from './fields.js';

export class CallSpareDto implements CallSpareRequest {
  @VersionField("The down slot's version the call is based on.")
  slotVersion: number;

  @IdField('A spare held aside in the same cycle.')
  spareSlotId: number;

  @VersionField("The spare's version as the sender saw it.")
  spareVersion: number;
}
