import { shipTimeZone, type CycleLanding, type CycleState, type CycleView, type Page } from '@catline/contracts';
import { Injectable } from '@nestjs/common';
import { InjectDataSource } from '@nestjs/typeorm';
import { DataSource, In, Not } from 'typeorm';
import { AuditTrail } from '../audit/audit-trail.service.js';
import { isDuplicateKey } from '../common/errors/database-errors.js';
import { pageOf, type PageWindow } from '../common/paging/page-query.dto.js';
import type { AuthenticatedUser } from '../common/authenticated-user.js';
import { inShipScope, type ShipScope, shipWhere } from '../common/ship-scope.js';
import { Slot } from '../database/entities/slot.entity.js';
import { Ship } from '../database/entities/ship.entity.js';
import { Clock } from '../cycle-changes/clock.js';
import { toCycleView, type CycleCounts } from '../cycle-changes/cycle.mapper.js';
import { checkWindow } from './cycle-window.js';
import { nightOf } from './cycle-sky.js';
import { CyclesException } from './cycles.exception.js';
import { chooseLandingCycle } from './landing-cycle.js';
import type { CreateCycleDto } from './dto/create-cycle.dto.js';
import { Cycle } from '../database/entities/cycle.entity.js';

const NO_SLOTS: CycleCounts = { slotCount: 0, launchedCount: 0 };

/**
 * Cycles as records: listing, reading and creating. Changes to a cycle go through CycleCommandsService.
 * Reading one cycle needs no scope here: the auth guard lets a route reach `:cycleId` only on the caller's ship.
 */
@Injectable()
export class CyclesService {
  constructor(
    @InjectDataSource() private readonly dataSource: DataSource,
    private readonly audit: AuditTrail,
    private readonly clock: Clock,
  ) {}

  /** Newest planned launch first. */
  async list(scope: ShipScope, window: PageWindow): Promise<Page<CycleView>> {
    const [cycles, total] = await this.dataSource.manager.findAndCount(Cycle, {
      where: shipWhere(scope),
      relations: { ship: true },
      order: { plannedLaunchAt: 'DESC', id: 'DESC' },
      take: window.limit,
      skip: window.offset,
    });
    const counts = await this.counts(cycles.map((cycle) => cycle.id));
    const views = cycles.map((cycle) => toCycleView(cycle, cycle.ship.profile, counts.get(cycle.id) ?? NO_SLOTS));
    return pageOf(window, views, total);
  }

  async get(id: number): Promise<CycleView> {
    const cycle = await this.dataSource.manager.findOne(Cycle, { where: { id }, relations: { ship: true } });
    if (!cycle) throw new CyclesException('not_found', `Cycle ${id} does not exist.`);
    return toCycleView(cycle, cycle.ship.profile, (await this.counts([id])).get(id) ?? NO_SLOTS);
  }

  /** The cycle the caller's screens open on when the address names none (the rule: landing-cycle.ts). */
  async landing(caller: AuthenticatedUser): Promise<CycleLanding> {
    const cycles = await this.dataSource.manager.find(Cycle, {
      select: { id: true, state: true, plannedLaunchAt: true },
      where: shipWhere(caller),
    });
    const chosen = chooseLandingCycle(cycles, { role: caller.role, heldCycleIds: await this.heldCycleIds(caller) });
    return { cycleId: chosen?.id ?? null };
  }

  /** The open cycles holding the caller's part: a pilot's slot, or an aircraft in the lane of their catapult. */
  private async heldCycleIds(caller: AuthenticatedUser): Promise<Set<number>> {
    const part =
      caller.role === 'pilot'
        ? { pilotId: caller.id }
        : (caller.role === 'catapult_officer' || caller.role === 'deck_edge_operator') && caller.catapultId !== null
          ? { catapultId: caller.catapultId }
          : null;
    if (!part) return new Set();
    const slots = await this.dataSource.manager.find(Slot, {
      select: { id: true, cycleId: true },
      where: { ...part, cycle: { state: Not<CycleState>('closed'), ...shipWhere(caller) } },
    });
    return new Set(slots.map((slot) => slot.cycleId));
  }

  async create(scope: ShipScope, request: CreateCycleDto): Promise<CycleView> {
    const times = {
      plannedLaunchAt: new Date(request.plannedLaunchAt),
      windowStartAt: new Date(request.windowStartAt),
      windowEndAt: new Date(request.windowEndAt),
    };
    checkWindow(times);
    const ship = await this.dataSource.manager.findOneBy(Ship, { id: request.shipId });
    if (!ship || !inShipScope(scope, ship.id))
      throw new CyclesException('not_found', `Ship ${request.shipId} does not exist.`);
    const { latitudeDeg = null, longitudeDeg = null } = request;
    const position = { latitudeDeg, longitudeDeg };
    const night = nightOf({ ...request, ...times, ...position }, request.night, shipTimeZone(ship.profile));
    // The wind entered with a new cycle is its first reading, steady: its gust and lull are the wind itself.
    const spread = {
      windGustFromDeg: request.trueWindFromDeg,
      windGustKt: request.trueWindSpeedKt,
      windLullFromDeg: request.trueWindFromDeg,
      windLullKt: request.trueWindSpeedKt,
    };
    try {
      const cycle = await this.dataSource.transaction(async (manager) => {
        const created = await manager.save(
          Cycle,
          manager.create(Cycle, { ...request, ...times, ...position, ...spread, night, windReadAt: this.clock.now() }),
        );
        await this.audit.record(manager, {
          action: 'cycle.created',
          subject: { type: 'cycle', id: created.id },
          shipId: created.shipId,
          summary: `Cycle ${created.number} created`,
          after: { ...toCycleView(created, ship.profile, NO_SLOTS) },
        });
        return created;
      });
      return this.get(cycle.id);
    } catch (error) {
      if (!isDuplicateKey(error)) throw error;
      throw new CyclesException('cycle_number_taken', `This ship already has a cycle ${request.number}.`);
    }
  }

  private async counts(cycleIds: number[]): Promise<Map<number, CycleCounts>> {
    if (cycleIds.length === 0) return new Map();
    const query = this.dataSource.manager
      .createQueryBuilder(Slot, 'slot')
      .select('slot.cycleId', 'cycleId')
      // Spares still held (not called for a down aircraft) are not counted: see isHeldSpare.
      .addSelect(
        `SUM(CASE WHEN slot.spare = 1 AND slot.status = 'planned'
           AND NOT EXISTS (SELECT 1 FROM slots called WHERE called.replaced_by_slot_id = slot.id)
           THEN 0 ELSE 1 END)`,
        'slotCount',
      )
      .addSelect("SUM(CASE WHEN slot.status = 'launched' THEN 1 ELSE 0 END)", 'launchedCount')
      .where({ cycleId: In(cycleIds) })
      .groupBy('slot.cycleId');
    const rows = await query.getRawMany<{
      cycleId: number | string;
      slotCount: number | string;
      launchedCount: number | string;
    }>();
    return new Map(
      rows.map((row) => [
        Number(row.cycleId),
        { slotCount: Number(row.slotCount), launchedCount: Number(row.launchedCount) },
      ]),
    );
  }
}
