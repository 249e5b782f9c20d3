import {
  type AircraftClass,
  DEFAULT_SHIP_TIME_ZONE,
  DEFAULT_SETTING_CROSS_CHECK_TOLERANCE,
  DEFAULT_WIND_READING_MAX_AGE_MIN,
  READINESS_STEPS,
  type ReadinessStep,
  type ShipProfile,
  type WeatherCase,
} from '@catline/contracts';
import { applyDecorators } from '@nestjs/common';
import { ApiProperty, ApiPropertyOptional } from '@nestjs/swagger';
import { Transform, Type } from 'class-transformer';
import {
  ArrayMaxSize,
  ArrayUnique,
  IsArray,
  IsIn,
  IsInt,
  IsNotEmpty,
  IsNumber,
  IsObject,
  IsOptional,
  IsString,
  IsTimeZone,
  Max,
  MaxLength,
  Min,
  ValidateNested,
} from 'class-validator';
import { Trim } from '../../common/validation/trim.decorator.js';

const MAX_LAUNCH_PREREQUISITES = 12;

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

/** One departure text; the ship's own words, shown to the pilot as written. */
const DepartureText = () =>
  applyDecorators(ApiProperty({ maxLength: 1000 }), Trim(), IsString(), IsNotEmpty(), MaxLength(1000));

class ClassDeparturesDto implements Record<AircraftClass, string> {
  @DepartureText()
  jet: string;

  @DepartureText()
  turboprop: string;

  @DepartureText()
  helicopter: string;
}

/** A text for every case and class: an aircraft the ship wrote nothing for would leave its pilot without one. */
const ClassDepartures = () =>
  applyDecorators(
    ApiProperty({ type: ClassDeparturesDto, description: 'Departure per aircraft class.' }),
    IsObject(),
    ValidateNested(),
    Type(() => ClassDeparturesDto),
  );

class DeparturesDto implements Record<WeatherCase, ClassDeparturesDto> {
  @ClassDepartures()
  I: ClassDeparturesDto;

  @ClassDepartures()
  II: ClassDeparturesDto;

  @ClassDepartures()
  III: ClassDeparturesDto;
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

  @ApiPropertyOptional({
    enum: READINESS_STEPS,
    isArray: true,
    description: 'The steps this ship runs, in the trade’s order; left out, every step.',
  })
  @IsOptional()
  @IsArray()
  @ArrayMaxSize(READINESS_STEPS.length)
  @IsIn(READINESS_STEPS, { each: true, message: `readinessSteps must each be one of ${READINESS_STEPS.join(', ')}` })
  readinessSteps?: ReadinessStep[];

  @ApiPropertyOptional({
    minimum: 1,
    maximum: 720,
    description: `Minutes a wind reading stays fresh; left out, ${DEFAULT_WIND_READING_MAX_AGE_MIN}.`,
  })
  @IsOptional()
  @IsInt({ message: 'windReadingMaxAgeMin must be a whole number of minutes' })
  @Min(1, { message: 'windReadingMaxAgeMin must be at least 1 minute' })
  @Max(720, { message: 'windReadingMaxAgeMin must be at most 720 minutes' })
  windReadingMaxAgeMin?: number;

  @ApiPropertyOptional({
    minimum: 0,
    maximum: 20,
    description: `Settings the energy model's estimate may differ from the approved setting before the Cat station flags it; left out, ${DEFAULT_SETTING_CROSS_CHECK_TOLERANCE}.`,
  })
  @IsOptional()
  @IsInt({ message: 'settingCrossCheckTolerance must be a whole number of settings' })
  @Min(0, { message: 'settingCrossCheckTolerance must be at least 0 settings' })
  @Max(20, { message: 'settingCrossCheckTolerance must be at most 20 settings' })
  settingCrossCheckTolerance?: number;

  @ApiPropertyOptional({ description: `The ship's time zone, an IANA name; left out, ${DEFAULT_SHIP_TIME_ZONE}.` })
  @IsOptional()
  @IsTimeZone({ message: 'timeZone must be a time zone name such as Pacific/Guam or UTC' })
  timeZone?: string;

  @ApiPropertyOptional({
    type: 'string',
    isArray: true,
    maxItems: MAX_LAUNCH_PREREQUISITES,
    description: 'What the air boss ticks for each cycle before launching starts, in short words; left out, none.',
  })
  @IsOptional()
  @Transform(({ value }: { value: unknown }) =>
    Array.isArray(value) ? value.map((item: unknown) => (typeof item === 'string' ? item.trim() : item)) : value,
  )
  @IsArray({ message: 'launchPrerequisites must be a list of short texts' })
  @ArrayMaxSize(MAX_LAUNCH_PREREQUISITES, {
    message: `launchPrerequisites may hold at most ${MAX_LAUNCH_PREREQUISITES} items`,
  })
  @IsString({ each: true, message: 'launchPrerequisites must each be a text' })
  @IsNotEmpty({ each: true, message: 'launchPrerequisites must not hold a blank item' })
  @MaxLength(80, { each: true, message: 'launchPrerequisites must each be at most 80 characters' })
  // The air boss's ticks are kept by name: two items of one name would share a tick.
  @ArrayUnique({ message: 'launchPrerequisites must not name one item twice' })
  launchPrerequisites?: string[];
}
