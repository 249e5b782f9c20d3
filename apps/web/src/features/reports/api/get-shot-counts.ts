import { keepPreviousData, queryOptions, useQuery } from '@tanstack/react-query';
import type { ShotCounts, ShotCountsQuery } from '@catline/contracts';
import { apiRequest } from '../../../lib/api-client.js';
import { reportKeys } from './reports-keys.js';

export const shotCountsPath = (range: ShotCountsQuery, format: '' | '.csv' = '') =>
  `/reports/shot-counts${format}?${new URLSearchParams({ from: range.from, to: range.to })}`;

export const fetchShotCounts = (range: ShotCountsQuery, signal?: AbortSignal) =>
  apiRequest<ShotCounts>(shotCountsPath(range), { signal });

export const shotCountsQueryOptions = (range: ShotCountsQuery) =>
  queryOptions({
    queryKey: reportKeys.shotCounts(range),
    queryFn: ({ signal }) => fetchShotCounts(range, signal),
    // Keep the last counts on screen while a new range loads.
    placeholderData: keepPreviousData,
  });

export const useShotCounts = (range: ShotCountsQuery) => useQuery(shotCountsQueryOptions(range));
