import type { DeckPositionView } from '@catline/contracts';

const PLACE_WORDS = { spot: 'spot', elevator: 'elevator', hangar: 'hangar bay' } as const;

/** A position as the refusals and the change log name it: "spot bow-1", "hangar bay bay-A". */
export const placeWords = (position: DeckPositionView) => `${PLACE_WORDS[position.kind]} ${position.name}`;
