import type { AircraftView, Page } from '@catline/contracts';
import { Injectable, Logger } from '@nestjs/common';
import { InjectDataSource } from '@nestjs/typeorm';
import { type DataSource, type EntityManager, Not } from 'typeorm';
import { AuditTrail } from '../audit/audit-trail.service.js';
import { definedFields } from '../common/defined-fields.js';
import { pageOf, type PageWindow } from '../common/paging/page-query.dto.js';
import { type ShipScope, shipWhere } from '../common/ship-scope.js';
import { AircraftType } from '../database/entities/aircraft-type.entity.js';
import { isDuplicateKey, isStillReferenced } from '../common/errors/database-errors.js';
import { Slot } from '../database/entities/slot.entity.js';
import { Ship } from '../database/entities/ship.entity.js';
import { Squadron } from '../database/entities/squadron.entity.js';
import { toAircraftView } from './aircraft.mapper.js';
import { AircraftException } from './aircraft.exception.js';
import type { CreateAircraftDto } from './dto/create-aircraft.dto.js';
import type { UpdateAircraftDto } from './dto/update-aircraft.dto.js';
import { Aircraft } from '../database/entities/aircraft.entity.js';

const WITH_NAMES = { type: true, squadron: true } as const;

const noAircraft = (id: number) => new AircraftException('aircraft_not_found', `There is no aircraft with id ${id}.`);

@Injectable()
export class AircraftService {
  private readonly logger = new Logger(AircraftService.name);

  constructor(
    @InjectDataSource() private readonly dataSource: DataSource,
    private readonly audit: AuditTrail,
  ) {}

  async list(scope: ShipScope, window: PageWindow): Promise<Page<AircraftView>> {
    const [aircraft, total] = await this.dataSource.manager.findAndCount(Aircraft, {
      where: shipWhere(scope),
      relations: WITH_NAMES,
      order: { sideNumber: 'ASC', id: 'ASC' },
      take: window.limit,
      skip: window.offset,
    });
    return pageOf(window, aircraft.map(toAircraftView), total);
  }

  async get(scope: ShipScope, id: number): Promise<AircraftView> {
    const aircraft = await this.dataSource.manager.findOne(Aircraft, {
      where: { id, ...shipWhere(scope) },
      relations: WITH_NAMES,
    });
    if (!aircraft) throw noAircraft(id);
    return toAircraftView(aircraft);
  }

  /** The aircraft goes to its squadron's ship. */
  async create(scope: ShipScope, body: CreateAircraftDto): Promise<AircraftView> {
    return this.dataSource.transaction(async (manager) => {
      const squadron = await manager.findOneBy(Squadron, { id: body.squadronId, ...shipWhere(scope) });
      if (!squadron) throw this.unknownSquadron(body.squadronId);
      await this.checkReferences(manager, squadron.shipId, body);
      const saved = await this.save(
        manager,
        manager.create(Aircraft, { ...body, shipId: squadron.shipId, serviceable: body.serviceable ?? true }),
      );
      this.logger.log(`Aircraft ${saved.sideNumber} added`);
      const view = await this.view(manager, saved.id);
      await this.audit.record(manager, {
        action: 'aircraft.created',
        subject: { type: 'aircraft', id: saved.id },
        shipId: saved.shipId,
        summary: `Aircraft ${saved.sideNumber} added`,
        after: { ...view },
      });
      return view;
    });
  }

  async update(scope: ShipScope, id: number, body: UpdateAircraftDto): Promise<AircraftView> {
    return this.dataSource.transaction(async (manager) => {
      const aircraft = await this.findOrFail(manager, scope, id);
      await this.checkReferences(manager, aircraft.shipId, body, id);
      const before = await this.view(manager, id);
      await this.save(manager, Object.assign(aircraft, definedFields(body)));
      const after = await this.view(manager, id);
      await this.audit.record(manager, {
        action: 'aircraft.updated',
        subject: { type: 'aircraft', id },
        shipId: aircraft.shipId,
        summary: `Aircraft ${after.sideNumber} changed`,
        before: { ...before },
        after: { ...after },
      });
      return after;
    });
  }

  async remove(scope: ShipScope, id: number): Promise<void> {
    await this.dataSource.transaction(async (manager) => {
      const aircraft = await this.findOrFail(manager, scope, id);
      const inUse = () => manager.countBy(Slot, { aircraftId: id });
      const slots = await inUse();
      if (slots > 0) throw this.inUse(aircraft, slots);
      try {
        await manager.delete(Aircraft, { id });
      } catch (error) {
        if (isStillReferenced(error)) throw this.inUse(aircraft, await inUse());
        throw error;
      }
      await this.audit.record(manager, {
        action: 'aircraft.deleted',
        subject: { type: 'aircraft', id },
        shipId: aircraft.shipId,
        summary: `Aircraft ${aircraft.sideNumber} deleted`,
        before: { sideNumber: aircraft.sideNumber, typeId: aircraft.typeId, squadronId: aircraft.squadronId },
      });
    });
    this.logger.log(`Aircraft ${id} deleted`);
  }

  private async view(manager: EntityManager, id: number): Promise<AircraftView> {
    return toAircraftView(await manager.findOneOrFail(Aircraft, { where: { id }, relations: WITH_NAMES }));
  }

  private async findOrFail(manager: EntityManager, scope: ShipScope, id: number): Promise<Aircraft> {
    const aircraft = await manager.findOne(Aircraft, {
      where: { id, ...shipWhere(scope) },
      lock: { mode: 'pessimistic_write' },
    });
    if (!aircraft) throw noAircraft(id);
    return aircraft;
  }

  /** The type, squadron and deck spot must all be of the aircraft's ship. */
  private async checkReferences(
    manager: EntityManager,
    shipId: number,
    body: Partial<CreateAircraftDto>,
    exceptId?: number,
  ): Promise<void> {
    if (body.sideNumber !== undefined) {
      const where =
        exceptId === undefined ? { sideNumber: body.sideNumber } : { sideNumber: body.sideNumber, id: Not(exceptId) };
      if (await manager.existsBy(Aircraft, where)) throw this.sideNumberTaken(body.sideNumber);
    }
    if (body.typeId !== undefined && !(await manager.existsBy(AircraftType, { id: body.typeId, shipId }))) {
      throw new AircraftException('unknown_reference', `There is no aircraft type with id ${body.typeId}.`);
    }
    if (body.squadronId !== undefined && !(await manager.existsBy(Squadron, { id: body.squadronId, shipId }))) {
      throw this.unknownSquadron(body.squadronId);
    }
    if (body.parkedSpot !== undefined) {
      const spots = (await manager.findOneByOrFail(Ship, { id: shipId })).deckSpots.map((spot) => spot.name);
      if (!spots.includes(body.parkedSpot)) {
        throw new AircraftException(
          'unknown_reference',
          `There is no deck spot named ${body.parkedSpot}; pick one of ${spots.join(', ')}.`,
        );
      }
    }
  }

  /** A save racing another past checkReferences still ends in the readable 409. */
  private async save(manager: EntityManager, aircraft: Aircraft): Promise<Aircraft> {
    try {
      return await manager.save(Aircraft, aircraft);
    } catch (error) {
      if (isDuplicateKey(error)) throw this.sideNumberTaken(aircraft.sideNumber);
      throw error;
    }
  }

  private unknownSquadron(id: number): AircraftException {
    return new AircraftException('unknown_reference', `There is no squadron with id ${id}.`);
  }

  private sideNumberTaken(sideNumber: string): AircraftException {
    return new AircraftException(
      'side_number_taken',
      `Side number ${sideNumber} is already taken by another aircraft.`,
    );
  }

  private inUse(aircraft: Aircraft, slots: number): AircraftException {
    return new AircraftException(
      'aircraft_in_use',
      `Aircraft ${aircraft.sideNumber} appears in ${slots} cycle lineup(s), which keep its record; mark it unserviceable instead of deleting it.`,
    );
  }
}
