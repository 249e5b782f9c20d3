import { GROSS_WEIGHT_LB, type WeightAckRequest } from '@catline/contracts';
import { ApiProperty } from '@nestjs/swagger';
import { IsInt, Max, Min } from 'class-validator';
import { VersionField } from './fields.js';

export class WeightAckDto implements WeightAckRequest {
  @VersionField('The slot version the acknowledgement is based on.')
  slotVersion: number;

  @ApiProperty({
    minimum: GROSS_WEIGHT_LB.min,
    maximum: GROSS_WEIGHT_LB.max,
    description: 'The gross weight the pilot agrees to, lb.',
  })
  @IsInt({ message: 'grossWeightLb must be a whole number of pounds' })
  @Min(GROSS_WEIGHT_LB.min)
  @Max(GROSS_WEIGHT_LB.max)
  grossWeightLb: number;
}
