import type { TrimBand } from '@catline/contracts';
import { ApiProperty } from '@nestjs/swagger';
import { IsNumber, IsPositive, Max, Min, ValidateIf } from 'class-validator';

export class TrimBandDto implements TrimBand {
  @ApiProperty({
    type: Number,
    nullable: true,
    description: 'Upper gross weight of the band, pounds; null for the last band.',
  })
  @ValidateIf((_band: object, value: unknown) => value !== null)
  @IsNumber({}, { message: 'upToLb must be a number, or null for the last band' })
  @IsPositive()
  @Max(1_000_000)
  upToLb: number | null;

  @ApiProperty({ minimum: -45, maximum: 45, description: 'Degrees.' })
  @IsNumber()
  @Min(-45)
  @Max(45)
  trimDeg: number;
}
