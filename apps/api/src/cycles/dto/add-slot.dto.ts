import type { AddSlotRequest } from '@catline/contracts';
import { ApiProperty, ApiPropertyOptional } from '@nestjs/swagger';
import { IsBoolean, IsInt, IsNotEmpty, IsOptional, IsString, Max, MaxLength, Min } from 'class-validator';
import { Trim } from '../../common/validation/trim.decorator.js';

export class AddSlotDto implements AddSlotRequest {
  @ApiProperty({ minimum: 1 })
  @IsInt()
  @Min(1)
  @Max(2_147_483_647)
  aircraftId: number;

  @ApiPropertyOptional({ nullable: true, description: 'The pilot (a person with the pilot role) flying it.' })
  @IsOptional()
  @IsInt()
  @Min(1)
  @Max(2_147_483_647)
  pilotId?: number | null;

  @ApiProperty({ maxLength: 60 })
  @Trim()
  @IsString()
  @IsNotEmpty({ message: 'mission is required' })
  @MaxLength(60)
  mission: string;

  @ApiProperty({ minimum: 0, maximum: 100_000, description: 'lb' })
  @IsInt({ message: 'fuelLb must be a whole number of pounds' })
  @Min(0)
  @Max(100_000)
  fuelLb: number;

  @ApiProperty({ maxLength: 120 })
  @Trim()
  @IsString()
  @MaxLength(120)
  stores: string;

  @ApiProperty({ minimum: 1, maximum: 200_000, description: 'lb' })
  @IsInt({ message: 'grossWeightLb must be a whole number of pounds' })
  @Min(1)
  @Max(200_000)
  grossWeightLb: number;

  @ApiProperty() @IsBoolean() tanker: boolean;
  @ApiProperty() @IsBoolean() earlyWarning: boolean;
  @ApiProperty() @IsBoolean() spare: boolean;
}
