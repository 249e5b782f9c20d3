import { lineupKeys } from '../../../lib/live/lineup-keys.js';

/** The lineup feature's own queries, under the shared live lineup keys. */
export const lineupFeatureKeys = {
  ...lineupKeys,
  suggestion: (cycleId: number, basisVersion: number) => ['lineup', 'suggestion', cycleId, basisVersion] as const,
  spares: (cycleId: number, slotId: number, basisVersion: number) =>
    ['lineup', 'spares', cycleId, slotId, basisVersion] as const,
  pilots: () => ['lineup', 'pilots'] as const,
};
