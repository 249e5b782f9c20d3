import { applyDecorators } from '@nestjs/common';
import { ApiProperty, ApiPropertyOptional } from '@nestjs/swagger';
import { IsInt, IsNotEmpty, IsOptional, IsString, Max, MaxLength, Min } from 'class-validator';
import { PlainText } from '../../common/validation/plain-text.decorator.js';
import { Trim } from '../../common/validation/trim.decorator.js';

/** The largest id or version a column holds (signed INT). */
export const MAX_ID = 2_147_483_647;

/** A row id in a request. */
export const IdField = (description?: string, { optional = false } = {}) =>
  applyDecorators(
    ...(optional
      ? [ApiPropertyOptional({ type: 'integer', minimum: 1, description }), IsOptional()]
      : [ApiProperty({ type: 'integer', minimum: 1, description })]),
    IsInt(),
    Min(1),
    Max(MAX_ID),
  );

/** The version of what the command is based on, as the sender saw it. */
export const VersionField = (description: string) =>
  applyDecorators(ApiProperty({ type: 'integer', minimum: 0, description }), IsInt(), Min(0), Max(MAX_ID));

/** A reason a person writes, kept with the slot and the change (200 characters). */
export const ReasonField = (field: string, { optional = false } = {}) =>
  applyDecorators(
    ...(optional
      ? [ApiPropertyOptional({ type: String, maxLength: 200 }), IsOptional()]
      : [ApiProperty({ type: String, maxLength: 200 })]),
    Trim(),
    IsString(),
    IsNotEmpty({ message: `${field} must not be empty` }),
    PlainText(),
    MaxLength(200, { message: `${field} must be at most 200 characters` }),
  );
