import { keepPreviousData, queryOptions, useQuery } from '@tanstack/react-query';
import type { AuditAction, AuditEntryView, Page } from '@catline/contracts';
import { apiRequest } from '../../../lib/api-client.js';
import { auditKeys } from './audit-keys.js';

/** What the API filters on; `since`/`until` are instants (see audit-range-model.ts). */
export interface AuditFilter {
  action: AuditAction | '';
  actor: string;
  /** A ship's id, or empty for every ship the admin sees. */
  ship: string;
  since?: string;
  until?: string;
}

export interface AuditQuery extends AuditFilter {
  limit: number;
  offset: number;
}

function filterParams(filter: AuditFilter): URLSearchParams {
  const params = new URLSearchParams();
  if (filter.action) params.set('action', filter.action);
  if (filter.actor.trim()) params.set('actor', filter.actor.trim());
  if (filter.ship) params.set('ship', filter.ship);
  if (filter.since) params.set('since', filter.since);
  if (filter.until) params.set('until', filter.until);
  return params;
}

/** The CSV export of every entry the filter matches (not only the page on screen). */
export const auditExportPath = (filter: AuditFilter) => `/audit/export.csv?${filterParams(filter)}`;

export const fetchAuditEntries = (query: AuditQuery, signal?: AbortSignal) => {
  const params = filterParams(query);
  params.set('limit', String(query.limit));
  params.set('offset', String(query.offset));
  return apiRequest<Page<AuditEntryView>>(`/audit?${params}`, { signal });
};

export const auditEntriesQueryOptions = (query: AuditQuery) =>
  queryOptions({
    queryKey: auditKeys.page(query),
    queryFn: ({ signal }) => fetchAuditEntries(query, signal),
    // The page on screen stays while the next one loads.
    placeholderData: keepPreviousData,
  });

/** `enabled` false while the filter cannot be asked (a range that ends before it starts). */
export const useAuditEntries = (query: AuditQuery, enabled = true) =>
  useQuery({ ...auditEntriesQueryOptions(query), enabled });
