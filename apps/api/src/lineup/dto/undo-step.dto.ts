import type { UndoStepRequest } from '@catline/contracts';
import { VersionField } from './fields.js';

export class UndoStepDto implements UndoStepRequest {
  @VersionField('The slot version the undo is based on.')
  slotVersion: number;
}
