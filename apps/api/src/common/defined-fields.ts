/**
 * The fields a request actually sent. Request DTOs are class instances whose declared but unsent
 * fields exist as `undefined` (ES2022 class fields), so `Object.assign(entity, dto)` would blank them.
 */
export function definedFields<T extends object>(dto: T): Partial<T> {
  return Object.fromEntries(Object.entries(dto).filter(([, value]) => value !== undefined)) as Partial<T>;
}
