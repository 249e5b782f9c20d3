import type { LineupCommandResult, LineupSnapshot } from '@catline/contracts';

/** A handler's command as sent: where to, and the body built from the lineup the handler holds. */
export interface LineupCommand {
  path: string;
  body: object;
  /** POST unless told (a cycle's conditions are patched, a launch prerequisite put). */
  method?: 'PATCH' | 'PUT';
}

/** What the server answered; status 0 when the request never got an answer (connection lost). */
export interface CommandOutcome {
  handler: number;
  command: LineupCommand;
  status: number;
  body: unknown;
  /** The answer's Connection header; null without an answer or header. */
  connection: string | null;
  sentAt: number;
  answeredAt: number;
}

/** A small seeded generator (mulberry32), so a failing run can be repeated from its printed seed. */
export function seededRandom(seed: number): () => number {
  let state = seed >>> 0;
  return () => {
    state = (state + 0x6d2b79f5) >>> 0;
    let t = state;
    t = Math.imul(t ^ (t >>> 15), t | 1);
    t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
    return ((t ^ (t >>> 14)) >>> 0) / 4_294_967_296;
  };
}

const pick = <T>(random: () => number, items: readonly T[]): T => items[Math.floor(random() * items.length)];

export interface CommandMix {
  /** Chance that a command marks an aircraft down (which cannot be undone, so keep it small). */
  down: number;
  /** Chance of a catapult going down or up. */
  catapult: number;
  /** Chance of applying a shuffled lineup as a suggestion (needs the whole cycle as seen). */
  suggestion: number;
}

/**
 * One random handler command built from the lineup as this handler holds it: a move (to a lane place,
 * sometimes one past the end, or to the pool), a shuffled whole lineup, an aircraft down (sometimes with
 * a spare), or a catapult status change. Stale views and invalid places are refused by the server.
 */
export function randomCommand(view: LineupSnapshot, random: () => number, mix: CommandMix): LineupCommand {
  const base = `/api/cycles/${view.cycle.id}/lineup`;
  const planned = view.slots.filter((slot) => slot.status === 'planned');
  const roll = random();
  if (roll < mix.catapult) {
    const lane = pick(random, view.lanes);
    return {
      path: `${base}/catapults/${lane.catapultId}/status`,
      body: { status: lane.status === 'up' ? 'down' : 'up', basisStatus: lane.status },
    };
  }
  if (roll < mix.catapult + mix.down && planned.length > 0) {
    const slot = pick(random, planned);
    const spare =
      view.pool.length > 0 && slot.catapultId !== null && random() < 0.5 ? pick(random, view.pool) : undefined;
    return {
      path: `${base}/slots/${slot.id}/down`,
      body: { slotVersion: slot.version, ...(spare === undefined ? {} : { spareSlotId: spare }) },
    };
  }
  if (roll < mix.catapult + mix.down + mix.suggestion) {
    const lanes = view.lanes.map((lane) => ({ catapultId: lane.catapultId, slotIds: [] as number[] }));
    for (const slot of planned) {
      const lane = Math.floor(random() * (lanes.length + 1));
      if (lane < lanes.length)
        lanes[lane].slotIds.splice(Math.floor(random() * (lanes[lane].slotIds.length + 1)), 0, slot.id);
    }
    return { path: `${base}/suggestion/apply`, body: { basisVersion: view.version, lanes } };
  }
  const slot = pick(random, planned.length > 0 ? planned : view.slots);
  if (slot.catapultId !== null && random() < 0.15) {
    return {
      path: `${base}/moves`,
      body: { slotId: slot.id, slotVersion: slot.version, toCatapultId: null, toIndex: 0, targetLaneOrder: [] },
    };
  }
  const lane = pick(random, view.lanes);
  const others = lane.slotIds.filter((id) => id !== slot.id).length;
  // One place past the end now and then: the server must refuse it with 400 and change nothing.
  const toIndex = Math.floor(random() * (others + 1.1));
  return {
    path: `${base}/moves`,
    body: {
      slotId: slot.id,
      slotVersion: slot.version,
      toCatapultId: lane.catapultId,
      toIndex,
      targetLaneOrder: lane.slotIds,
    },
  };
}

/** Sends a command with a bearer token; a lost connection is an outcome (status 0), not an exception. */
export async function send(url: string, token: string, command: LineupCommand, handler = 0): Promise<CommandOutcome> {
  const sentAt = Date.now();
  try {
    const response = await fetch(`${url}${command.path}`, {
      method: command.method ?? 'POST',
      headers: { Authorization: `Bearer ${token}`, 'Content-Type': 'application/json' },
      body: JSON.stringify(command.body),
      signal: AbortSignal.timeout(30_000),
    });
    const text = await response.text();
    let body: unknown = text;
    try {
      body = JSON.parse(text);
    } catch {
      // Not JSON: kept as text for the failure message.
    }
    return {
      handler,
      command,
      status: response.status,
      body,
      connection: response.headers.get('connection'),
      sentAt,
      answeredAt: Date.now(),
    };
  } catch (error) {
    // fetch says only "fetch failed"; its cause says whether the connection was refused, reset or timed out.
    const body = error instanceof Error && error.cause ? `${String(error)}: ${String(error.cause)}` : String(error);
    return { handler, command, status: 0, body, connection: null, sentAt, answeredAt: Date.now() };
  }
}

export const accepted = (outcome: CommandOutcome) => outcome.status >= 200 && outcome.status < 300;

export const acceptedVersion = (outcome: CommandOutcome) => (outcome.body as LineupCommandResult).version;
