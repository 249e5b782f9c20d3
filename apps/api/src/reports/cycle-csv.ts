import type { CycleReport } from '@catline/contracts';
import type { CsvCell } from '../common/csv.js';
import type { CycleChange } from '../database/entities/cycle-change.entity.js';
import type { LineupState } from '../cycle-changes/lineup-state.js';

// The columns of a cycle's CSV exports; README.md describes them.

export const SLOT_COLUMNS = [
  'slot_id',
  'side_number',
  'type',
  'squadron',
  'pilot',
  'mission',
  'gross_weight_lb',
  'fuel_lb',
  'stores',
  'tanker',
  'early_warning',
  'spare',
  'status',
  'catapult',
  'position',
  'planned_catapult',
  'planned_at',
  'launched_at',
  'delta_s',
  'in_window',
  'pilot_weight_ack_at',
  'catapult_weight_ack_at',
  'suspend_reason',
  'override_reason',
  'down_at',
  'replaced_by',
] as const;

export const CHANGE_COLUMNS = ['version', 'at', 'kind', 'actor', 'actor_role', 'summary', 'command'] as const;

const iso = (instant: Date | null) => instant?.toISOString() ?? null;

/** One row per aircraft of the cycle, by slot id, with the report's planned time and verdicts. */
export function slotRows(state: LineupState, report: CycleReport): CsvCell[][] {
  const lines = new Map(report.catapults.flatMap((catapult) => catapult.launches).map((line) => [line.slotId, line]));
  const numbers = new Map(state.catapults.map((catapult) => [catapult.id, catapult.number]));
  const sides = new Map(state.slots.map((slot) => [slot.id, slot.aircraft.sideNumber]));
  return state.slots.map((slot) => {
    const line = lines.get(slot.id);
    return [
      slot.id,
      slot.aircraft.sideNumber,
      slot.aircraft.type.designation,
      slot.aircraft.squadron.code,
      slot.pilot?.name ?? null,
      slot.mission,
      slot.grossWeightLb,
      slot.fuelLb,
      slot.stores,
      slot.tanker,
      slot.earlyWarning,
      slot.spare,
      slot.status,
      slot.catapultId === null ? null : (numbers.get(slot.catapultId) ?? null),
      slot.position === null ? null : slot.position + 1,
      line?.plannedCatapultNumber ?? null,
      line?.plannedAt ?? null,
      iso(slot.launchedAt),
      line?.deltaS ?? null,
      line?.inWindow ?? null,
      iso(slot.pilotWeightAckAt),
      iso(slot.catapultWeightAckAt),
      slot.suspendReason,
      slot.overrideReason,
      iso(slot.downAt),
      slot.replacedBySlotId === null ? null : (sides.get(slot.replacedBySlotId) ?? null),
    ];
  });
}

/** One row per change, in version order; the command as the server accepted it, in JSON. */
export function changeRows(rows: readonly CycleChange[]): CsvCell[][] {
  return rows.map((row) => [
    row.version,
    row.at.toISOString(),
    row.kind,
    row.actorName,
    row.actorRole,
    row.summary,
    JSON.stringify(row.payload.command),
  ]);
}
