import type { ChangeKind, LineupChange, LineupCommandResult, LineupPatch, Page } from '@catline/contracts';
import { Injectable } from '@nestjs/common';
import { InjectDataSource } from '@nestjs/typeorm';
import { Between, DataSource, MoreThan, type EntityManager } from 'typeorm';
import { Cycle } from '../database/entities/cycle.entity.js';
import { pageOf, type PageWindow } from '../common/paging/page-query.dto.js';
import { toLineupChange } from './change.mapper.js';
import { CycleChange } from '../database/entities/cycle-change.entity.js';
import { cycleNotFound } from './lineup-state.js';

/** How far back a stale-basis explanation looks for the change that moved things on. */
const EXPLAIN_LOOKBACK = 200;

/** Reads the cycle change log. */
@Injectable()
export class LineupChangesService {
  constructor(@InjectDataSource() private readonly dataSource: DataSource) {}

  /** Changes after `since`, ascending, at most `limit`; 404 for a cycle that does not exist. */
  async since(cycleId: number, since: number, limit: number): Promise<LineupChange[]> {
    const rows = await this.dataSource.manager.find(CycleChange, {
      where: { cycleId, version: MoreThan(since) },
      order: { version: 'ASC' },
      take: limit,
    });
    if (rows.length === 0 && !(await this.dataSource.manager.existsBy(Cycle, { id: cycleId }))) {
      throw cycleNotFound(cycleId);
    }
    return rows.map(toLineupChange);
  }

  /** One page of the changes after `since`, ascending; 404 for a cycle that does not exist. */
  async pageSince(cycleId: number, since: number, window: PageWindow): Promise<Page<LineupChange>> {
    const [rows, total] = await this.dataSource.manager.findAndCount(CycleChange, {
      where: { cycleId, version: MoreThan(since) },
      order: { version: 'ASC' },
      take: window.limit,
      skip: window.offset,
    });
    if (total === 0 && !(await this.dataSource.manager.existsBy(Cycle, { id: cycleId }))) {
      throw cycleNotFound(cycleId);
    }
    return pageOf(window, rows.map(toLineupChange), total);
  }

  async currentVersion(cycleId: number): Promise<number> {
    const cycle = await this.dataSource.manager.findOne(Cycle, {
      where: { id: cycleId },
      select: { id: true, version: true },
    });
    if (!cycle) throw cycleNotFound(cycleId);
    return cycle.version;
  }

  /** The changes with versions from `first` to `last`, as far as the log holds them. */
  async between(cycleId: number, first: number, last: number): Promise<LineupChange[]> {
    const rows = await this.dataSource.manager.find(CycleChange, {
      where: { cycleId, version: Between(first, last) },
      order: { version: 'ASC' },
    });
    return rows.map(toLineupChange);
  }

  /** The latest change whose patch matches, newest first among the last few hundred. */
  async latestMatching(
    manager: EntityManager,
    cycleId: number,
    matches: (patch: LineupPatch, kind: ChangeKind) => boolean,
    afterVersion = 0,
  ): Promise<LineupChange | null> {
    const rows = await manager.find(CycleChange, {
      where: { cycleId, version: MoreThan(afterVersion) },
      order: { version: 'DESC' },
      take: EXPLAIN_LOOKBACK,
    });
    const row = rows.find((candidate) => matches(candidate.payload.patch, candidate.kind));
    return row ? toLineupChange(row) : null;
  }

  /** The result a repeated launch request is answered with: the change that recorded the launch. */
  async launchResult(manager: EntityManager, cycleId: number, slotId: number): Promise<LineupCommandResult | null> {
    const launches = await manager.find(CycleChange, {
      where: { cycleId, kind: 'slot_launched' },
      order: { version: 'ASC' },
    });
    const row = launches.find((candidate) => candidate.payload.command.slotId === slotId);
    return row ? { version: row.version, change: toLineupChange(row) } : null;
  }
}
