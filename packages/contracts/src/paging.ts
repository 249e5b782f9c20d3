// Lists that grow without bound answer a page at a time: `?limit=&offset=`, each list with its own
// default and maximum page size. A client that needs the whole list reads page after page.

/** One page of a list: `total` rows match, these are from `offset` on. */
export interface Page<T> {
  items: T[];
  total: number;
  limit: number;
  offset: number;
}

/** How many rows a page holds when the client does not say (`default`), and the most it may ask for. */
export interface PageSize {
  readonly default: number;
  readonly max: number;
}

/** The records lists: cycles, people, aircraft and the audit trail. */
export const PAGE_SIZE = { default: 50, max: 200 } as const satisfies PageSize;

/** The change feed of a cycle (`/cycles/{cycleId}/lineup/changes?since=`): changes are small, catch-up reads many. */
export const CHANGES_PAGE_SIZE = { default: 100, max: 500 } as const satisfies PageSize;

/** Where the page after `page` starts, or null when `page` is the last. */
export function nextPageOffset(page: Page<unknown>): number | null {
  const next = page.offset + page.items.length;
  return page.items.length > 0 && next < page.total ? next : null;
}
