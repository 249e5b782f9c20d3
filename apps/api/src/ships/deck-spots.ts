import type { DeckSpot } from '@catline/contracts';

/**
 * Problems with a ship's deck spots against its catapults: names must be unique and every spot needs
 * a taxi time to every catapult (the projected times and the suggested lineup read them).
 */
export function deckSpotProblems(spots: DeckSpot[], catapultNumbers: number[]): string[] {
  const problems: string[] = [];
  const seen = new Set<string>();
  for (const spot of spots) {
    if (seen.has(spot.name)) problems.push(`Deck spot ${spot.name} is listed twice.`);
    seen.add(spot.name);
    const missing = catapultNumbers.filter((number) => !(String(number) in spot.taxiS));
    if (missing.length > 0) {
      problems.push(`Deck spot ${spot.name} needs a taxi time to catapult ${missing.join(', ')}.`);
    }
    const unknown = Object.keys(spot.taxiS).filter((key) => !catapultNumbers.includes(Number(key)));
    if (unknown.length > 0) {
      problems.push(`Deck spot ${spot.name} names catapult ${unknown.join(', ')}, which this ship does not have.`);
    }
  }
  return problems;
}
