import type { Role } from '@catline/contracts';

export type HttpMethod = 'GET' | 'POST' | 'PUT' | 'PATCH' | 'DELETE';

/** What a row's example factory gets to build a valid request. */
export interface MatrixContext {
  baseUrl: string;
  /** Who makes this call: a role, or null for a caller without a token. */
  caller: Role | null;
  /** True when the row allows the caller, so the request will really run: build a fresh target then. */
  allowed: boolean;
  /** An access token of the demo person of a role, for setting data up. */
  tokenOf(role: Role): string;
}

/** A valid request for the route; params fill the `{name}` placeholders of the path. */
export interface RouteExample {
  params?: Record<string, string | number>;
  query?: Record<string, string | number>;
  body?: object;
  headers?: Record<string, string>;
}

export interface MatrixRoute {
  method: HttpMethod;
  /** As the OpenAPI document writes it: global prefix included, `{id}` placeholders. */
  path: string;
  /** The roles the route admits, or 'public' for routes open without a token. */
  allowed: readonly Role[] | 'public';
  /** Called before every call; without it the route is called with no params and no body. */
  example?: (context: MatrixContext) => RouteExample | Promise<RouteExample>;
  /**
   * Statuses besides 2xx an admitted caller may get because a rule past the role check refuses the
   * example (e.g. 400 for a wrong current password). Never 401 or 403.
   */
  refusals?: readonly number[];
  /**
   * For a command on one catapult's lane or one pilot's slot: per permitted role, the e-mail of a second
   * demo person of that role who does not own the example's target (cat2@ or deo2@ for a slot on cat 1,
   * pilot2@ for pilot@'s slot). Sent the permitted example, they must be refused with 403 and the slot
   * left as it was.
   */
  notOwner?: Partial<Record<Role, string>>;
}
