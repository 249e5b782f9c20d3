import type { CycleState, DeckLayout, DeckSpot } from '@catline/contracts';
import { deckLayoutProblems } from '@catline/launch-math';
import { type EntityManager, In, Not } from 'typeorm';
import { deckPositionView, holdsPosition, layoutOf, positionExists } from '../cycle-changes/deck-positions.js';
import { Aircraft } from '../database/entities/aircraft.entity.js';
import type { Catapult } from '../database/entities/catapult.entity.js';
import type { Ship } from '../database/entities/ship.entity.js';
import { Slot } from '../database/entities/slot.entity.js';
import { ShipsException } from './ships.exception.js';

/** Refuses a deck the rules cannot use (422), naming each problem and where it is. */
function checkRules(spots: DeckSpot[], layout: DeckLayout, catapults: readonly Catapult[]): void {
  const numbers = catapults.map((catapult) => catapult.number);
  // Keyed by catapult number, so the sentences name the catapults as the admin knows them.
  const problems = deckLayoutProblems(layoutOf(spots, layout, String), numbers.map(String)).map(
    ({ subject, message }) => ({ subject, message }),
  );
  const strange = layout.landingAreaCatapults.filter((number) => !numbers.includes(number));
  if (strange.length > 0) {
    problems.push({
      subject: 'landing area',
      message: `The landing area names catapult ${strange.join(', ')}, which the ship does not have.`,
    });
  }
  if (problems.length > 0) {
    throw new ShipsException(
      'deck_layout_invalid',
      problems.map((problem) => problem.message).join(' '),
      problems.map((problem) => `${problem.subject}: ${problem.message}`),
    );
  }
}

/** Refuses (409) a deck without a position where an aircraft is: parked, or on it in a cycle not closed. */
async function checkOccupied(manager: EntityManager, ship: Ship, deck: Pick<Ship, 'deckSpots' | 'deckLayout'>) {
  const kept = deck.deckSpots.map((spot) => spot.name);
  const stranded = await manager.find(Aircraft, {
    where: { shipId: ship.id, parkedSpot: Not(In(kept)) },
    order: { sideNumber: 'ASC' },
  });
  if (stranded.length > 0) {
    const list = stranded.map((aircraft) => `${aircraft.sideNumber} (${aircraft.parkedSpot})`).join(', ');
    throw new ShipsException(
      'spot_in_use',
      `Aircraft are parked on spots this change removes: ${list}. Move them first.`,
    );
  }
  const slots = await manager.find(Slot, {
    where: { cycle: { shipId: ship.id, state: Not<CycleState>('closed') } },
    relations: { aircraft: true, cycle: true },
    order: { id: 'ASC' },
  });
  const sitting = slots.filter((slot) => holdsPosition(slot) && !positionExists(deck, deckPositionView(slot)));
  if (sitting.length > 0) {
    const list = sitting
      .map((slot) => {
        const at = deckPositionView(slot);
        return `${slot.aircraft.sideNumber} (${at.kind === 'hangar' ? 'hangar bay' : at.kind} ${at.name}, cycle ${slot.cycle.number})`;
      })
      .join(', ');
    throw new ShipsException(
      'spot_in_use',
      `Aircraft of cycles not yet closed are on positions this change removes: ${list}. Tow them elsewhere first.`,
    );
  }
}

/**
 * Refuses a new deck for the ship: 422 where it breaks the deck's rules, 409 where it removes a position an
 * aircraft is on. Call inside the transaction that writes it, with the ship locked.
 */
export async function checkDeck(
  manager: EntityManager,
  ship: Ship,
  spots: DeckSpot[],
  layout: DeckLayout,
  catapults: readonly Catapult[],
): Promise<void> {
  checkRules(spots, layout, catapults);
  await checkOccupied(manager, ship, { deckSpots: spots, deckLayout: layout });
}
