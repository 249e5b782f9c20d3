import { Transform } from 'class-transformer';

/** Trims a string field before validation, so "  " fails @IsNotEmpty and names are stored clean. */
export const Trim = () =>
  Transform(({ value }: { value: unknown }) => (typeof value === 'string' ? value.trim() : value));
