import type { CatapultView, ReplaceDeckLayoutRequest, ShipView } from '@catline/contracts';
import { DEFAULT_READINESS_STEPS, readinessStepsProblem } from '@catline/launch-math';
import { Injectable, Logger } from '@nestjs/common';
import { InjectDataSource } from '@nestjs/typeorm';
import type { DataSource, EntityManager } from 'typeorm';
import type { AuthenticatedUser } from '../common/authenticated-user.js';
import { CycleChangeService, actorOf } from '../cycle-changes/cycle-change.service.js';
import { Cycle } from '../database/entities/cycle.entity.js';
import { AuditTrail } from '../audit/audit-trail.service.js';
import { definedFields } from '../common/defined-fields.js';
import { type ShipScope, inShipScope } from '../common/ship-scope.js';
import { deckLayoutData } from '../cycle-changes/deck-positions.js';
import { checkDeck } from './deck-layout-check.js';
import type { UpdateCatapultDto } from './dto/update-catapult.dto.js';
import type { UpdateShipDto } from './dto/update-ship.dto.js';
import { Catapult } from '../database/entities/catapult.entity.js';
import { Ship } from '../database/entities/ship.entity.js';
import { toCatapultView, toShipView } from './ship.mapper.js';
import { shipNotFound } from './owner-ship.js';
import { ShipsException } from './ships.exception.js';
import { refuseStrandingSteps } from './readiness-steps-in-use.js';

/** What PATCH /ships/:id changes; the catapults and the deck layout have audited routes of their own. */
function shipFields({ name, hullCode, pairGapS, profile, deckSpots }: ShipView) {
  return { name, hullCode, pairGapS, profile, deckSpots };
}

@Injectable()
export class ShipsService {
  private readonly logger = new Logger(ShipsService.name);

  constructor(
    @InjectDataSource() private readonly dataSource: DataSource,
    private readonly audit: AuditTrail,
    private readonly changes: CycleChangeService,
  ) {}

  async list(scope: ShipScope): Promise<ShipView[]> {
    const ships = await this.dataSource.manager.find(Ship, {
      where: scope.shipId === null ? {} : { id: scope.shipId },
      relations: { catapults: true },
      order: { id: 'ASC' },
    });
    return ships.map((ship) => toShipView(ship, ship.catapults));
  }

  async get(scope: ShipScope, id: number): Promise<ShipView> {
    this.checkScope(scope, id);
    const ship = await this.dataSource.manager.findOne(Ship, { where: { id }, relations: { catapults: true } });
    if (!ship) throw shipNotFound(id);
    return toShipView(ship, ship.catapults);
  }

  async update(caller: AuthenticatedUser, id: number, body: UpdateShipDto): Promise<ShipView> {
    this.checkScope(caller, id);
    const write = async (manager: EntityManager) => {
      const ship = await manager.findOne(Ship, { where: { id }, lock: { mode: 'pessimistic_write' } });
      if (!ship) throw shipNotFound(id);
      const catapults = await manager.findBy(Catapult, { shipId: id });
      if (body.deckSpots) await checkDeck(manager, ship, body.deckSpots, deckLayoutData(ship, catapults), catapults);
      const stepsProblem = body.profile?.readinessSteps && readinessStepsProblem(body.profile.readinessSteps);
      if (stepsProblem) throw new ShipsException('invalid_configuration', stepsProblem);
      if (body.profile) {
        // The catapults without a list of their own run the ship's.
        const shipSteps = body.profile.readinessSteps ?? DEFAULT_READINESS_STEPS;
        const following = catapults.filter((catapult) => catapult.readinessSteps === null);
        await refuseStrandingSteps(manager, id, following, () => shipSteps);
      }
      const before = shipFields(toShipView(ship, catapults));
      Object.assign(ship, definedFields(body));
      await manager.save(Ship, ship);
      const after = toShipView(ship, catapults);
      await this.audit.record(manager, {
        action: 'ship.updated',
        subject: { type: 'ship', id },
        shipId: id,
        summary: `Ship ${ship.name} changed`,
        before,
        after: shipFields(after),
      });
      return after;
    };
    const view = body.profile
      ? await this.underLaunchingCycle(caller, id, write, () => 'The ship profile changed')
      : await this.dataSource.transaction(write);
    this.logger.log(`Ship ${id} updated (${Object.keys(definedFields(body)).join(', ') || 'nothing'})`);
    return view;
  }

  /** The whole deck at once: spots, elevators, hangar bays and the landing area's catapults. */
  async replaceDeckLayout(scope: ShipScope, id: number, body: ReplaceDeckLayoutRequest): Promise<ShipView> {
    this.checkScope(scope, id);
    const { deckSpots, elevators, hangarBays, landingAreaCatapults } = body;
    const layout = { elevators, hangarBays, landingAreaCatapults };
    const view = await this.dataSource.transaction(async (manager) => {
      const ship = await manager.findOne(Ship, { where: { id }, lock: { mode: 'pessimistic_write' } });
      if (!ship) throw shipNotFound(id);
      const catapults = await manager.findBy(Catapult, { shipId: id });
      await checkDeck(manager, ship, deckSpots, layout, catapults);
      const before = toShipView(ship, catapults);
      Object.assign(ship, { deckSpots, deckLayout: layout });
      await manager.save(Ship, ship);
      const after = toShipView(ship, catapults);
      await this.audit.record(manager, {
        action: 'deck_layout.replaced',
        subject: { type: 'ship', id },
        shipId: id,
        summary: `Deck layout of ${ship.name} replaced`,
        before: { deckSpots: before.deckSpots, deckLayout: before.deckLayout },
        after: { deckSpots: after.deckSpots, deckLayout: after.deckLayout },
      });
      return after;
    });
    this.logger.log(`Ship ${id} deck layout replaced (${deckSpots.length} spots, ${elevators.length} elevators)`);
    return view;
  }

  async updateCatapult(
    caller: AuthenticatedUser,
    shipId: number,
    id: number,
    body: UpdateCatapultDto,
  ): Promise<CatapultView> {
    const write = async (manager: EntityManager) => {
      const catapult = await manager.findOne(Catapult, { where: { id, shipId }, lock: { mode: 'pessimistic_write' } });
      if (!catapult || !inShipScope(caller, shipId)) {
        throw new ShipsException('catapult_not_found', `Ship ${shipId} has no catapult with id ${id}.`);
      }
      const stepsProblem = body.readinessSteps && readinessStepsProblem(body.readinessSteps);
      if (stepsProblem)
        throw new ShipsException('invalid_configuration', `Catapult ${catapult.number}: ${stepsProblem}`);
      if (body.readinessSteps !== undefined) {
        // Null hands the catapult back to the ship's list.
        const ship = await manager.findOneByOrFail(Ship, { id: shipId });
        const steps = body.readinessSteps ?? ship.profile.readinessSteps ?? DEFAULT_READINESS_STEPS;
        await refuseStrandingSteps(manager, shipId, [catapult], () => steps);
      }
      const before = toCatapultView(catapult);
      Object.assign(catapult, definedFields(body));
      if (catapult.energyMaxMj <= catapult.energyMinMj) {
        throw new ShipsException(
          'invalid_configuration',
          `The highest energy (${catapult.energyMaxMj} MJ) must be above the lowest (${catapult.energyMinMj} MJ).`,
        );
      }
      await manager.save(Catapult, catapult);
      const after = toCatapultView(catapult);
      await this.audit.record(manager, {
        action: 'catapult.updated',
        subject: { type: 'catapult', id },
        shipId,
        summary: `Catapult ${catapult.number} changed`,
        before: { ...before },
        after: { ...after },
      });
      return after;
    };
    if (body.readinessSteps === undefined || !inShipScope(caller, shipId)) return this.dataSource.transaction(write);
    return this.underLaunchingCycle(caller, shipId, write, (view) =>
      view.readinessSteps
        ? `Cat ${view.number} runs its own readiness steps: ${view.readinessSteps.join(', ').replaceAll('_', ' ')}`
        : `Cat ${view.number} runs the ship's readiness steps`,
    );
  }

  /**
   * A write that changes what the lanes run, made inside a change of the ship's launching cycle when it has
   * one: under the cycle's lock no aircraft takes a step meanwhile, and the change carries the lanes' new
   * lists to every station and board live. Without a launching cycle, a plain transaction.
   */
  private async underLaunchingCycle<T>(
    caller: AuthenticatedUser,
    shipId: number,
    write: (manager: EntityManager) => Promise<T>,
    summary: (written: T) => string,
  ): Promise<T> {
    const launching = await this.dataSource.manager.findOne(Cycle, {
      where: { shipId, state: 'executing' },
      select: { id: true },
    });
    if (!launching) return this.dataSource.transaction(write);
    let written: T | undefined;
    await this.changes.apply(launching.id, actorOf(caller), 'readiness_steps_changed', async (manager) => {
      written = await write(manager);
      return {
        summary: summary(written),
        command: { type: 'readiness_steps_changed', shipId },
        mirrored: false,
      };
    });
    return written!;
  }

  /** Another ship is answered as one that does not exist. */
  private checkScope(scope: ShipScope, id: number): void {
    if (!inShipScope(scope, id)) throw shipNotFound(id);
  }
}
