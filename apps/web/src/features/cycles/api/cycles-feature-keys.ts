import { cycleKeys } from '../../../lib/queries/cycles-query.js';

export const cyclesFeatureKeys = {
  ...cycleKeys,
  pilots: () => ['users', 'pilots'] as const,
};
