import type { DeckPositionView } from '@catline/contracts';
import { In, LessThan, Not, type EntityManager } from 'typeorm';
import { Aircraft } from '../database/entities/aircraft.entity.js';
import { Slot } from '../database/entities/slot.entity.js';
import { deckPositionView, holdsPosition } from './deck-positions.js';
import type { LineupState } from './lineup-state.js';

const key = (position: DeckPositionView) => `${position.kind}:${position.name}`;

/**
 * Where aircraft joining a cycle start: where the ship's latest earlier cycle left them (one launched
 * in it, where that cycle's respot had it land), else on their parked spot; when another aircraft of
 * this cycle holds that spot or elevator already, in the ship's first hangar bay (a ship without one leaves them on the parked spot, as before positions were kept).
 */
export async function startingPositions(
  manager: EntityManager,
  state: LineupState,
  aircraftIds: readonly number[],
): Promise<Map<number, Pick<Slot, 'deckPositionKind' | 'deckPositionName'>>> {
  if (aircraftIds.length === 0) return new Map();
  const earlier = await manager.find(Slot, {
    where: {
      aircraftId: In([...aircraftIds]),
      deckPositionName: Not(''),
      cycle: { shipId: state.cycle.shipId, plannedLaunchAt: LessThan(state.cycle.plannedLaunchAt) },
    },
    relations: { cycle: true },
    order: { cycle: { plannedLaunchAt: 'DESC' }, id: 'DESC' },
  });
  const taken = new Set(state.slots.filter(holdsPosition).map((slot) => key(deckPositionView(slot))));
  const starts = new Map<number, Pick<Slot, 'deckPositionKind' | 'deckPositionName'>>();
  for (const slot of earlier) {
    if (starts.has(slot.aircraftId) || slot.cycleId === state.cycle.id) continue;
    // A recovered aircraft lands where its cycle's respot placed it.
    const landed =
      slot.status === 'launched' ? slot.cycle.respot?.targets.find((t) => t.slotId === slot.id) : undefined;
    const position = landed?.to ?? { kind: slot.deckPositionKind, name: slot.deckPositionName };
    if (position.kind !== 'hangar' && taken.has(key(position))) continue;
    taken.add(key(position));
    starts.set(slot.aircraftId, { deckPositionKind: position.kind, deckPositionName: position.name });
  }
  const bay = state.ship.deckLayout?.hangarBays[0]?.name;
  const parked = await manager.find(Aircraft, { where: { id: In(aircraftIds.filter((id) => !starts.has(id))) } });
  for (const aircraft of parked) {
    const spot = { kind: 'spot' as const, name: aircraft.parkedSpot };
    const position = taken.has(key(spot)) && bay !== undefined ? { kind: 'hangar' as const, name: bay } : spot;
    taken.add(key(position));
    starts.set(aircraft.id, { deckPositionKind: position.kind, deckPositionName: position.name });
  }
  return starts;
}
