import { WEATHER_CASES } from '@catline/contracts';
import { applyDecorators } from '@nestjs/common';
import { ApiProperty } from '@nestjs/swagger';
import { IsBoolean, IsIn, IsISO8601, IsNumber, Max, Min } from 'class-validator';

// One definition of each condition field, shared by creating a cycle and changing its conditions.

const Figure = (field: string, min: number, max: number, unit: string) =>
  applyDecorators(
    ApiProperty({ minimum: min, maximum: max, description: unit }),
    IsNumber({ allowNaN: false, allowInfinity: false }, { message: `${field} must be a number (${unit})` }),
    Min(min, { message: `${field} must be at least ${min} ${unit}` }),
    Max(max, { message: `${field} must be at most ${max} ${unit}` }),
  );

export const ConditionField = {
  shipCourseDeg: () => Figure('shipCourseDeg', 0, 360, 'degrees true'),
  shipSpeedKt: () => Figure('shipSpeedKt', 0, 40, 'knots'),
  trueWindFromDeg: () => Figure('trueWindFromDeg', 0, 360, 'degrees true, where the wind blows from'),
  trueWindSpeedKt: () => Figure('trueWindSpeedKt', 0, 80, 'knots'),
  temperatureC: () => Figure('temperatureC', -40, 55, 'degrees Celsius'),
  pressureHpa: () => Figure('pressureHpa', 870, 1085, 'hectopascals'),
  weatherCase: () =>
    applyDecorators(ApiProperty({ enum: WEATHER_CASES }), IsIn(WEATHER_CASES, { message: 'weatherCase must be I, II or III' })),
  flag: (field: string) => applyDecorators(ApiProperty(), IsBoolean({ message: `${field} must be true or false` })),
  instant: (field: string) =>
    applyDecorators(
      ApiProperty({ format: 'date-time' }),
      IsISO8601({ strict: true }, { message: `${field} must be an ISO 8601 date and time` }),
    ),
};
