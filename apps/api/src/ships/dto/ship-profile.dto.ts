import type { ShipProfile } from '@catline/contracts';
import { ApiProperty } from '@nestjs/swagger';
import { Type } from 'class-transformer';
import { IsNotEmpty, IsNumber, IsObject, IsString, Max, MaxLength, Min, ValidateNested } from 'class-validator';
import { Trim } from '../../common/validation/trim.decorator.js';

class ClearingTurnDto {
  @ApiProperty({ minimum: -180, maximum: 180, description: 'Degrees; positive to starboard.' })
  @IsNumber()
  @Min(-180)
  @Max(180)
  bow: number;

  @ApiProperty({ minimum: -180, maximum: 180 })
  @IsNumber()
  @Min(-180)
  @Max(180)
  waist: number;
}

class DeparturesDto {
  @ApiProperty()
  @Trim()
  @IsString()
  @IsNotEmpty()
  @MaxLength(1000)
  I: string;

  @ApiProperty()
  @Trim()
  @IsString()
  @IsNotEmpty()
  @MaxLength(1000)
  II: string;

  @ApiProperty()
  @Trim()
  @IsString()
  @IsNotEmpty()
  @MaxLength(1000)
  III: string;
}

export class ShipProfileDto implements ShipProfile {
  @ApiProperty({ type: ClearingTurnDto })
  @IsObject()
  @ValidateNested()
  @Type(() => ClearingTurnDto)
  clearingTurnDeg: ClearingTurnDto;

  @ApiProperty({ type: DeparturesDto })
  @IsObject()
  @ValidateNested()
  @Type(() => DeparturesDto)
  departures: DeparturesDto;
}
