import { ApiProperty } from '@nestjs/swagger';

// Shorthands for the property types the views repeat, so a view class reads like its contract type.

type Options = { description?: string; nullable?: boolean; required?: boolean };

/** A row id: an integer from 1. */
export const IdProperty = (options: Options = {}) => ApiProperty({ type: 'integer', minimum: 1, ...options });

/** A whole number (counts, versions, pounds, seconds). */
export const IntProperty = (options: Options & { minimum?: number } = {}) =>
  ApiProperty({ type: 'integer', ...options });

/** An ISO 8601 instant. */
export const InstantProperty = (options: Options = {}) =>
  ApiProperty({ type: 'string', format: 'date-time', ...options });

/** One of a contract's string unions. */
export const EnumProperty = (values: readonly string[], enumName: string, options: Options = {}) =>
  ApiProperty({ enum: [...values], enumName, ...options });
