import type { Role } from '@catline/contracts';

/** Claims of an access token: the person, their role when signed, their token version and their session. */
export interface AccessTokenClaims {
  sub: number;
  role: Role;
  tv: number;
  sid: string;
}

export const ACCESS_TOKEN_LIFETIME_S = 15 * 60;
export const ACCESS_TOKEN_ALGORITHM = 'HS256';
