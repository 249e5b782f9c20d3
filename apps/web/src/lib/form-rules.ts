import { EMAIL_MAX_LENGTH, type Range } from '@catline/contracts';
import * as z from 'zod/mini';

// Building blocks of the forms' zod schemas. Every field is typed as text; a rule checks it against
// the limits in @catline/contracts (the ones the server's DTOs enforce) and hands on the trimmed text
// or what it reads as. zod/mini rather than zod: the same checks in about a quarter of the bytes.

/** Enough of an e-mail address to catch a typing slip; the server decides. */
const emailPattern = /^[^\s@]+@[^\s@]+\.[^\s@]+$/;

const atMost = (maxLength: number) => `At most ${maxLength} characters.`;

/** Text a person must give, trimmed. */
export const requiredText = (maxLength: number, message: string) =>
  z.string().check(z.trim(), z.minLength(1, message), z.maxLength(maxLength, atMost(maxLength)));

/** Text that may stay empty, trimmed. */
export const optionalText = (maxLength: number) =>
  z.string().check(z.trim(), z.maxLength(maxLength, atMost(maxLength)));

export const emailText = (message: string) =>
  z.string().check(z.trim(), z.maxLength(EMAIL_MAX_LENGTH, message), z.regex(emailPattern, message));

/** A whole text matching the pattern, after trimming. */
export const patternText = (pattern: RegExp, message: string) => z.string().check(z.trim(), z.regex(pattern, message));

const readsInRange = (text: string, { min, max }: Range, whole: boolean) => {
  const value = Number(text);
  return (
    text.trim() !== '' && Number.isFinite(value) && value >= min && value <= max && (!whole || Number.isInteger(value))
  );
};

/** Text that reads as a number within the range (a whole one when asked), kept as typed. */
export const numberText = (range: Range, message: string, { whole = false } = {}) =>
  z.string().check(z.refine((text) => readsInRange(text, range, whole), message));

/** Text that reads as a number within the range, handed on as the number. */
export const typedNumber = (range: Range, message: string, options: { whole?: boolean } = {}) =>
  z.pipe(numberText(range, message, options), z.transform(Number));

/** Text that stays empty or reads as a number within the range, kept as typed. */
export const optionalNumberText = (range: Range, message: string, { whole = false } = {}) =>
  z.string().check(z.refine((text) => text.trim() === '' || readsInRange(text, range, whole), message));

/** The same, or nothing (null) when left empty. */
export const optionalTypedNumber = (range: Range, message: string, options: { whole?: boolean } = {}) =>
  z.pipe(
    optionalNumberText(range, message, options),
    z.transform((text: string) => (text.trim() === '' ? null : Number(text))),
  );

/** A select whose choices are ids: one must be picked; the form hands on the id. */
export const chosenId = (message: string) => z.pipe(z.string().check(z.minLength(1, message)), z.transform(Number));

/** Text read by a parser that gives a value, or the problem in words. */
export const parsedText = <T>(parse: (text: string) => { value: T } | { problem: string }) =>
  z.pipe(
    z.string(),
    z.transform((text: string, context) => {
      const read = parse(text);
      if ('value' in read) return read.value;
      context.issues.push({ code: 'custom', message: read.problem, input: text });
      return z.NEVER;
    }),
  );
