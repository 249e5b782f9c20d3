import { ValidateBy } from 'class-validator';

/**
 * Control characters (NUL, line breaks, escape, DEL, the C1 range) and the bidirectional formatting
 * characters of Unicode UAX #9 (marks, embeddings, overrides, isolates): a name holding one can hide
 * or reverse what is shown beside it on every screen and export.
 */
export const UNSAFE_TEXT = /[\p{Cc}\u061c\u200e\u200f\u202a-\u202e\u2066-\u2069]/u;

/** A one-line text a person typed: names, codes, reasons. */
export const PlainText = () =>
  ValidateBy({
    name: 'plainText',
    validator: {
      validate: (value: unknown) => typeof value !== 'string' || !UNSAFE_TEXT.test(value),
      defaultMessage: (args) => `${args?.property ?? 'text'} must not hold control or text-direction characters`,
    },
  });
