import type { CycleView } from '@catline/contracts';
import { Injectable } from '@nestjs/common';
import { InjectDataSource } from '@nestjs/typeorm';
import { DataSource } from 'typeorm';
import { AuditTrail } from '../audit/audit-trail.service.js';
import { isDuplicateKey } from '../common/errors/database-errors.js';
import { Slot } from '../database/entities/slot.entity.js';
import { Ship } from '../database/entities/ship.entity.js';
import { toCycleView, type CycleCounts } from '../cycle-changes/cycle.mapper.js';
import { checkWindow } from './cycle-window.js';
import { CyclesException } from './cycles.exception.js';
import type { CreateCycleDto } from './dto/create-cycle.dto.js';
import { Cycle } from '../database/entities/cycle.entity.js';

const NO_SLOTS: CycleCounts = { slotCount: 0, launchedCount: 0 };

/** Cycles as records: listing, reading and creating. Changes to a cycle go through CycleCommandsService. */
@Injectable()
export class CyclesService {
  constructor(
    @InjectDataSource() private readonly dataSource: DataSource,
    private readonly audit: AuditTrail,
  ) {}

  async list(): Promise<CycleView[]> {
    const cycles = await this.dataSource.manager.find(Cycle, { order: { plannedLaunchAt: 'DESC', id: 'DESC' } });
    const counts = await this.counts();
    return cycles.map((cycle) => toCycleView(cycle, counts.get(cycle.id) ?? NO_SLOTS));
  }

  async get(id: number): Promise<CycleView> {
    const cycle = await this.dataSource.manager.findOneBy(Cycle, { id });
    if (!cycle) throw new CyclesException('not_found', `Cycle ${id} does not exist.`);
    return toCycleView(cycle, (await this.counts(id)).get(id) ?? NO_SLOTS);
  }

  async create(request: CreateCycleDto): Promise<CycleView> {
    const times = {
      plannedLaunchAt: new Date(request.plannedLaunchAt),
      windowStartAt: new Date(request.windowStartAt),
      windowEndAt: new Date(request.windowEndAt),
    };
    checkWindow(times);
    if (!(await this.dataSource.manager.existsBy(Ship, { id: request.shipId }))) {
      throw new CyclesException('not_found', `Ship ${request.shipId} does not exist.`);
    }
    try {
      const cycle = await this.dataSource.transaction(async (manager) => {
        const created = await manager.save(Cycle, manager.create(Cycle, { ...request, ...times }));
        await this.audit.record(manager, {
          action: 'cycle.created',
          subject: { type: 'cycle', id: created.id },
          summary: `Cycle ${created.number} created`,
          after: { ...toCycleView(created, NO_SLOTS) },
        });
        return created;
      });
      return this.get(cycle.id);
    } catch (error) {
      if (!isDuplicateKey(error)) throw error;
      throw new CyclesException('cycle_number_taken', `This ship already has a cycle ${request.number}.`);
    }
  }

  private async counts(cycleId?: number): Promise<Map<number, CycleCounts>> {
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
      .groupBy('slot.cycleId');
    if (cycleId !== undefined) query.where('slot.cycleId = :cycleId', { cycleId });
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
