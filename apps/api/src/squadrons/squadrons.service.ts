import type { SquadronView } from '@catline/contracts';
import { Injectable, Logger } from '@nestjs/common';
import { InjectDataSource } from '@nestjs/typeorm';
import { type DataSource, type EntityManager, Not } from 'typeorm';
import { AuditTrail } from '../audit/audit-trail.service.js';
import { definedFields } from '../common/defined-fields.js';
import { type ShipScope, shipWhere } from '../common/ship-scope.js';
import { ownerShip } from '../ships/owner-ship.js';
import { Aircraft } from '../database/entities/aircraft.entity.js';
import { isDuplicateKey, isStillReferenced } from '../common/errors/database-errors.js';
import type { CreateSquadronDto } from './dto/create-squadron.dto.js';
import type { UpdateSquadronDto } from './dto/update-squadron.dto.js';
import { Squadron } from '../database/entities/squadron.entity.js';
import { toSquadronView } from './squadron.mapper.js';
import { SquadronsException } from './squadrons.exception.js';

const noSquadron = (id: number) => new SquadronsException('squadron_not_found', `There is no squadron with id ${id}.`);

@Injectable()
export class SquadronsService {
  private readonly logger = new Logger(SquadronsService.name);

  constructor(
    @InjectDataSource() private readonly dataSource: DataSource,
    private readonly audit: AuditTrail,
  ) {}

  async list(scope: ShipScope): Promise<SquadronView[]> {
    const squadrons = await this.dataSource.manager.find(Squadron, { where: shipWhere(scope), order: { code: 'ASC' } });
    return squadrons.map(toSquadronView);
  }

  async get(scope: ShipScope, id: number): Promise<SquadronView> {
    const squadron = await this.dataSource.manager.findOneBy(Squadron, { id, ...shipWhere(scope) });
    if (!squadron) throw noSquadron(id);
    return toSquadronView(squadron);
  }

  async create(scope: ShipScope, body: CreateSquadronDto): Promise<SquadronView> {
    return this.dataSource.transaction(async (manager) => {
      const shipId = await ownerShip(manager, scope, body.shipId);
      await this.checkCodeFree(manager, body.code);
      const saved = await this.save(manager, manager.create(Squadron, { ...body, shipId }));
      const view = toSquadronView(saved);
      await this.audit.record(manager, {
        action: 'squadron.created',
        subject: { type: 'squadron', id: saved.id },
        shipId,
        summary: `Squadron ${saved.code} added`,
        after: { ...view },
      });
      return view;
    });
  }

  async update(scope: ShipScope, id: number, body: UpdateSquadronDto): Promise<SquadronView> {
    return this.dataSource.transaction(async (manager) => {
      const squadron = await this.findOrFail(manager, scope, id);
      if (body.code !== undefined) await this.checkCodeFree(manager, body.code, id);
      const before = toSquadronView(squadron);
      const after = toSquadronView(await this.save(manager, Object.assign(squadron, definedFields(body))));
      await this.audit.record(manager, {
        action: 'squadron.updated',
        subject: { type: 'squadron', id },
        shipId: squadron.shipId,
        summary: `Squadron ${after.code} changed`,
        before: { ...before },
        after: { ...after },
      });
      return after;
    });
  }

  async remove(scope: ShipScope, id: number): Promise<void> {
    await this.dataSource.transaction(async (manager) => {
      const squadron = await this.findOrFail(manager, scope, id);
      const aircraft = await manager.countBy(Aircraft, { squadronId: id });
      if (aircraft > 0) throw this.inUse(squadron, aircraft);
      try {
        await manager.delete(Squadron, { id });
      } catch (error) {
        if (isStillReferenced(error)) throw this.inUse(squadron, await manager.countBy(Aircraft, { squadronId: id }));
        throw error;
      }
      await this.audit.record(manager, {
        action: 'squadron.deleted',
        subject: { type: 'squadron', id },
        shipId: squadron.shipId,
        summary: `Squadron ${squadron.code} deleted`,
        before: { ...toSquadronView(squadron) },
      });
    });
    this.logger.log(`Squadron ${id} deleted`);
  }

  private async findOrFail(manager: EntityManager, scope: ShipScope, id: number): Promise<Squadron> {
    const squadron = await manager.findOne(Squadron, {
      where: { id, ...shipWhere(scope) },
      lock: { mode: 'pessimistic_write' },
    });
    if (!squadron) throw noSquadron(id);
    return squadron;
  }

  private async checkCodeFree(manager: EntityManager, code: string, exceptId?: number): Promise<void> {
    const where = exceptId === undefined ? { code } : { code, id: Not(exceptId) };
    if (await manager.existsBy(Squadron, where)) throw this.codeTaken(code);
  }

  /** A save racing another past checkCodeFree still ends in the readable 409. */
  private async save(manager: EntityManager, squadron: Squadron): Promise<Squadron> {
    try {
      return await manager.save(Squadron, squadron);
    } catch (error) {
      if (isDuplicateKey(error)) throw this.codeTaken(squadron.code);
      throw error;
    }
  }

  private codeTaken(code: string): SquadronsException {
    return new SquadronsException('code_taken', `Another squadron already uses the code ${code}.`);
  }

  private inUse(squadron: Squadron, aircraft: number): SquadronsException {
    return new SquadronsException(
      'squadron_in_use',
      `Squadron ${squadron.code} still has ${aircraft} aircraft; move or delete them before deleting the squadron.`,
    );
  }
}
