// The deck: where each aircraft of a cycle is, the landing area, and the commands that change them.

export const DECK_POSITION_KINDS = ['spot', 'elevator', 'hangar'] as const;
/** A deck spot (in a named deck area), an elevator at flight-deck level, or a hangar bay. */
export type DeckPositionKind = (typeof DECK_POSITION_KINDS)[number];

export interface DeckPositionView {
  kind: DeckPositionKind;
  /** The spot's, elevator's or hangar bay's name in the ship's deck layout. */
  name: string;
}

export const LANDING_AREA_STATES = ['clear', 'recovering', 'fouled'] as const;
/** While the landing area is recovering or fouled the catapults inside it cannot launch. */
export type LandingAreaState = (typeof LANDING_AREA_STATES)[number];

/** In use (recovering or fouled): the one rule every station and the projection read off the state. */
export const isLandingAreaInUse = (state: LandingAreaState): boolean => state === 'recovering' || state === 'fouled';

/** Tows an aircraft of the cycle to another position (a change through the cycle's pipeline). */
export interface TowAircraftRequest {
  slotId: number;
  to: DeckPositionView;
  /** The slot version the move was based on. */
  slotVersion: number;
}

/** A catapult the air boss has not cleared to launch, and why; every other catapult of the cycle is clear. */
export interface CatapultDeckHold {
  catapultId: number;
  reason: string;
}

/** The air boss clears a catapult to launch, or holds it with a reason (a change through the cycle's pipeline). */
export interface SetDeckStatusRequest {
  catapultId: number;
  clear: boolean;
  /** Required when not clear: what keeps the deck ahead of the catapult from launching. */
  reason?: string | null;
  /** The cycle version the change was based on. */
  basisVersion: number;
}

/** Sets the cycle's landing area; a reason is required when fouled. */
export interface SetLandingAreaRequest {
  state: LandingAreaState;
  reason?: string | null;
  /** The cycle version the change was based on. */
  basisVersion: number;
}

/** Where one aircraft is to be after the respot; an airborne one lands there in the recovery. */
export interface RespotTarget {
  slotId: number;
  to: DeckPositionView;
}

/** One tow of the respot, in the order the deck crew makes them. */
export interface RespotTow {
  slotId: number;
  from: DeckPositionView;
  to: DeckPositionView;
  /** ISO 8601 instant the tow was ticked off; null while still to do. */
  doneAt: string | null;
}

/** The respot the handler built for the coming recovery: the targets and the tows that reach them. */
export interface RespotView {
  targets: RespotTarget[];
  tows: RespotTow[];
}

/** Builds (or builds again) the cycle's respot after its last launch; Catline orders the tows. */
export interface BuildRespotRequest {
  targets: RespotTarget[];
  /** The cycle version the respot was based on. */
  basisVersion: number;
}

/** Ticks off the respot's next tow: the aircraft is towed there. */
export interface RespotTowDoneRequest {
  /** The cycle version the tick was based on. */
  basisVersion: number;
}
