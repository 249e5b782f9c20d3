import { READINESS_STEPS, type ReadinessStep, type SlotStatus } from '@catline/contracts';
import { In, type EntityManager } from 'typeorm';
import type { Catapult } from '../database/entities/catapult.entity.js';
import { Slot } from '../database/entities/slot.entity.js';
import { ShipsException } from './ships.exception.js';
import { statusWords } from '../common/wording.js';

/**
 * Refuses a new list of readiness steps while an aircraft of the launching cycle stands at a step its catapult
 * would no longer run: it would be stranded there, with no next step to take. Catline's choice over moving
 * it back to an earlier step: the crew has checked what that step stands for, and a list changed under an
 * aircraft on the catapult is a change to finish with the crew, not behind their back. A cycle stopped
 * before its end takes no steps; its aircraft resume from the catapult (suspend, resume) if it starts again.
 *
 * @param stepsOf the list each of `catapults` would run after the change
 */
export async function refuseStrandingSteps(
  manager: EntityManager,
  shipId: number,
  catapults: readonly Catapult[],
  stepsOf: (catapult: Catapult) => readonly ReadinessStep[],
): Promise<void> {
  if (catapults.length === 0) return;
  const standing = await manager.find(Slot, {
    where: {
      cycle: { shipId, state: 'executing' },
      catapultId: In(catapults.map((catapult) => catapult.id)),
      status: In<SlotStatus>([...READINESS_STEPS]),
    },
    relations: { aircraft: true },
    order: { id: 'ASC' },
  });
  const stranded = standing.flatMap((slot) => {
    const catapult = catapults.find((candidate) => candidate.id === slot.catapultId)!;
    return stepsOf(catapult).includes(slot.status as ReadinessStep)
      ? []
      : [`${slot.aircraft.sideNumber} on cat ${catapult.number} is at "${statusWords(slot.status)}"`];
  });
  if (stranded.length > 0) {
    throw new ShipsException(
      'readiness_step_in_use',
      `The new list leaves out a step an aircraft stands at: ${stranded.join('; ')}. Take it past that step, or change the list once it has launched.`,
    );
  }
}
