/**
 * Thrown when an input cannot describe a real situation (a negative mass, a setting outside the
 * catapult's range, a malformed table). Consumers map it to a 4xx with its message: it is never a
 * fault of the computation itself.
 */
export class LaunchMathInputError extends RangeError {
  override readonly name = 'LaunchMathInputError';
}

/** Throws unless `value` is a finite number. */
export function requireFinite(value: number, what: string): void {
  if (!Number.isFinite(value)) throw new LaunchMathInputError(`${what} must be a finite number, got ${value}`);
}

/** Throws unless `value` is a finite number above zero. */
export function requirePositive(value: number, what: string): void {
  requireFinite(value, what);
  if (value <= 0) throw new LaunchMathInputError(`${what} must be above zero, got ${value}`);
}

/** Throws unless `value` is a finite number at or above zero. */
export function requireNonNegative(value: number, what: string): void {
  requireFinite(value, what);
  if (value < 0) throw new LaunchMathInputError(`${what} must not be negative, got ${value}`);
}
