import type { Response } from 'supertest';

/** The `catline_refresh=<token>` pair a response set, ready for a Cookie header; throws if none was set. */
export function refreshCookie(response: Response): string {
  const cookies = (response.headers['set-cookie'] as unknown as string[] | undefined) ?? [];
  const pair = cookies.map((cookie) => cookie.split(';')[0]).find((value) => /^catline_refresh=.+/.test(value));
  if (!pair) throw new Error(`No refresh cookie was set (status ${response.status})`);
  return pair;
}
