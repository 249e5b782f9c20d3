import { EMAIL_MAX_LENGTH } from '@catline/contracts';
import { isEmail } from 'class-validator';
import { UNSAFE_TEXT } from '../common/validation/plain-text.decorator.js';

// Each parser reads one trimmed cell: a value, or the reason it cannot be one.

export type Cell<T> = { value: T } | { reason: string };

export const isProblem = <T>(cell: Cell<T>): cell is { reason: string } => 'reason' in cell;

export function text(
  raw: string,
  { required, maxLength, what }: { required: boolean; maxLength: number; what: string },
): Cell<string> {
  if (required && raw === '') return { reason: `${what} is required.` };
  if (raw.length > maxLength)
    return { reason: `${what} has at most ${maxLength} characters; this one has ${raw.length}.` };
  if (UNSAFE_TEXT.test(raw)) return { reason: `${what} must not hold control or text-direction characters.` };
  return { value: raw };
}

/** A count of whole units (pounds), digits only. */
export function wholeNumber(raw: string, { min, max, unit }: { min: number; max: number; unit: string }): Cell<number> {
  if (/^-\s*\d+([.,]\d*)?$/.test(raw)) return { reason: 'Cannot be negative.' };
  if (!/^\d+$/.test(raw)) return { reason: `Must be a whole number (digits only), in ${unit}.` };
  const value = Number(raw);
  if (value < min) return { reason: `Must be at least ${min} ${unit}.` };
  if (value > max) return { reason: `Must be at most ${max} ${unit}.` };
  return { value };
}

/** A positive figure with an optional decimal point (never a decimal comma: that splits the cell). */
export function positiveDecimal(raw: string, { max, unit }: { max: number; unit: string }): Cell<number> {
  if (/^-\s*\d/.test(raw)) return { reason: 'Cannot be negative.' };
  if (!/^\d+(\.\d+)?$/.test(raw)) return { reason: `Must be a number of ${unit}, e.g. 132 or 132.5.` };
  const value = Number(raw);
  if (value <= 0) return { reason: 'Must be more than 0.' };
  if (value > max) return { reason: `Must be at most ${max} ${unit}.` };
  return { value };
}

const YES = ['yes', 'y', 'true', '1'];
const NO = ['no', 'n', 'false', '0', ''];

export function flag(raw: string): Cell<boolean> {
  const word = raw.toLowerCase();
  if (YES.includes(word)) return { value: true };
  if (NO.includes(word)) return { value: false };
  return { reason: 'Must be yes or no (y/n, true/false and 1/0 work too; empty means no).' };
}

/** Empty for none. */
export function optionalEmail(raw: string): Cell<string | null> {
  if (raw === '') return { value: null };
  if (raw.length > EMAIL_MAX_LENGTH || !isEmail(raw)) return { reason: 'Not an e-mail address.' };
  return { value: raw.toLowerCase() };
}
