import type { WeightAckRequest } from '@catline/contracts';
import { ApiProperty } from '@nestjs/swagger';
import { IsInt, Max, Min } from 'class-validator';
import { VersionField } from './fields.js';

export class WeightAckDto implements WeightAckRequest {
  @VersionField('The slot version the acknowledgement is based on.')
  slotVersion: number;

  @ApiProperty({ minimum: 1, maximum: 200_000, description: 'The gross weight the pilot agrees to, lb.' })
  @IsInt({ message: 'grossWeightLb must be a whole number of pounds' })
  @Min(1)
  @Max(200_000)
  grossWeightLb: number;
}
