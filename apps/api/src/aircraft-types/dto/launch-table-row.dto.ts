import type { LaunchTableRow } from '@catline/contracts';
import { ApiProperty } from '@nestjs/swagger';
import { IsNumber, IsPositive, Max } from 'class-validator';

export class LaunchTableRowDto implements LaunchTableRow {
  @ApiProperty({ description: 'Pounds.' })
  @IsNumber()
  @IsPositive()
  @Max(1_000_000)
  grossWeightLb: number;

  @ApiProperty({ description: 'Knots.' })
  @IsNumber()
  @IsPositive()
  @Max(1000)
  minLaunchAirspeedKt: number;
}
