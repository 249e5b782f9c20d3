// MariaDB error codes a service turns into a readable 409 instead of letting them become a 500.

function driverCode(error: unknown): string | undefined {
  const { driverError, code } = (error ?? {}) as { driverError?: { code?: string }; code?: string };
  return driverError?.code ?? code;
}

/** A unique index refused the row (a race past the service's own check). */
export function isDuplicateKey(error: unknown): boolean {
  return driverCode(error) === 'ER_DUP_ENTRY';
}

/** A foreign key refused a delete because another row still points at this one. */
export function isStillReferenced(error: unknown): boolean {
  return driverCode(error) === 'ER_ROW_IS_REFERENCED_2';
}
