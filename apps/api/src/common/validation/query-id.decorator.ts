import { applyDecorators } from '@nestjs/common';
import { Transform } from 'class-transformer';
import { IsInt } from 'class-validator';
import { isStrictId } from './strict-id.pipe.js';

/**
 * An id in the query string, read by the same rule as one in the path (StrictIdPipe): plain decimal
 * digits, 1 to 2^31 - 1. Anything else becomes NaN before any number conversion could read `0x10`,
 * `1e3` or ` 4` as an id, so the check refuses it with `message`.
 */
export const QueryId = (message: string) =>
  applyDecorators(
    Transform(({ value }: { value: unknown }) => {
      if (value === undefined) return undefined;
      return typeof value === 'string' && isStrictId(value) ? Number(value) : Number.NaN;
    }),
    IsInt({ message }),
  );
