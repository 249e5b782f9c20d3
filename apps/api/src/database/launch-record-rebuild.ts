import type { CycleView, LaunchFigures, LaunchRecord, LineupPatch, Role } from '@catline/contracts';
import { windReadingUsed, type WindInForce } from '../cycle-changes/launch-record.js';

// Launch records for aircraft launched before the record existed, put together from what the change log
// kept. Used by the SlotLaunchRecord migration; it reads plain rows so a later change of the entities
// cannot change what the migration did.

/** The launched slot as its row holds it. */
export interface LaunchedSlotRow {
  id: number;
  catapultId: number;
  catapultNumber: number;
  launchedAt: Date;
  grossWeightLb: number;
  fuelLb: number;
  stores: string;
  overrideReason: string | null;
  /** Who last changed its status (the launch), by name; null when the person is gone. */
  statusById: number | null;
  statusByName: string | null;
}

/** The change that recorded the launch, when the log still holds it. */
export interface LaunchChangeRow {
  actorId: number;
  actorName: string;
  actorRole: Role;
  patch: LineupPatch;
}

/**
 * A change logged before the approved data gave settings carries the energy model's setting alone, as
 * its catapult setting; a later one carries the approved setting and the cross-check beside it.
 */
function settingsOf(
  figures: (Pick<LaunchFigures, 'catapultSetting'> & Partial<Pick<LaunchFigures, 'crossCheckSetting'>>) | null,
): Pick<LaunchRecord, 'launchDataSetting' | 'crossCheckSetting'> {
  if (figures === null) return { launchDataSetting: null, crossCheckSetting: null };
  return figures.crossCheckSetting !== undefined
    ? { launchDataSetting: figures.catapultSetting, crossCheckSetting: figures.crossCheckSetting }
    : { launchDataSetting: null, crossCheckSetting: figures.catapultSetting };
}

/** A change logged before the cycle kept the reading's spread and time carries neither: null, not guessed. */
function windAsLogged(cycle: CycleView): WindInForce {
  const logged: Partial<CycleView> = cycle;
  return {
    ...cycle,
    windGustFromDeg: logged.windGustFromDeg ?? null,
    windGustKt: logged.windGustKt ?? null,
    windLullFromDeg: logged.windLullFromDeg ?? null,
    windLullKt: logged.windLullKt ?? null,
    windReadAt: logged.windReadAt ?? null,
  };
}

/**
 * The record of a launch from the change that recorded it: its patch carries the slot's view with the
 * figures worked out at that version (under the conditions then in force) and the cycle's conditions.
 * Without the change only the slot's own columns are known, and every figure stays null.
 */
export function rebuildLaunchRecord(slot: LaunchedSlotRow, change: LaunchChangeRow | null): LaunchRecord {
  const view = change?.patch.slots?.find((candidate) => candidate.id === slot.id) ?? null;
  const figures = view?.figures ?? null;
  const cycle = change?.patch.cycle ?? null;
  return {
    source: 'rebuilt',
    launchedAt: slot.launchedAt.toISOString(),
    catapultId: slot.catapultId,
    catapultNumber: slot.catapultNumber,
    grossWeightLb: slot.grossWeightLb,
    fuelLb: slot.fuelLb,
    stores: slot.stores,
    ...settingsOf(figures),
    windReading: cycle ? windReadingUsed(windAsLogged(cycle)) : null,
    headwindKt: figures?.headwindKt ?? null,
    crosswindKt: figures?.crosswindKt ?? null,
    crosswindSide: figures?.crosswindSide ?? null,
    endSpeedKt: figures?.endSpeedKt ?? null,
    requiredAirspeedKt: figures?.requiredAirspeedKt ?? null,
    requiredWindOverDeckKt: figures?.requiredWindOverDeckKt ?? null,
    excessWindKt: figures?.marginKt ?? null,
    excessWindOverDeckKt: figures?.excessWindOverDeckKt ?? null,
    recommendedExcessKt: figures?.recommendedExcessKt ?? null,
    go: figures?.go ?? null,
    reasons: figures?.reasons ?? [],
    trimDeg: view?.trimDeg ?? null,
    afterburnerRequired: view?.afterburnerRequired ?? null,
    clearingTurnDeg: figures?.clearingTurnDeg ?? null,
    waiver: slot.overrideReason,
    firedBy: change
      ? { id: change.actorId, name: change.actorName, role: change.actorRole }
      : slot.statusByName === null
        ? null
        : { id: slot.statusById, name: slot.statusByName, role: null },
  };
}
