import { shipTimeZone } from '@catline/contracts';
import { type EntityManager, In } from 'typeorm';
import { CycleChange } from '../database/entities/cycle-change.entity.js';
import { Slot } from '../database/entities/slot.entity.js';
import { Catapult } from '../database/entities/catapult.entity.js';
import { Ship } from '../database/entities/ship.entity.js';
import type { Squadron } from '../database/entities/squadron.entity.js';
import type { CycleSummaryInput, SummaryEvent } from './cycle-summary.js';
import type { Cycle } from '../database/entities/cycle.entity.js';

/** Changes whose account a squadron wants besides its aircraft's outcome. */
const TOLD_KINDS = ['aircraft_down', 'slot_suspended', 'slot_launched'] as const;

export interface CycleSummaryRecord {
  input: CycleSummaryInput;
  /** The squadrons with aircraft in the cycle, each told its own. */
  squadrons: Squadron[];
}

/** What the squadrons' summaries of a cycle say; null for a cycle without aircraft. Read in the closing transaction. */
export async function readCycleSummary(manager: EntityManager, cycle: Cycle): Promise<CycleSummaryRecord | null> {
  const slots = await manager.find(Slot, {
    where: { cycleId: cycle.id },
    relations: { aircraft: { type: true, squadron: true }, pilot: true },
    order: { id: 'ASC' },
  });
  if (slots.length === 0) return null;
  const [ship, catapults, changes] = await Promise.all([
    manager.findOneByOrFail(Ship, { id: cycle.shipId }),
    manager.findBy(Catapult, { shipId: cycle.shipId }),
    manager.find(CycleChange, { where: { cycleId: cycle.id, kind: In([...TOLD_KINDS]) }, order: { version: 'ASC' } }),
  ]);
  const squadrons = new Map<number, Squadron>(slots.map((slot) => [slot.aircraft.squadronId, slot.aircraft.squadron]));
  return { input: summaryInput(cycle, ship, catapults, slots, changes), squadrons: [...squadrons.values()] };
}

function summaryInput(
  cycle: Cycle,
  ship: Ship,
  catapults: Catapult[],
  slots: Slot[],
  changes: CycleChange[],
): CycleSummaryInput {
  const catapultNumber = new Map(catapults.map((catapult) => [catapult.id, catapult.number]));
  const sideOf = new Map(slots.map((slot) => [slot.id, slot.aircraft.sideNumber]));
  return {
    shipName: ship.name,
    hullCode: ship.hullCode,
    cycleNumber: cycle.number,
    timeZone: shipTimeZone(ship.profile),
    plannedLaunchAt: cycle.plannedLaunchAt,
    windowStartAt: cycle.windowStartAt,
    windowEndAt: cycle.windowEndAt,
    weatherCase: cycle.weatherCase,
    night: cycle.night,
    slots: slots.map((slot) => ({
      id: slot.id,
      sideNumber: slot.aircraft.sideNumber,
      typeDesignation: slot.aircraft.type.designation,
      squadronId: slot.aircraft.squadronId,
      mission: slot.mission,
      pilotName: slot.pilot?.name ?? null,
      status: slot.status,
      catapultNumber:
        slot.status === 'launched' && slot.catapultId !== null ? (catapultNumber.get(slot.catapultId) ?? null) : null,
      launchedAt: slot.launchedAt,
      replacedBy: slot.replacedBySlotId === null ? null : (sideOf.get(slot.replacedBySlotId) ?? null),
    })),
    events: changes.flatMap((change): SummaryEvent[] => {
      const { slotId, waived } = change.payload.command as { slotId?: unknown; waived?: unknown };
      // A launch is told only when it went under a waiver; the slot's line already gives its time.
      if (typeof slotId !== 'number' || (change.kind === 'slot_launched' && !waived)) return [];
      return [{ at: change.at, slotId, summary: change.summary }];
    }),
  };
}
