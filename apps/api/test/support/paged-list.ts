import { nextPageOffset, type Page } from '@catline/contracts';
import request from 'supertest';
import { bearer } from './sign-in.js';

/** Every row of a paged list (`path` without limit/offset), read one default-sized page after another. */
export async function readAllPages<T>(url: string, token: string, path: string): Promise<T[]> {
  const rows: T[] = [];
  for (let offset: number | null = 0; offset !== null;) {
    const separator = path.includes('?') ? '&' : '?';
    const response = await request(url).get(`${path}${separator}offset=${offset}`).set(bearer(token));
    if (response.status !== 200) throw new Error(`GET ${path} answered ${response.status}: ${response.text}`);
    const page = response.body as Page<T>;
    rows.push(...page.items);
    offset = nextPageOffset(page);
  }
  return rows;
}
