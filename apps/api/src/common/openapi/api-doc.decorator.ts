import type { RefusalCode } from '@catline/contracts';
import { SetMetadata, type Type } from '@nestjs/common';

export const API_DOC = 'catline:apiDoc';

/** The error statuses an operation can answer besides the ones every route of its kind answers. */
export type RefusalStatus = 400 | 401 | 403 | 404 | 409 | 413 | 415 | 422 | 429 | 503;

export interface ApiDocOptions {
  /** What the operation answers on success: a response DTO class (`[Dto]` for an array), `'csv'`, or nothing (204). */
  response?: Type<unknown> | [Type<unknown>] | 'csv';
  /** More than the summary says: when to call it, what it changes. Who may call it is added from @Roles/@Public. */
  description?: string;
  /** The refusal codes this operation answers, by status, besides the standard ones (see route-docs.ts). */
  refuses?: Partial<Record<RefusalStatus, readonly RefusalCode[]>>;
}

export interface ApiDocMetadata extends ApiDocOptions {
  summary: string;
}

/**
 * Documents a route: a summary (a few words), the success body and the refusals of its own. The
 * document adds the rest from the route itself when the app starts (route-docs.ts): the success
 * status, who may call it, integer path ids, the bearer scheme and the standard error answers.
 */
export const ApiDoc = (summary: string, options: ApiDocOptions = {}) =>
  SetMetadata<string, ApiDocMetadata>(API_DOC, { summary, ...options });
