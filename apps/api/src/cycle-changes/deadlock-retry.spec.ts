import { QueryFailedError } from 'typeorm';
import { isDeadlock, retryOnDeadlock } from './deadlock-retry.js';

// Error numbers as MariaDB documents them (MariaDB Knowledge Base, "MariaDB Error Codes"):
// 1213 ER_LOCK_DEADLOCK, 1205 ER_LOCK_WAIT_TIMEOUT.
const driverError = (errno: number, code: string) => Object.assign(new Error(code), { errno, code });
const deadlock = () => new QueryFailedError('COMMIT', [], driverError(1213, 'ER_LOCK_DEADLOCK'));
const lockWaitTimeout = () =>
  new QueryFailedError('SELECT 1 FOR UPDATE', [], driverError(1205, 'ER_LOCK_WAIT_TIMEOUT'));

/** A transaction that fails with each of `failures` in turn, then answers 'done'. */
function flaky(failures: Error[]) {
  let calls = 0;
  const transaction = async () => {
    calls += 1;
    const failure = failures[calls - 1];
    if (failure) throw failure;
    return 'done';
  };
  return { transaction, calls: () => calls };
}

describe('retryOnDeadlock', () => {
  it('recognises a deadlock through TypeORM and from the driver directly', () => {
    expect(isDeadlock(deadlock())).toBe(true);
    expect(isDeadlock(driverError(1213, 'ER_LOCK_DEADLOCK'))).toBe(true);
    expect(isDeadlock(lockWaitTimeout())).toBe(false);
    expect(isDeadlock(new Error('Deadlock found'))).toBe(false);
  });

  it('runs the transaction again after deadlocks until it commits', async () => {
    const { transaction, calls } = flaky([deadlock(), deadlock()]);
    await expect(retryOnDeadlock(transaction, 3, 0)).resolves.toBe('done');
    expect(calls()).toBe(3);
  });

  it('gives up after the last attempt with the deadlock itself', async () => {
    const { transaction, calls } = flaky([deadlock(), deadlock(), deadlock()]);
    await expect(retryOnDeadlock(transaction, 3, 0)).rejects.toBeInstanceOf(QueryFailedError);
    expect(calls()).toBe(3);
  });

  it('does not repeat a lock wait timeout or any other failure', async () => {
    const timeout = flaky([lockWaitTimeout()]);
    await expect(retryOnDeadlock(timeout.transaction, 3, 0)).rejects.toThrow('ER_LOCK_WAIT_TIMEOUT');
    expect(timeout.calls()).toBe(1);
    const refusal = flaky([new Error('stale basis')]);
    await expect(retryOnDeadlock(refusal.transaction, 3, 0)).rejects.toThrow('stale basis');
    expect(refusal.calls()).toBe(1);
  });
});
