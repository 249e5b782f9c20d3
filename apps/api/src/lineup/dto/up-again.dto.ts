import type { UpAgainRequest } from '@catline/contracts';
import { ReasonField, VersionField } from './fields.js';

export class UpAgainDto implements UpAgainRequest {
  @VersionField('The down slot version the command is based on.')
  slotVersion: number;

  @ReasonField('reason')
  reason: string;
}
