import { shipIsoTime, shipTimeZone, type CycleReport, type LaunchRecord } from '@catline/contracts';
import type { CsvCell } from '../common/csv.js';
import type { CycleChange } from '../database/entities/cycle-change.entity.js';
import type { LineupState } from '../cycle-changes/lineup-state.js';

// The columns of a cycle's CSV exports; README.md describes them. Instants are in the ship's zone with
// its offset, and the last column names the zone.

/** Writes an instant (a date or an ISO 8601 string) as the ship's clock in ISO 8601; empty for none. */
type ShipInstant = (instant: Date | string | null) => string | null;

const shipInstant =
  (timeZone: string): ShipInstant =>
  (instant) =>
    instant === null ? null : shipIsoTime(instant, timeZone);

/** What was used with the shot, from the slot's launch record (empty unless launched). */
const LAUNCH_RECORD_COLUMNS = [
  'record_source',
  'agreed_weight_lb',
  'launch_data_setting',
  'cross_check_setting',
  'wind_from_deg',
  'wind_speed_kt',
  'ship_course_deg',
  'ship_speed_kt',
  'wind_read_at',
  'headwind_kt',
  'crosswind_kt',
  'crosswind_side',
  'end_speed_kt',
  'margin_kt',
  'excess_wind_over_deck_kt',
  'recommended_excess_kt',
  'trim_deg',
  'afterburner',
  'waiver',
  'fired_by',
] as const;

function launchRecordCells(record: LaunchRecord | null, iso: ShipInstant): CsvCell[] {
  if (!record) return LAUNCH_RECORD_COLUMNS.map(() => null);
  const wind = record.windReading;
  return [
    record.source,
    record.grossWeightLb,
    record.launchDataSetting,
    record.crossCheckSetting,
    wind?.trueWindFromDeg ?? null,
    wind?.trueWindSpeedKt ?? null,
    wind?.shipCourseDeg ?? null,
    wind?.shipSpeedKt ?? null,
    iso(wind?.readAt ?? null),
    record.headwindKt,
    record.crosswindKt,
    record.crosswindSide,
    record.endSpeedKt,
    record.excessWindKt,
    record.excessWindOverDeckKt,
    record.recommendedExcessKt,
    record.trimDeg,
    record.afterburnerRequired,
    record.waiver,
    record.firedBy?.name ?? null,
  ];
}

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
  'waiver_reason',
  'down_at',
  'replaced_by',
  ...LAUNCH_RECORD_COLUMNS,
  'time_zone',
] as const;

export const CHANGE_COLUMNS = [
  'version',
  'at',
  'kind',
  'actor',
  'actor_role',
  'summary',
  'command',
  'time_zone',
] as const;

/** One row per aircraft of the cycle, by slot id, with the report's planned time and verdicts. */
export function slotRows(state: LineupState, report: CycleReport): CsvCell[][] {
  const lines = new Map(report.catapults.flatMap((catapult) => catapult.launches).map((line) => [line.slotId, line]));
  const numbers = new Map(state.catapults.map((catapult) => [catapult.id, catapult.number]));
  const sides = new Map(state.slots.map((slot) => [slot.id, slot.aircraft.sideNumber]));
  const timeZone = shipTimeZone(state.ship.profile);
  const iso = shipInstant(timeZone);
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
      iso(line?.plannedAt ?? null),
      iso(slot.launchedAt),
      line?.deltaS ?? null,
      line?.inWindow ?? null,
      iso(slot.pilotWeightAckAt),
      iso(slot.catapultWeightAckAt),
      slot.suspendReason,
      slot.overrideReason,
      iso(slot.downAt),
      slot.replacedBySlotId === null ? null : (sides.get(slot.replacedBySlotId) ?? null),
      ...launchRecordCells(slot.status === 'launched' ? slot.launchRecord : null, iso),
      timeZone,
    ];
  });
}

/** One row per change, in version order; the command as the server accepted it, in JSON. */
export function changeRows(rows: readonly CycleChange[], timeZone: string): CsvCell[][] {
  return rows.map((row) => [
    row.version,
    shipIsoTime(row.at, timeZone),
    row.kind,
    row.actorName,
    row.actorRole,
    row.summary,
    JSON.stringify(row.payload.command),
    timeZone,
  ]);
}
