import type { SpareMatch } from './lineup.js';

/** What decides how well a spare stands in for a down aircraft. */
export interface SpareFacts {
  typeId: number;
  mission: string;
  sideNumber: string;
}

const MATCH_ORDER: Record<SpareMatch, number> = { type: 0, mission: 1, other: 2 };

/** "9" before "10". */
const SIDE_NUMBER_ORDER = new Intl.Collator('en', { numeric: true });

const sameMission = (a: string, b: string) => a.trim().toLowerCase() === b.trim().toLowerCase();

/** A spare of the down aircraft's type flies its sortie as it was planned; one of its mission at least does the job. */
export function spareMatch(down: SpareFacts, spare: SpareFacts): SpareMatch {
  if (spare.typeId === down.typeId) return 'type';
  return sameMission(spare.mission, down.mission) ? 'mission' : 'other';
}

/**
 * Spares in the order they are offered for a down aircraft: same type first, then same mission, then the rest; by
 * side number within each. The server's candidates and the handler's dialogs both order by this one rule.
 */
export function orderSpares<T>(
  down: SpareFacts,
  spares: readonly T[],
  facts: (spare: T) => SpareFacts,
): { spare: T; match: SpareMatch }[] {
  return spares
    .map((spare) => {
      const spareFacts = facts(spare);
      return { spare, sideNumber: spareFacts.sideNumber, match: spareMatch(down, spareFacts) };
    })
    .sort(
      (a, b) => MATCH_ORDER[a.match] - MATCH_ORDER[b.match] || SIDE_NUMBER_ORDER.compare(a.sideNumber, b.sideNumber),
    )
    .map(({ spare, match }) => ({ spare, match }));
}
