import type { SuspendSlotRequest } from '@catline/contracts';
import { ReasonField, VersionField } from './fields.js';

export class SuspendSlotDto implements SuspendSlotRequest {
  @VersionField('The slot version the suspend is based on.')
  slotVersion: number;

  /** Left out: one tap suspends, and the reason is chosen afterwards. */
  @ReasonField('reason', { optional: true })
  reason?: string;
}
