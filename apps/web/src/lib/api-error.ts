import type { ApiError } from '@catline/contracts';

/** A refused or failed request, carrying the server's own message for people. */
export class ApiRequestError extends Error implements ApiError {
  constructor(
    readonly statusCode: number,
    readonly code: string,
    message: string,
    readonly details?: string[],
  ) {
    super(message);
    this.name = 'ApiRequestError';
  }
}

function isApiErrorBody(body: unknown): body is ApiError {
  return (
    typeof body === 'object' &&
    body !== null &&
    typeof (body as ApiError).message === 'string' &&
    typeof (body as ApiError).code === 'string'
  );
}

export async function toApiRequestError(response: Response): Promise<ApiRequestError> {
  const body: unknown = await response.json().catch(() => null);
  if (isApiErrorBody(body)) {
    return new ApiRequestError(response.status, body.code, body.message, body.details);
  }
  return new ApiRequestError(
    response.status,
    'http_error',
    response.status >= 500
      ? 'The Catline server could not answer just now. Try again in a moment.'
      : `The request was refused (HTTP ${response.status}).`,
  );
}

export const unreachableServer = () =>
  new ApiRequestError(0, 'network', 'Cannot reach the Catline server. Check the connection and try again.');

/** No answer came (no network, or nothing behind the address could answer): a refusal may still not be one. */
export const isUnanswered = (error: unknown) =>
  error instanceof ApiRequestError && (error.statusCode === 0 || error.statusCode >= 500);

/** The sentence to show a person for any error a hook hands back. */
export function errorMessage(error: unknown): string {
  if (error instanceof ApiRequestError) {
    return error.details?.length ? `${error.message} ${error.details.join(' ')}` : error.message;
  }
  return error instanceof Error ? error.message : 'Something went wrong.';
}
