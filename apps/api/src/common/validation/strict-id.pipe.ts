import { type ArgumentMetadata, Injectable, type PipeTransform } from '@nestjs/common';
import { RequestException } from '../errors/request.exception.js';

// Ids are MariaDB INT primary keys: 1 to 2^31 - 1, written in plain digits.
const DIGITS = /^[0-9]{1,10}$/;
const MAX_ID = 2 ** 31 - 1;

/** Whether a path value is an id as StrictIdPipe accepts it. */
export function isStrictId(value: string): boolean {
  return DIGITS.test(value) && Number(value) >= 1 && Number(value) <= MAX_ID;
}

/**
 * Runs before the global ValidationPipe, whose number conversion (`Number(value)`) would read `0x10`,
 * `1e3` or ` 4` in a path as an id: every numeric path parameter must be plain decimal digits.
 */
@Injectable()
export class StrictIdPipe implements PipeTransform {
  transform(value: unknown, { type, metatype, data }: ArgumentMetadata): unknown {
    if (type !== 'param' || metatype !== Number || typeof value !== 'string') return value;
    if (!isStrictId(value)) {
      throw new RequestException(
        'invalid_id',
        `The ${data ?? 'id'} in the address must be a whole number from 1, written in digits only.`,
      );
    }
    return value;
  }
}
