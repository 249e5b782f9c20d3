import { nextPageOffset, type Page } from '@catline/contracts';
import { apiRequest } from './api-client.js';

/** The path of one page of a paged list. */
export function pagePath(path: string, limit: number, offset: number): string {
  const separator = path.includes('?') ? '&' : '?';
  return `${path}${separator}limit=${limit}&offset=${offset}`;
}

/** One page of a paged list. */
export const fetchPage = <T>(path: string, limit: number, offset: number, signal?: AbortSignal) =>
  apiRequest<Page<T>>(pagePath(path, limit, offset), { signal });

/**
 * Every row of a paged list, read page after page of `limit` rows: for pickers, which must offer
 * every choice (a screen that shows the list itself shows a page at a time instead).
 */
export async function fetchAllPages<T>(path: string, limit: number, signal?: AbortSignal): Promise<T[]> {
  const rows: T[] = [];
  for (let offset: number | null = 0; offset !== null;) {
    const page: Page<T> = await fetchPage<T>(path, limit, offset, signal);
    rows.push(...page.items);
    offset = nextPageOffset(page);
  }
  return rows;
}
