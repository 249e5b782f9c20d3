import { HttpStatus, Injectable } from '@nestjs/common';
import { InjectDataSource } from '@nestjs/typeorm';
import type { DataSource } from 'typeorm';
import { DomainException } from '../common/errors/domain.exception.js';
import { inShipScope, type ShipScope } from '../common/ship-scope.js';
import { Cycle } from '../database/entities/cycle.entity.js';

/**
 * Whether a person may touch a cycle at all: it must be on their ship (any ship for a fleet admin).
 * Run by the auth guard for every route with a `:cycleId` and by the gateway for `cycle:join`, so
 * nothing under /cycles/{cycleId}/… needs its own check. Another ship's cycle is answered exactly as
 * a cycle that does not exist.
 */
@Injectable()
export class CycleScope {
  constructor(@InjectDataSource() private readonly dataSource: DataSource) {}

  /** Throws the 404 of a missing cycle unless the cycle exists and is in the scope. */
  async check(scope: ShipScope, cycleId: number): Promise<void> {
    if (scope.shipId === null) return;
    const cycle = await this.dataSource.manager.findOne(Cycle, {
      select: { id: true, shipId: true },
      where: { id: cycleId },
    });
    if (!cycle || !inShipScope(scope, cycle.shipId)) {
      throw new DomainException(HttpStatus.NOT_FOUND, 'not_found', `Cycle ${cycleId} does not exist.`);
    }
  }
}
