import type { ShotCounts } from '@catline/contracts';
import { Injectable } from '@nestjs/common';
import type { EntityManager } from 'typeorm';
import { Aircraft } from '../database/entities/aircraft.entity.js';
import { toCsv } from '../common/csv.js';
import { Slot } from '../database/entities/slot.entity.js';
import { ReplicaReads } from '../database/replica-reads.js';
import { Catapult } from '../database/entities/catapult.entity.js';
import type { CsvFile } from '../common/csv-response.js';
import type { DayRange } from './day-range.js';
import { type ShipScope, shipWhere } from '../common/ship-scope.js';

export const SHOT_COUNT_COLUMNS = [
  'kind',
  'ship',
  'catapult',
  'side_number',
  'type',
  'squadron',
  'launches',
  'lifetime_shots',
] as const;

const bySide = (a: Aircraft, b: Aircraft) => a.sideNumber.localeCompare(b.sideNumber, 'en', { numeric: true });

/**
 * Maintenance's counts of catapult launches per airframe and per catapult, from the recorded launch times,
 * for the caller's ship (every ship for a fleet admin).
 */
@Injectable()
export class ShotCountsService {
  constructor(private readonly replica: ReplicaReads) {}

  async counts(scope: ShipScope, range: DayRange): Promise<ShotCounts> {
    const [perAircraft, perCatapult, aircraft, catapults] = await this.replica.read((manager) =>
      Promise.all([
        this.launchesBy(manager, range, 'aircraftId'),
        this.launchesBy(manager, range, 'catapultId'),
        manager.find(Aircraft, { where: shipWhere(scope), relations: { type: true, squadron: true } }),
        manager.find(Catapult, {
          where: shipWhere(scope),
          relations: { ship: true },
          order: { shipId: 'ASC', number: 'ASC' },
        }),
      ]),
    );
    return {
      from: range.from,
      to: range.to,
      totalLaunches: aircraft.reduce((sum, plane) => sum + (perAircraft.get(plane.id) ?? 0), 0),
      airframes: aircraft.sort(bySide).map((plane) => ({
        aircraftId: plane.id,
        sideNumber: plane.sideNumber,
        typeDesignation: plane.type.designation,
        squadronCode: plane.squadron.code,
        launches: perAircraft.get(plane.id) ?? 0,
        lifetimeShots: plane.catapultShots,
      })),
      catapults: catapults.map((catapult) => ({
        catapultId: catapult.id,
        shipName: catapult.ship.name,
        number: catapult.number,
        launches: perCatapult.get(catapult.id) ?? 0,
        lifetimeShots: catapult.shotCount,
      })),
    };
  }

  async csv(scope: ShipScope, range: DayRange): Promise<CsvFile> {
    const counts = await this.counts(scope, range);
    const rows = [
      ...counts.airframes.map((row) => [
        'airframe',
        null,
        null,
        row.sideNumber,
        row.typeDesignation,
        row.squadronCode,
        row.launches,
        row.lifetimeShots,
      ]),
      ...counts.catapults.map((row) => [
        'catapult',
        row.shipName,
        row.number,
        null,
        null,
        null,
        row.launches,
        row.lifetimeShots,
      ]),
    ];
    return { fileName: `shot-counts-${range.from}-to-${range.to}.csv`, content: toCsv(SHOT_COUNT_COLUMNS, rows) };
  }

  /** Launches recorded inside the range, counted per aircraft or per catapult. */
  private async launchesBy(
    manager: EntityManager,
    range: DayRange,
    key: 'aircraftId' | 'catapultId',
  ): Promise<Map<number, number>> {
    const rows = await manager
      .createQueryBuilder(Slot, 'slot')
      .select(`slot.${key}`, 'id')
      .addSelect('COUNT(*)', 'launches')
      .where('slot.launchedAt >= :start AND slot.launchedAt < :end', { start: range.start, end: range.end })
      .groupBy(`slot.${key}`)
      .getRawMany<{ id: number | string; launches: number | string }>();
    return new Map(rows.map((row) => [Number(row.id), Number(row.launches)]));
  }
}
