import { shipTime, shipTimeZone, type ChangeActor, type LineupCommandResult } from '@catline/contracts';
import { Injectable } from '@nestjs/common';
import type { EntityManager } from 'typeorm';
import { Aircraft } from '../database/entities/aircraft.entity.js';
import { BasisChecks } from '../cycle-changes/basis-checks.service.js';
import { Clock } from '../cycle-changes/clock.js';
import { CycleChangeService } from '../cycle-changes/cycle-change.service.js';
import { dropBackForReverify } from '../cycle-changes/reverify-drop-back.js';
import { Slot } from '../database/entities/slot.entity.js';
import type { LineupState } from '../cycle-changes/lineup-state.js';
import { startingPositions } from '../cycle-changes/starting-positions.js';
import { LineupException } from '../cycle-changes/lineup.exception.js';
import { launchPrerequisitesOf } from '../cycle-changes/launch-prerequisites.js';
import { User } from '../database/entities/user.entity.js';
import { CycleClosing } from './cycle-closing.service.js';
import { checkStartInWindow, checkWindow } from './cycle-window.js';
import { startLaunching } from './launching-rule.js';
import { nightOf, windReading } from './cycle-sky.js';
import { CyclesException } from './cycles.exception.js';
import type { AddSlotDto } from './dto/add-slot.dto.js';
import type { StartCycleDto } from './dto/start-cycle.dto.js';
import type { UpdateCycleConditionsDto } from './dto/update-cycle-conditions.dto.js';
import { Cycle } from '../database/entities/cycle.entity.js';

type ConditionValues = Partial<Cycle>;

const figure = (value: number) => String(Number(value.toFixed(1)));

/** "wind 250° 18 kt, lull 14 gust 24": the spread only where it differs from the steady wind. */
function describeWind(cycle: Cycle): string {
  const spread = [
    cycle.windLullKt !== cycle.trueWindSpeedKt && `lull ${figure(cycle.windLullKt)}`,
    cycle.windGustKt !== cycle.trueWindSpeedKt && `gust ${figure(cycle.windGustKt)}`,
  ].filter(Boolean);
  const steady = `wind ${figure(cycle.trueWindFromDeg)}° ${figure(cycle.trueWindSpeedKt)} kt`;
  return spread.length ? `${steady}, ${spread.join(' ')}` : steady;
}

/** One short account of what changed in the conditions, e.g. "wind 250° 18 kt, case II". */
function describeConditions(values: ConditionValues, cycle: Cycle, timeZone: string): string {
  const merged = { ...cycle, ...values };
  const clock = (instant: Date) => shipTime(instant, timeZone);
  const parts: string[] = [];
  const changed = (...keys: (keyof ConditionValues)[]) => keys.some((key) => key in values);
  if (changed('shipCourseDeg', 'shipSpeedKt')) parts.push(`ship ${merged.shipCourseDeg}° ${merged.shipSpeedKt} kt`);
  if (changed('windReadAt', 'trueWindFromDeg', 'trueWindSpeedKt')) parts.push(describeWind(merged));
  if (changed('temperatureC')) parts.push(`${merged.temperatureC} °C`);
  if (changed('pressureHpa')) parts.push(`${merged.pressureHpa} hPa`);
  if (changed('weatherCase')) parts.push(`case ${merged.weatherCase}`);
  if (changed('latitudeDeg', 'longitudeDeg')) parts.push(`position ${merged.latitudeDeg}°, ${merged.longitudeDeg}°`);
  if (changed('night')) parts.push(merged.night ? 'night' : 'day');
  if (changed('plannedLaunchAt')) parts.push(`planned launch ${clock(merged.plannedLaunchAt)}`);
  if (changed('windowStartAt', 'windowEndAt'))
    parts.push(`window ${clock(merged.windowStartAt)} to ${clock(merged.windowEndAt)}`);
  return parts.join(', ');
}

/** The values that differ from the cycle's. */
function differing(values: Record<string, unknown>, cycle: Cycle): ConditionValues {
  return Object.fromEntries(
    Object.entries(values).filter(([key, value]) => {
      // The DTO instance holds every declared field, the ones left out as undefined.
      if (value === undefined) return false;
      const current = cycle[key as keyof Cycle];
      return value instanceof Date && current instanceof Date
        ? value.getTime() !== current.getTime()
        : value !== current;
    }),
  ) as ConditionValues;
}

/**
 * The conditions the request changes, instants as dates. A wind reading (either frame) becomes the true
 * wind, gust and lull the cycle keeps, and is new even when the figures are the same: it is taken now.
 * The night follows the sun where the cycle has a position.
 */
function changedConditions(
  request: UpdateCycleConditionsDto,
  cycle: Cycle,
  timeZone: string,
  now: Date,
): ConditionValues {
  const {
    basisVersion: _basis,
    plannedLaunchAt,
    windowStartAt,
    windowEndAt,
    relativeWindBearingDeg: _bearing,
    relativeWindSpeedKt: _relativeSpeed,
    trueWindFromDeg: _from,
    trueWindSpeedKt: _speed,
    windGustKt: _gust,
    windLullKt: _lull,
    windReadAt: _readAt,
    night: _night,
    ...figures
  } = request;
  const values: Record<string, unknown> = { ...figures };
  const times = { plannedLaunchAt, windowStartAt, windowEndAt };
  for (const [key, value] of Object.entries(times)) if (value !== undefined) values[key] = new Date(value);
  const changed = differing(values, cycle);
  const wind = windReading(request, { ...cycle, ...changed }, now);
  const withWind = wind ? { ...changed, ...differing(wind, cycle), windReadAt: wind.windReadAt } : changed;
  const night = nightOf({ ...cycle, ...withWind }, request.night, timeZone);
  return night === cycle.night ? withWind : { ...withWind, night };
}

/** Air operations' changes to a cycle; each is a versioned change like a lineup command. */
@Injectable()
export class CycleCommandsService {
  constructor(
    private readonly changes: CycleChangeService,
    private readonly basis: BasisChecks,
    private readonly closing: CycleClosing,
    private readonly clock: Clock,
  ) {}

  updateConditions(
    cycleId: number,
    actor: ChangeActor,
    request: UpdateCycleConditionsDto,
  ): Promise<LineupCommandResult> {
    return this.changes.apply(cycleId, actor, 'conditions_changed', async (manager, state) => {
      this.basis.requireOpen(state);
      await this.basis.cycleAsSeen(manager, state, request.basisVersion);
      const timeZone = shipTimeZone(state.ship.profile);
      const values = changedConditions(request, state.cycle, timeZone, this.clock.now());
      if (Object.keys(values).length === 0) {
        throw new LineupException('no_change', 'The conditions already are as given; nothing changed.');
      }
      checkWindow({ ...state.cycle, ...values });
      await manager.update(Cycle, { id: cycleId }, values);
      const reverify = await this.reverifyFor(manager, state, values, actor);
      return {
        summary: `Conditions: ${describeConditions(values, state.cycle, timeZone)}${reverify}`,
        command: { type: 'conditions', ...request },
      };
    });
  }

  /** A new wind or ship's speed moves the figures under every agreed weight: those aircraft re-verify. */
  private async reverifyFor(manager: EntityManager, state: LineupState, values: ConditionValues, actor: ChangeActor) {
    const changed = (...keys: (keyof ConditionValues)[]) => keys.some((key) => key in values);
    const now = this.clock.now();
    if (changed('shipCourseDeg', 'trueWindFromDeg', 'trueWindSpeedKt', 'windLullFromDeg', 'windLullKt'))
      return dropBackForReverify(manager, state, 'wind', actor, now);
    if (changed('shipSpeedKt')) return dropBackForReverify(manager, state, 'ship_speed', actor, now);
    return '';
  }

  /**
   * The air boss starts launching once every launch prerequisite is ticked: one launching cycle per ship,
   * and outside the window only once confirmed.
   */
  start(cycleId: number, actor: ChangeActor, request: StartCycleDto): Promise<LineupCommandResult> {
    return this.changes.apply(cycleId, actor, 'cycle_started', async (manager, state) => {
      await this.basis.cycleAsSeen(manager, state, request.basisVersion);
      if (state.cycle.state !== 'planning') {
        throw new CyclesException(
          'wrong_state',
          `Cycle ${state.cycle.number} is ${state.cycle.state}; only a cycle in planning can start.`,
        );
      }
      const unticked = launchPrerequisitesOf(state.cycle, state.ship.profile).filter((item) => !item.ticked);
      if (unticked.length > 0) {
        throw new CyclesException(
          'prerequisites_not_ticked',
          `Launching cannot start until the air boss ticks every launch prerequisite; not ticked: ${unticked.map((item) => item.name).join(', ')}.`,
        );
      }
      const now = this.clock.now();
      checkStartInWindow(state.cycle, now, request.confirmOutsideWindow === true, shipTimeZone(state.ship.profile));
      await startLaunching(manager, state.cycle);
      const inWindow = now >= state.cycle.windowStartAt && now <= state.cycle.windowEndAt;
      return {
        summary: `Cycle ${state.cycle.number} started${inWindow ? '' : ', outside its window (confirmed)'}`,
        command: { type: 'start', ...request },
      };
    });
  }

  /** The air boss stops launching: the cycle goes back to planning, and another cycle of the ship may start. */
  stop(cycleId: number, actor: ChangeActor, basisVersion: number): Promise<LineupCommandResult> {
    return this.changes.apply(cycleId, actor, 'cycle_stopped', async (manager, state) => {
      await this.basis.cycleAsSeen(manager, state, basisVersion);
      if (state.cycle.state !== 'executing') {
        throw new CyclesException(
          'wrong_state',
          `Cycle ${state.cycle.number} is ${state.cycle.state}; only a launching cycle can stop.`,
        );
      }
      await manager.update(Cycle, { id: cycleId }, { state: 'planning' });
      return { summary: `Cycle ${state.cycle.number}: launching stopped`, command: { type: 'stop', basisVersion } };
    });
  }

  close(cycleId: number, actor: ChangeActor, basisVersion: number): Promise<LineupCommandResult> {
    return this.changes.apply(cycleId, actor, 'cycle_closed', async (manager, state) => {
      this.basis.requireOpen(state);
      await this.basis.cycleAsSeen(manager, state, basisVersion);
      const scratched = await this.closing.close(manager, state);
      const rest = scratched === 0 ? '' : `; ${scratched} aircraft not launched scratched`;
      return { summary: `Cycle ${state.cycle.number} closed${rest}`, command: { type: 'close', basisVersion } };
    });
  }

  addSlot(cycleId: number, actor: ChangeActor, request: AddSlotDto): Promise<LineupCommandResult> {
    return this.changes.apply(cycleId, actor, 'slot_added', async (manager, state) => {
      this.basis.requireOpen(state);
      const aircraft = await manager.findOne(Aircraft, {
        where: { id: request.aircraftId, shipId: state.cycle.shipId },
        relations: { type: true },
      });
      if (!aircraft) throw new CyclesException('not_found', `Aircraft ${request.aircraftId} does not exist.`);
      const side = aircraft.sideNumber;
      if (state.slots.some((slot) => slot.aircraftId === aircraft.id)) {
        throw new CyclesException('aircraft_already_in_cycle', `${side} is already in cycle ${state.cycle.number}.`);
      }
      if (!aircraft.serviceable)
        throw new CyclesException('aircraft_unserviceable', `${side} is marked unserviceable.`);
      const pilotId = request.pilotId ?? null;
      if (pilotId !== null) await this.checkPilot(manager, state, pilotId);
      const start = (await startingPositions(manager, state, [aircraft.id])).get(aircraft.id);
      await manager.insert(Slot, {
        ...start,
        cycleId,
        aircraftId: aircraft.id,
        pilotId,
        mission: request.mission,
        fuelLb: request.fuelLb,
        stores: request.stores,
        grossWeightLb: request.grossWeightLb,
        tanker: request.tanker,
        earlyWarning: request.earlyWarning,
        spare: request.spare,
      });
      return {
        summary: `${side} (${aircraft.type.designation}) added to the deck pool${request.spare ? ' as a spare' : ''}`,
        command: { type: 'add_slot', ...request },
      };
    });
  }

  private async checkPilot(manager: EntityManager, state: LineupState, pilotId: number): Promise<void> {
    const pilot = await manager.findOneBy(User, { id: pilotId, shipId: state.cycle.shipId });
    if (!pilot || pilot.role !== 'pilot' || !pilot.active) {
      throw new CyclesException('invalid_pilot', `Person ${pilotId} is not an active pilot.`);
    }
    const flying = state.slots.find(
      (slot) => slot.pilotId === pilotId && slot.status !== 'down' && slot.status !== 'scratched',
    );
    if (flying) {
      throw new CyclesException(
        'pilot_already_assigned',
        `${pilot.name} already flies ${flying.aircraft.sideNumber} in cycle ${state.cycle.number}.`,
      );
    }
  }
}
