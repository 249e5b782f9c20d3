import type { LineupChange } from '@catline/contracts';
import type { CycleChange } from '../database/entities/cycle-change.entity.js';

export function toLineupChange(row: CycleChange): LineupChange {
  return {
    cycleId: row.cycleId,
    version: row.version,
    kind: row.kind,
    actor: { id: row.actorId, name: row.actorName, role: row.actorRole },
    at: row.at.toISOString(),
    summary: row.summary,
    patch: row.payload.patch,
  };
}
