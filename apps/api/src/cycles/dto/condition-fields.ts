import { CONDITION_RANGES, WEATHER_CASES } from '@catline/contracts';
import { applyDecorators } from '@nestjs/common';
import { ApiProperty } from '@nestjs/swagger';
import { IsBoolean, IsIn, IsISO8601, IsNumber, Max, Min } from 'class-validator';

// One definition of each condition field, shared by creating a cycle and changing its conditions.

const Figure = (field: keyof typeof CONDITION_RANGES, unit: string) => {
  const { min, max } = CONDITION_RANGES[field];
  return applyDecorators(
    ApiProperty({ minimum: min, maximum: max, description: unit }),
    IsNumber({ allowNaN: false, allowInfinity: false }, { message: `${field} must be a number (${unit})` }),
    Min(min, { message: `${field} must be at least ${min} ${unit}` }),
    Max(max, { message: `${field} must be at most ${max} ${unit}` }),
  );
};

export const ConditionField = {
  shipCourseDeg: () => Figure('shipCourseDeg', 'degrees true'),
  shipSpeedKt: () => Figure('shipSpeedKt', 'knots'),
  trueWindFromDeg: () => Figure('trueWindFromDeg', 'degrees true, where the wind blows from'),
  trueWindSpeedKt: () => Figure('trueWindSpeedKt', 'knots'),
  relativeWindBearingDeg: () =>
    Figure('relativeWindBearingDeg', 'degrees off the bow where the wind across the deck blows from, negative to port'),
  relativeWindSpeedKt: () => Figure('relativeWindSpeedKt', 'knots across the deck'),
  windGustKt: () => Figure('windGustKt', 'knots, in the frame of the reading it comes with'),
  windLullKt: () => Figure('windLullKt', 'knots, in the frame of the reading it comes with'),
  latitudeDeg: () => Figure('latitudeDeg', 'degrees, north positive'),
  longitudeDeg: () => Figure('longitudeDeg', 'degrees, east positive'),
  temperatureC: () => Figure('temperatureC', 'degrees Celsius'),
  pressureHpa: () => Figure('pressureHpa', 'hectopascals'),
  weatherCase: () =>
    applyDecorators(
      ApiProperty({ enum: WEATHER_CASES }),
      IsIn(WEATHER_CASES, { message: 'weatherCase must be I, II or III' }),
    ),
  flag: (field: string) => applyDecorators(ApiProperty(), IsBoolean({ message: `${field} must be true or false` })),
  instant: (field: string) =>
    applyDecorators(
      ApiProperty({ format: 'date-time' }),
      IsISO8601({ strict: true }, { message: `${field} must be an ISO 8601 date and time` }),
    ),
};
