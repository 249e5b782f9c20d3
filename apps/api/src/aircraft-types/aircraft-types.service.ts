import {
  type AircraftTypeView,
  DEFAULT_AIRCRAFT_CLASS,
  type LaunchTableRow,
  type SettingTable,
  type StoresItem,
} from '@catline/contracts';
import { Injectable, Logger } from '@nestjs/common';
import { InjectDataSource } from '@nestjs/typeorm';
import { type DataSource, type EntityManager, Not } from 'typeorm';
import { AuditTrail } from '../audit/audit-trail.service.js';
import type { AuthenticatedUser } from '../common/authenticated-user.js';
import { actorOf } from '../cycle-changes/cycle-change.service.js';
import { definedFields } from '../common/defined-fields.js';
import { type ShipScope, shipWhere } from '../common/ship-scope.js';
import { ownerShip } from '../ships/owner-ship.js';
import { Aircraft } from '../database/entities/aircraft.entity.js';
import { Catapult } from '../database/entities/catapult.entity.js';
import { isDuplicateKey, isStillReferenced } from '../common/errors/database-errors.js';
import { toAircraftTypeView } from './aircraft-type.mapper.js';
import { AircraftTypesException } from './aircraft-types.exception.js';
import { LaunchDataReverify } from './launch-data-reverify.service.js';
import type { CreateAircraftTypeDto } from './dto/create-aircraft-type.dto.js';
import type { UpdateAircraftTypeDto } from './dto/update-aircraft-type.dto.js';
import { AircraftType } from '../database/entities/aircraft-type.entity.js';
import {
  launchTableProblems,
  orderedSettingTables,
  orderedStoresCatalogue,
  settingTableProblems,
  storesCatalogueProblems,
  trimBandProblems,
} from './launch-data.js';

/** Fields no launch figure rests on: changing them asks no crew to verify again. */
const FIELDS_OUTSIDE_THE_FIGURES = new Set(['designation', 'name', 'aircraftClass', 'holdbackElement']);

@Injectable()
export class AircraftTypesService {
  private readonly logger = new Logger(AircraftTypesService.name);

  constructor(
    @InjectDataSource() private readonly dataSource: DataSource,
    private readonly audit: AuditTrail,
    private readonly reverify: LaunchDataReverify,
  ) {}

  async list(scope: ShipScope): Promise<AircraftTypeView[]> {
    const types = await this.dataSource.manager.find(AircraftType, {
      where: shipWhere(scope),
      order: { designation: 'ASC' },
    });
    return types.map(toAircraftTypeView);
  }

  async get(scope: ShipScope, id: number): Promise<AircraftTypeView> {
    return toAircraftTypeView(await this.findOrFail(this.dataSource.manager, scope, id));
  }

  async create(scope: ShipScope, body: CreateAircraftTypeDto): Promise<AircraftTypeView> {
    this.checkLaunchData(trimBandProblems(body.trimBands), launchTableProblems(body.launchTable));
    const saved = await this.dataSource.transaction(async (manager) => {
      const shipId = await ownerShip(manager, scope, body.shipId);
      await this.checkDesignationFree(manager, body.designation);
      const type = manager.create(AircraftType, {
        ...body,
        shipId,
        aircraftClass: body.aircraftClass ?? DEFAULT_AIRCRAFT_CLASS,
        operatingWeightLb: body.operatingWeightLb ?? null,
        afterburnerFromLb: body.afterburnerFromLb ?? null,
        holdbackElement: body.holdbackElement ?? null,
        storesCatalogue: [],
        settingTables: [],
      });
      const created = await this.save(manager, type);
      await this.audit.record(manager, {
        action: 'aircraft_type.created',
        subject: { type: 'aircraft_type', id: created.id },
        shipId: created.shipId,
        summary: `Aircraft type ${created.designation} created`,
        after: { ...toAircraftTypeView(created) },
      });
      return created;
    });
    this.logger.log(`Aircraft type ${saved.designation} created`);
    return toAircraftTypeView(saved);
  }

  async update(caller: AuthenticatedUser, id: number, body: UpdateAircraftTypeDto): Promise<AircraftTypeView> {
    if (body.trimBands) this.checkLaunchData(trimBandProblems(body.trimBands), []);
    const updated = await this.dataSource.transaction(async (manager) => {
      const type = await this.findOrFail(manager, caller, id, true);
      if (body.designation !== undefined) await this.checkDesignationFree(manager, body.designation, id);
      const before = toAircraftTypeView(type);
      Object.assign(type, definedFields(body));
      const after = toAircraftTypeView(await this.save(manager, type));
      await this.audit.record(manager, {
        action: 'aircraft_type.updated',
        subject: { type: 'aircraft_type', id },
        shipId: type.shipId,
        summary: `Aircraft type ${after.designation} changed`,
        before: { ...before },
        after: { ...after },
      });
      return after;
    });
    if (Object.keys(definedFields(body)).some((field) => !FIELDS_OUTSIDE_THE_FIGURES.has(field)))
      await this.reverify.launchDataChanged(updated, 'The figures', actorOf(caller));
    return updated;
  }

  async replaceLaunchTable(caller: AuthenticatedUser, id: number, rows: LaunchTableRow[]): Promise<AircraftTypeView> {
    this.checkLaunchData([], launchTableProblems(rows));
    const replaced = await this.dataSource.transaction(async (manager) => {
      const type = await this.findOrFail(manager, caller, id, true);
      const before = type.launchTable;
      type.launchTable = rows;
      await manager.save(AircraftType, type);
      await this.audit.record(manager, {
        action: 'launch_table.replaced',
        subject: { type: 'aircraft_type', id },
        shipId: type.shipId,
        summary: `Launch table of ${type.designation} replaced (${rows.length} rows)`,
        before: { launchTable: before },
        after: { launchTable: rows },
      });
      this.logger.log(`Launch table of ${type.designation} replaced (${rows.length} rows)`);
      return toAircraftTypeView(type);
    });
    await this.reverify.launchDataChanged(replaced, 'The launch table', actorOf(caller));
    return replaced;
  }

  async replaceStoresCatalogue(scope: ShipScope, id: number, items: StoresItem[]): Promise<AircraftTypeView> {
    this.checkLaunchData(storesCatalogueProblems(items));
    const catalogue = orderedStoresCatalogue(items);
    return this.dataSource.transaction(async (manager) => {
      const type = await this.findOrFail(manager, scope, id, true);
      const before = type.storesCatalogue;
      type.storesCatalogue = catalogue;
      await manager.save(AircraftType, type);
      await this.audit.record(manager, {
        action: 'stores_catalogue.replaced',
        subject: { type: 'aircraft_type', id },
        shipId: type.shipId,
        summary: `Stores catalogue of ${type.designation} replaced (${catalogue.length} items)`,
        before: { storesCatalogue: before },
        after: { storesCatalogue: catalogue },
      });
      this.logger.log(`Stores catalogue of ${type.designation} replaced (${catalogue.length} items)`);
      return toAircraftTypeView(type);
    });
  }

  async replaceSettingTables(caller: AuthenticatedUser, id: number, tables: SettingTable[]): Promise<AircraftTypeView> {
    const ordered = orderedSettingTables(tables);
    const replaced = await this.dataSource.transaction(async (manager) => {
      const type = await this.findOrFail(manager, caller, id, true);
      const catapults = await manager.find(Catapult, { where: { shipId: type.shipId } });
      this.checkLaunchData(settingTableProblems(ordered, catapults));
      const before = type.settingTables;
      type.settingTables = ordered;
      await manager.save(AircraftType, type);
      await this.audit.record(manager, {
        action: 'setting_tables.replaced',
        subject: { type: 'aircraft_type', id },
        shipId: type.shipId,
        summary: `Approved setting tables of ${type.designation} replaced (${ordered.length} tables)`,
        before: { settingTables: before },
        after: { settingTables: ordered },
      });
      this.logger.log(`Approved setting tables of ${type.designation} replaced (${ordered.length} tables)`);
      return toAircraftTypeView(type);
    });
    await this.reverify.launchDataChanged(replaced, 'The approved setting tables', actorOf(caller));
    return replaced;
  }

  async remove(scope: ShipScope, id: number): Promise<void> {
    await this.dataSource.transaction(async (manager) => {
      const type = await this.findOrFail(manager, scope, id, true);
      const inUse = () => manager.countBy(Aircraft, { typeId: id });
      const count = await inUse();
      if (count > 0) throw this.inUse(type, count);
      try {
        await manager.delete(AircraftType, { id });
      } catch (error) {
        if (isStillReferenced(error)) throw this.inUse(type, await inUse());
        throw error;
      }
      await this.audit.record(manager, {
        action: 'aircraft_type.deleted',
        subject: { type: 'aircraft_type', id },
        shipId: type.shipId,
        summary: `Aircraft type ${type.designation} deleted`,
        before: { ...toAircraftTypeView(type) },
      });
    });
    this.logger.log(`Aircraft type ${id} deleted`);
  }

  private checkLaunchData(...problemLists: string[][]): void {
    const problems = problemLists.flat();
    if (problems.length > 0) {
      throw new AircraftTypesException('invalid_launch_data', `Invalid launch data: ${problems.join(' ')}`, problems);
    }
  }

  private async findOrFail(manager: EntityManager, scope: ShipScope, id: number, lock = false): Promise<AircraftType> {
    const type = await manager.findOne(AircraftType, {
      where: { id, ...shipWhere(scope) },
      ...(lock ? { lock: { mode: 'pessimistic_write' as const } } : {}),
    });
    if (!type) throw new AircraftTypesException('aircraft_type_not_found', `There is no aircraft type with id ${id}.`);
    return type;
  }

  private async checkDesignationFree(manager: EntityManager, designation: string, exceptId?: number): Promise<void> {
    const where = exceptId === undefined ? { designation } : { designation, id: Not(exceptId) };
    if (await manager.existsBy(AircraftType, where)) throw this.designationTaken(designation);
  }

  /** A save racing another past checkDesignationFree still ends in the readable 409. */
  private async save(manager: EntityManager, type: AircraftType): Promise<AircraftType> {
    try {
      return await manager.save(AircraftType, type);
    } catch (error) {
      if (isDuplicateKey(error)) throw this.designationTaken(type.designation);
      throw error;
    }
  }

  private designationTaken(designation: string): AircraftTypesException {
    return new AircraftTypesException(
      'designation_taken',
      `Another aircraft type is already designated ${designation}.`,
    );
  }

  private inUse(type: AircraftType, aircraft: number): AircraftTypesException {
    return new AircraftTypesException(
      'aircraft_type_in_use',
      `${aircraft} aircraft are of type ${type.designation}; change or delete them before deleting the type.`,
    );
  }
}
