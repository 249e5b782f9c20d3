import type { ShotCountsQuery } from '@catline/contracts';

export const reportKeys = {
  all: ['reports'] as const,
  cycleReport: (cycleId: number) => ['reports', 'cycle', cycleId] as const,
  replay: (cycleId: number) => ['reports', 'replay', cycleId] as const,
  shotCounts: (range: ShotCountsQuery) => ['reports', 'shot-counts', range.from, range.to] as const,
};
