import type { ChangeActor, LineupCommandResult } from '@catline/contracts';
import { Injectable } from '@nestjs/common';
import { BasisChecks } from '../cycle-changes/basis-checks.service.js';
import { Clock } from '../cycle-changes/clock.js';
import { CycleChangeService } from '../cycle-changes/cycle-change.service.js';
import { launchPrerequisitesOf } from '../cycle-changes/launch-prerequisites.js';
import { LineupException } from '../cycle-changes/lineup.exception.js';
import { Cycle } from '../database/entities/cycle.entity.js';
import { CyclesException } from './cycles.exception.js';
import type { SetLaunchPrerequisiteDto } from './dto/set-launch-prerequisite.dto.js';

/** The air boss ticks the ship's launch prerequisites of a cycle, each a versioned change with who and when. */
@Injectable()
export class LaunchPrerequisitesService {
  constructor(
    private readonly changes: CycleChangeService,
    private readonly basis: BasisChecks,
    private readonly clock: Clock,
  ) {}

  /** `number` is the prerequisite's place in the ship profile's list, from 1. */
  set(
    cycleId: number,
    actor: ChangeActor,
    number: number,
    request: SetLaunchPrerequisiteDto,
  ): Promise<LineupCommandResult> {
    return this.changes.apply(cycleId, actor, 'launch_prerequisite_set', async (manager, state) => {
      this.basis.requireOpen(state);
      await this.basis.cycleAsSeen(manager, state, request.basisVersion);
      const prerequisite = launchPrerequisitesOf(state.cycle, state.ship.profile)[number - 1];
      if (!prerequisite) {
        throw new CyclesException('not_found', `The ship has no launch prerequisite number ${number}.`);
      }
      if (state.cycle.state !== 'planning') {
        throw new CyclesException(
          'wrong_state',
          `Cycle ${state.cycle.number} is ${state.cycle.state}; prerequisites are ticked before launching starts.`,
        );
      }
      if (prerequisite.ticked === request.ticked) {
        throw new LineupException(
          'no_change',
          `${prerequisite.name} already is ${request.ticked ? 'ticked' : 'not ticked'}.`,
        );
      }
      const others = (state.cycle.prerequisiteTicks ?? []).filter((tick) => tick.name !== prerequisite.name);
      const prerequisiteTicks = request.ticked
        ? [...others, { name: prerequisite.name, tickedBy: actor.name, tickedAt: this.clock.now().toISOString() }]
        : others;
      await manager.update(Cycle, { id: cycleId }, { prerequisiteTicks });
      return {
        summary: `Launch prerequisite ${request.ticked ? 'ticked' : 'no longer ticked'}: ${prerequisite.name}`,
        command: { type: 'launch_prerequisite', number, ...request },
      };
    });
  }
}
