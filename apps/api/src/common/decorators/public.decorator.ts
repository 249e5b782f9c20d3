import { SetMetadata } from '@nestjs/common';

export const IS_PUBLIC = 'catline:isPublic';

/** Opens a route to callers without a token; every other route needs one (global guard). */
export const Public = () => SetMetadata(IS_PUBLIC, true);
