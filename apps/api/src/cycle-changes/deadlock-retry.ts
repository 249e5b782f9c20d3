import { setTimeout as delay } from 'node:timers/promises';
import { Logger } from '@nestjs/common';

/**
 * MariaDB's ER_LOCK_DEADLOCK. A Galera cluster reports a failed certification at COMMIT with the same
 * code. Either way the server has rolled the whole transaction back, so running it again is safe.
 */
const ER_LOCK_DEADLOCK = 1213;
export const DEADLOCK_ATTEMPTS = 3;

const logger = new Logger('DeadlockRetry');

const errnoOf = (value: unknown): unknown =>
  typeof value === 'object' && value !== null ? (value as { errno?: unknown }).errno : undefined;

/** Whether a query failed on a deadlock; TypeORM wraps the driver's error in `driverError`. */
export function isDeadlock(error: unknown): boolean {
  const driverError =
    typeof error === 'object' && error !== null ? (error as { driverError?: unknown }).driverError : undefined;
  return errnoOf(error) === ER_LOCK_DEADLOCK || errnoOf(driverError) === ER_LOCK_DEADLOCK;
}

/**
 * Runs a whole transaction again after a deadlock, a bounded number of times with a short random
 * pause. Only 1213: a lock wait timeout (1205) means something held a lock far too long, and
 * repeating the wait would only double it.
 */
export async function retryOnDeadlock<T>(
  transaction: () => Promise<T>,
  attempts = DEADLOCK_ATTEMPTS,
  pauseMs = 25,
): Promise<T> {
  for (let attempt = 1; ; attempt += 1) {
    try {
      return await transaction();
    } catch (error) {
      if (attempt >= attempts || !isDeadlock(error)) throw error;
      logger.warn(`Deadlock, running the transaction again (attempt ${attempt + 1} of ${attempts})`);
      await delay(Math.round(pauseMs * attempt * (0.5 + Math.random())));
    }
  }
}
