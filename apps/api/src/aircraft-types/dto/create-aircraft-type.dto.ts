import {
  AIRCRAFT_CLASSES,
  type AircraftClass,
  AIRCRAFT_TYPE_RANGES as RANGES,
  DEFAULT_AIRCRAFT_CLASS,
  type CreateAircraftTypeRequest,
  NAME_MAX_LENGTH,
  TYPE_DESIGNATION_MAX_LENGTH,
  HOLDBACK_ELEMENT_MAX_LENGTH,
  HOLDBACK_ELEMENT_PATTERN,
} from '@catline/contracts';
import { ApiProperty, ApiPropertyOptional } from '@nestjs/swagger';
import { Type } from 'class-transformer';
import {
  ArrayMaxSize,
  ArrayMinSize,
  IsArray,
  IsIn,
  IsInt,
  IsNotEmpty,
  IsNumber,
  IsOptional,
  IsPositive,
  IsString,
  Matches,
  Max,
  MaxLength,
  Min,
  ValidateIf,
  ValidateNested,
} from 'class-validator';
import { Trim } from '../../common/validation/trim.decorator.js';
import { LaunchTableRows } from './launch-table.dto.js';
import { LaunchTableRowDto } from './launch-table-row.dto.js';
import { TrimBandDto } from './trim-band.dto.js';
import { PlainText } from '../../common/validation/plain-text.decorator.js';
import { ShipChoiceDto } from '../../ships/dto/ship-choice.dto.js';

export class CreateAircraftTypeDto extends ShipChoiceDto implements CreateAircraftTypeRequest {
  @ApiProperty({ example: 'WKD-41' })
  @Trim()
  @IsString()
  @IsNotEmpty({ message: 'designation is required' })
  @PlainText()
  @MaxLength(TYPE_DESIGNATION_MAX_LENGTH)
  designation: string;

  @ApiProperty()
  @Trim()
  @IsString()
  @IsNotEmpty({ message: 'name is required' })
  @PlainText()
  @MaxLength(NAME_MAX_LENGTH)
  name: string;

  @ApiPropertyOptional({
    enum: AIRCRAFT_CLASSES,
    description: `Which of the ship profile's departures its aircraft fly; left out, ${DEFAULT_AIRCRAFT_CLASS}.`,
  })
  // Left out takes the default; null is refused like any other value outside the list.
  @ValidateIf((_, value) => value !== undefined)
  @IsIn(AIRCRAFT_CLASSES, { message: `aircraftClass must be one of ${AIRCRAFT_CLASSES.join(', ')}` })
  aircraftClass?: AircraftClass;

  @ApiProperty({ description: 'Pounds.' })
  @IsInt()
  @IsPositive()
  @Max(RANGES.maxGrossWeightLb.max)
  maxGrossWeightLb: number;

  @ApiPropertyOptional({
    type: 'integer',
    nullable: true,
    description: 'Operating weight with crew, pounds; null while not known.',
  })
  @IsOptional()
  @IsInt()
  @Min(RANGES.operatingWeightLb.min)
  @Max(RANGES.operatingWeightLb.max)
  operatingWeightLb?: number | null;

  @ApiProperty({ description: 'Knots.' })
  @IsNumber()
  @Min(RANGES.crosswindLimitKt.min)
  @Max(RANGES.crosswindLimitKt.max)
  crosswindLimitKt: number;

  @ApiProperty({ description: 'Pounds-force.' })
  @IsInt()
  @Min(RANGES.thrustLbf.min)
  @Max(RANGES.thrustLbf.max)
  thrustLbf: number;

  @ApiProperty({ description: 'Knots above the minimum launch airspeed.' })
  @IsNumber()
  @Min(RANGES.requiredExcessKt.min)
  @Max(RANGES.requiredExcessKt.max)
  requiredExcessKt: number;

  @ApiPropertyOptional({
    type: 'integer',
    nullable: true,
    description: 'Pounds; null when the type never needs afterburner.',
  })
  @IsOptional()
  @IsInt()
  @IsPositive()
  @Max(RANGES.afterburnerFromLb.max)
  afterburnerFromLb?: number | null;

  @ApiProperty({ description: 'The highest end speed the airframe takes (overstress), knots.' })
  @IsNumber({}, { message: 'maxEndSpeedKt must be a number of knots' })
  @Min(RANGES.maxEndSpeedKt.min)
  @Max(RANGES.maxEndSpeedKt.max)
  maxEndSpeedKt: number;

  @ApiPropertyOptional({
    type: 'string',
    nullable: true,
    maxLength: HOLDBACK_ELEMENT_MAX_LENGTH,
    example: 'RE-14',
    description: 'The holdback release element the type is launched with, as marked on it; null while not known.',
  })
  @IsOptional()
  @Trim()
  @IsString()
  @MaxLength(HOLDBACK_ELEMENT_MAX_LENGTH)
  @Matches(HOLDBACK_ELEMENT_PATTERN, {
    message: 'holdbackElement is the designation marked on the element: letters, digits, dashes or dots',
  })
  holdbackElement?: string | null;

  @ApiProperty({ type: [TrimBandDto], description: 'Increasing upToLb; the last band has upToLb null.' })
  @IsArray()
  @ArrayMinSize(1, { message: 'trimBands needs at least one band' })
  @ArrayMaxSize(20)
  @ValidateNested({ each: true })
  @Type(() => TrimBandDto)
  trimBands: TrimBandDto[];

  @LaunchTableRows()
  launchTable: LaunchTableRowDto[];
}
