import type { LaneView, LineupSnapshot, MoveSlotRequest, SlotStatus, SlotView } from '@catline/contracts';

/** Where a slot sits on the board: the deck pool or a catapult's lane. */
export type ContainerId = 'pool' | `lane:${number}`;
export type Containers = Record<ContainerId, number[]>;

export const laneContainer = (catapultId: number): ContainerId => `lane:${catapultId}`;
export const catapultOf = (container: ContainerId): number | null =>
  container === 'pool' ? null : Number(container.slice('lane:'.length));

export function containersOf(snapshot: LineupSnapshot): Containers {
  const containers: Containers = { pool: [...snapshot.pool] };
  for (const lane of snapshot.lanes) containers[laneContainer(lane.catapultId)] = [...lane.slotIds];
  return containers;
}

export const slotsById = (snapshot: LineupSnapshot) => new Map(snapshot.slots.map((slot) => [slot.id, slot]));

export const isDone = (slot: SlotView) =>
  slot.status === 'launched' || slot.status === 'down' || slot.status === 'scratched';

/**
 * An aircraft still to fly with nobody to fly it: it cannot get past taxiing, so the suggestion leaves it
 * out and the board flags it. A held spare brings no pilot until it is called.
 */
export const needsPilot = (slot: SlotView) => slot.pilotId === null && !isDone(slot) && !slot.heldSpare;

/** The server moves planned aircraft only: once one is taxiing, its place is held. */
export const isMovable = (slot: SlotView) => slot.status === 'planned';

const bySideNumber = (slots: Map<number, SlotView>) => (a: number, b: number) =>
  (slots.get(a)?.sideNumber ?? '').localeCompare(slots.get(b)?.sideNumber ?? '', 'en', { numeric: true });

/** The board as it will look once the server accepts the move. */
export function moveSlotLocally(snapshot: LineupSnapshot, move: MoveSlotRequest): LineupSnapshot {
  const slots = slotsById(snapshot);
  const lanes: LaneView[] = snapshot.lanes.map((lane) => {
    const slotIds = lane.slotIds.filter((id) => id !== move.slotId);
    if (lane.catapultId === move.toCatapultId) slotIds.splice(Math.min(move.toIndex, slotIds.length), 0, move.slotId);
    return { ...lane, slotIds };
  });
  const pool = snapshot.pool.filter((id) => id !== move.slotId);
  if (move.toCatapultId === null) pool.push(move.slotId);
  pool.sort(bySideNumber(slots));

  const placeOf = new Map<number, { catapultId: number; position: number }>();
  for (const lane of lanes)
    lane.slotIds.forEach((id, position) => placeOf.set(id, { catapultId: lane.catapultId, position }));
  const moved = snapshot.slots.map((slot) => {
    const place = placeOf.get(slot.id);
    const catapultId = place?.catapultId ?? (pool.includes(slot.id) ? null : slot.catapultId);
    const position = place?.position ?? (pool.includes(slot.id) ? null : slot.position);
    return catapultId === slot.catapultId && position === slot.position ? slot : { ...slot, catapultId, position };
  });
  return { ...snapshot, lanes, pool, slots: moved };
}

/** Statuses of an aircraft standing on its catapult: hooked up and stepping through readiness, or held there. */
const ON_CATAPULT: readonly SlotStatus[] = ['on_catapult', 'weight_agreed', 'tensioned', 'suspended'];

/** The two aircraft of a lane the deck watches: the one on the catapult and the one to go after it. */
export type SlotMark = 'on-catapult' | 'next';

/** A lane's aircraft still to launch, in launch order. */
export const laneWaiting = (lane: LaneView, slots: Map<number, SlotView>) =>
  lane.slotIds.map((id) => slots.get(id)).filter((slot): slot is SlotView => !!slot && !isDone(slot));

/**
 * Marks the aircraft on a lane's catapult and the next one. With nobody on the catapult yet, the first
 * aircraft still to launch is the next one.
 */
export function laneMarks(lane: LaneView, slots: Map<number, SlotView>): Map<number, SlotMark> {
  const [first, second] = laneWaiting(lane, slots);
  const marks = new Map<number, SlotMark>();
  if (!first) return marks;
  if (!ON_CATAPULT.includes(first.status)) return marks.set(first.id, 'next');
  marks.set(first.id, 'on-catapult');
  return second ? marks.set(second.id, 'next') : marks;
}

export interface LaneCounts {
  launched: number;
  toGo: number;
  late: number;
  down: number;
}

/**
 * What a lane's head counts: aircraft already off, still to go, still to go but past the window, and
 * those gone down out of its order (which the lane itself no longer holds).
 */
export function laneCounts(lane: LaneView, slots: Map<number, SlotView>): LaneCounts {
  const inLane = lane.slotIds.map((id) => slots.get(id)).filter((slot): slot is SlotView => !!slot);
  const waiting = laneWaiting(lane, slots);
  return {
    launched: inLane.filter((slot) => slot.status === 'launched').length,
    toGo: waiting.length,
    late: waiting.filter((slot) => slot.missesWindow).length,
    down: [...slots.values()].filter((slot) => slot.status === 'down' && slot.downFromCatapultId === lane.catapultId)
      .length,
  };
}

export function placeName(snapshot: LineupSnapshot, container: ContainerId, index?: number): string {
  const catapultId = catapultOf(container);
  if (catapultId === null) return 'the deck pool';
  const lane = snapshot.lanes.find((candidate) => candidate.catapultId === catapultId);
  const name = `catapult ${lane?.number ?? '?'}`;
  return index === undefined ? name : `${name}, place ${index + 1}`;
}

export type WarningKind =
  'no_go' | 'spot_blocked' | 'no_pilot' | 'missed_window' | 'catapult_down' | 'catapult_closed' | 'weight_not_agreed';

export interface LineupWarning {
  kind: WarningKind;
  key: string;
  text: string;
}

/** Who has yet to agree an aircraft's gross weight, in words; null once both have. */
function weightStillToAgree(slot: SlotView): string | null {
  if (slot.pilotWeightAckAt && slot.catapultWeightAckAt) return null;
  if (slot.pilotWeightAckAt) return 'the catapult officer';
  if (slot.catapultWeightAckAt) return 'the pilot';
  return 'the pilot and the catapult officer';
}

/**
 * What the handler must look at now, most serious first. While the cycle is planned, the whole plan:
 * catapults that cannot launch their lane, and every aircraft in a lane that is no-go or misses the window.
 * Once launching, only what the aircraft on each catapult and the next one need, the gross weight
 * agreement among them: the rest of each lane is planning the handler already did.
 */
export function lineupWarnings(snapshot: LineupSnapshot, formatTime: (iso: string) => string): LineupWarning[] {
  if (snapshot.cycle.state === 'closed') return [];
  const launching = snapshot.cycle.state === 'executing';
  const slots = slotsById(snapshot);
  const warnings: LineupWarning[] = [];
  const waiting = (lane: LaneView) => laneWaiting(lane, slots);

  for (const lane of snapshot.lanes) {
    const count = waiting(lane).length;
    if (lane.status === 'down' && count > 0) {
      warnings.push({
        kind: 'catapult_down',
        key: `down-${lane.catapultId}`,
        text: `Cat ${lane.number} is down with ${count} aircraft still in its lane.`,
      });
    } else if (lane.closed && count > 0) {
      warnings.push({
        kind: 'catapult_closed',
        key: `closed-${lane.catapultId}`,
        text: `Cat ${lane.number} is paused while the landing area is ${snapshot.cycle.landingArea === 'fouled' ? 'fouled' : 'recovering'}; ${count} aircraft wait in its lane.`,
      });
    }
  }
  const weights: LineupWarning[] = [];
  for (const lane of snapshot.lanes) {
    const marks = laneMarks(lane, slots);
    const watched = launching ? waiting(lane).filter((slot) => marks.has(slot.id)) : waiting(lane);
    for (const slot of watched) {
      if (slot.mustMove.length > 0) {
        warnings.push({
          kind: 'spot_blocked',
          key: `blocked-${slot.id}`,
          text: `${slot.sideNumber} on cat ${lane.number} cannot taxi out: ${slot.mustMove.join(', ')} parked in front must move first.`,
        });
      }
      const reasons =
        slot.figures?.reasons.filter(
          (reason) => reason.code !== 'catapult_down' && reason.code !== 'catapult_closed',
        ) ?? [];
      if (slot.figures && !slot.figures.go && reasons.length > 0) {
        warnings.push({
          kind: 'no_go',
          key: `nogo-${slot.id}`,
          text: `${slot.sideNumber} on cat ${lane.number} is no-go: ${reasons.map((reason) => reason.message).join(' ')}`,
        });
      }
      if (slot.missesWindow) {
        const when = slot.projectedLaunchAt
          ? ` (projected ${formatTime(slot.projectedLaunchAt)}, window ends ${formatTime(snapshot.cycle.windowEndAt)})`
          : '';
        warnings.push({
          kind: 'missed_window',
          key: `window-${slot.id}`,
          text: `${slot.sideNumber} misses the launch window${when}.`,
        });
      }
      const stillToAgree = launching ? weightStillToAgree(slot) : null;
      if (stillToAgree) {
        const place = marks.get(slot.id) === 'on-catapult' ? `on cat ${lane.number}` : `next on cat ${lane.number}`;
        weights.push({
          kind: 'weight_not_agreed',
          key: `weight-${slot.id}`,
          text: `${slot.sideNumber}, ${place}: gross weight not yet agreed by ${stillToAgree}.`,
        });
      }
    }
  }
  const pilotless = snapshot.slots.filter(needsPilot);
  if (pilotless.length > 0) {
    warnings.push({
      kind: 'no_pilot',
      key: 'pilots',
      text: `No pilot assigned to ${pilotless.map((slot) => slot.sideNumber).join(', ')}.`,
    });
  }
  return [...warnings, ...weights];
}
