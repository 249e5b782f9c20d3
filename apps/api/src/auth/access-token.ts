import type { Role } from '@catline/contracts';

/** Claims of an access token: the person, their role when signed and their token version. */
export interface AccessTokenClaims {
  sub: number;
  role: Role;
  tv: number;
}

export const ACCESS_TOKEN_LIFETIME_S = 15 * 60;
export const ACCESS_TOKEN_ALGORITHM = 'HS256';
