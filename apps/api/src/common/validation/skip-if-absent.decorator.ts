import { ValidateIf } from 'class-validator';

/**
 * Skips a field's rules only when it is left out. Unlike `@IsOptional()`, an explicit `null` is still
 * validated, so a PATCH cannot blank a required column.
 */
export const SkipIfAbsent = () => ValidateIf((_object: object, value: unknown) => value !== undefined);
