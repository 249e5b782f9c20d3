/** Query keys of the live lineup, shared by the socket module and every screen that shows a lineup. */
export const lineupKeys = {
  all: ['lineup'] as const,
  snapshots: ['lineup', 'snapshot'] as const,
  snapshot: (cycleId: number) => ['lineup', 'snapshot', cycleId] as const,
  changes: (cycleId: number) => ['lineup', 'changes', cycleId] as const,
};
