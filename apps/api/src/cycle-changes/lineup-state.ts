import { Injectable } from '@nestjs/common';
import { In, type EntityManager } from 'typeorm';
import { Aircraft } from '../database/entities/aircraft.entity.js';
import { Cycle } from '../database/entities/cycle.entity.js';
import { Catapult } from '../database/entities/catapult.entity.js';
import { Ship } from '../database/entities/ship.entity.js';
import { User } from '../database/entities/user.entity.js';
import { Slot } from '../database/entities/slot.entity.js';
import { LineupException } from './lineup.exception.js';

/** Everything a cycle's lineup is computed from, read in one transaction. */
export interface LineupState {
  cycle: Cycle;
  ship: Ship;
  /** By catapult number. */
  catapults: Catapult[];
  /** With aircraft (type, squadron), pilot and the person who last changed the status (id and name only); by id. */
  slots: Slot[];
}

export const cycleNotFound = (cycleId: number) => new LineupException('not_found', `Cycle ${cycleId} does not exist.`);

@Injectable()
export class LineupStateLoader {
  /** The state of a cycle that exists, or 404. */
  async read(manager: EntityManager, cycleId: number): Promise<LineupState> {
    const cycle = await manager.findOneBy(Cycle, { id: cycleId });
    if (!cycle) throw cycleNotFound(cycleId);
    return this.load(manager, cycle);
  }

  /**
   * The state around a cycle row already read. Given the state read earlier in the same command, it
   * keeps the ship and the aircraft and people it already holds (a command changes none of them).
   */
  async load(manager: EntityManager, cycle: Cycle, earlier?: LineupState): Promise<LineupState> {
    const [ship, catapults, slots] = await Promise.all([
      earlier?.ship ?? manager.findOneByOrFail(Ship, { id: cycle.shipId }),
      manager.find(Catapult, { where: { shipId: cycle.shipId }, order: { number: 'ASC' } }),
      manager.find(Slot, { where: { cycleId: cycle.id }, order: { id: 'ASC' } }),
    ]);
    const aircraftById = new Map((earlier?.slots ?? []).map((slot) => [slot.aircraftId, slot.aircraft]));
    const personById = new Map(
      (earlier?.slots ?? [])
        .flatMap((slot) => [slot.pilot, slot.statusBy])
        .filter((person) => person !== null)
        .map((person) => [person.id, person]),
    );
    // Related rows by id in two plain queries: TypeORM's joined load of the same costs several times more.
    const missingAircraft = [...new Set(slots.map((slot) => slot.aircraftId))].filter((id) => !aircraftById.has(id));
    const missingPeople = [...new Set(slots.flatMap((slot) => [slot.pilotId, slot.statusById]))].filter(
      (id): id is number => id !== null && !personById.has(id),
    );
    const [aircraft, people] = await Promise.all([
      missingAircraft.length === 0
        ? []
        : manager.find(Aircraft, { where: { id: In(missingAircraft) }, relations: { type: true, squadron: true } }),
      missingPeople.length === 0
        ? []
        : manager.find(User, { where: { id: In(missingPeople) }, select: { id: true, name: true } }),
    ]);
    for (const row of aircraft) aircraftById.set(row.id, row);
    for (const row of people) personById.set(row.id, row);
    for (const slot of slots) {
      slot.aircraft = aircraftById.get(slot.aircraftId)!;
      slot.pilot = slot.pilotId === null ? null : (personById.get(slot.pilotId) ?? null);
      slot.statusBy = slot.statusById === null ? null : (personById.get(slot.statusById) ?? null);
    }
    return { cycle, ship, catapults, slots };
  }
}
