import { keepPreviousData, queryOptions, type QueryClient } from '@tanstack/react-query';
import { nextPageOffset, PAGE_SIZE, type Page } from '@catline/contracts';
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

/** The query of the page from `offset` of a list a screen shows a page at a time; the page on screen stays while the next loads. */
export const pageQueryOptions = <T>(pagesKey: readonly unknown[], path: string, offset: number) =>
  queryOptions({
    queryKey: [...pagesKey, offset],
    queryFn: ({ signal }) => fetchPage<T>(path, PAGE_SIZE.default, offset, signal),
    placeholderData: keepPreviousData,
  });

/** Changes one row in every cached page under `pagesKey` (an optimistic update); returns what to put back. */
export function changeRowInPages<T extends { id: number }>(
  queryClient: QueryClient,
  pagesKey: readonly unknown[],
  id: number,
  change: (row: T) => T,
): () => void {
  const previous = queryClient.getQueriesData<Page<T>>({ queryKey: pagesKey });
  queryClient.setQueriesData<Page<T>>(
    { queryKey: pagesKey },
    (page) => page && { ...page, items: page.items.map((row) => (row.id === id ? change(row) : row)) },
  );
  return () => previous.forEach(([key, page]) => queryClient.setQueryData(key, page));
}
