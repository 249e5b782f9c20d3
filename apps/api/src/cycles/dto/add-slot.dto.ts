import {
  type AddSlotRequest,
  FUEL_LB,
  GROSS_WEIGHT_LB,
  MISSION_MAX_LENGTH,
  STORES_MAX_LENGTH,
} from '@catline/contracts';
import { ApiProperty, ApiPropertyOptional } from '@nestjs/swagger';
import { IsBoolean, IsInt, IsNotEmpty, IsOptional, IsString, Max, MaxLength, Min } from 'class-validator';
import { Trim } from '../../common/validation/trim.decorator.js';
import { PlainText } from '../../common/validation/plain-text.decorator.js';

export class AddSlotDto implements AddSlotRequest {
  @ApiProperty({ type: 'integer', minimum: 1 })
  @IsInt()
  @Min(1)
  @Max(2_147_483_647)
  aircraftId: number;

  @ApiPropertyOptional({
    type: 'integer',
    nullable: true,
    description: 'The pilot (a person with the pilot role) flying it.',
  })
  @IsOptional()
  @IsInt()
  @Min(1)
  @Max(2_147_483_647)
  pilotId?: number | null;

  @ApiProperty({ maxLength: MISSION_MAX_LENGTH })
  @Trim()
  @IsString()
  @IsNotEmpty({ message: 'mission is required' })
  @PlainText()
  @MaxLength(MISSION_MAX_LENGTH)
  mission: string;

  @ApiProperty({ minimum: FUEL_LB.min, maximum: FUEL_LB.max, description: 'lb' })
  @IsInt({ message: 'fuelLb must be a whole number of pounds' })
  @Min(FUEL_LB.min)
  @Max(FUEL_LB.max)
  fuelLb: number;

  @ApiProperty({ maxLength: STORES_MAX_LENGTH })
  @Trim()
  @IsString()
  @PlainText()
  @MaxLength(STORES_MAX_LENGTH)
  stores: string;

  @ApiProperty({ minimum: GROSS_WEIGHT_LB.min, maximum: GROSS_WEIGHT_LB.max, description: 'lb' })
  @IsInt({ message: 'grossWeightLb must be a whole number of pounds' })
  @Min(GROSS_WEIGHT_LB.min)
  @Max(GROSS_WEIGHT_LB.max)
  grossWeightLb: number;

  @ApiProperty() @IsBoolean() tanker: boolean;
  @ApiProperty() @IsBoolean() earlyWarning: boolean;
  @ApiProperty() @IsBoolean() spare: boolean;
}
