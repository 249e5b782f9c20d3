import type { LineupFollower } from './lineup-follower.js';
import { type CommandMix, type CommandOutcome, randomCommand, seededRandom, send } from './random-lineup-commands.js';

const MOVES_ONLY: CommandMix = { down: 0, catapult: 0, suggestion: 0.02 };

/**
 * Handlers sending random commands back to back, each built from the lineup its own follower holds,
 * until stopped or until `limit` commands have been sent in all.
 */
export class CommandBurst {
  readonly outcomes: CommandOutcome[] = [];
  private stopped = false;
  private sent = 0;
  private readonly loops: Promise<void>[];

  constructor(
    url: string,
    tokens: readonly string[],
    views: readonly LineupFollower[],
    seed: number,
    private readonly limit = Number.POSITIVE_INFINITY,
    mix: CommandMix = MOVES_ONLY,
  ) {
    this.loops = tokens.map(async (token, handler) => {
      const random = seededRandom(seed + handler);
      while (!this.stopped && this.sent < this.limit) {
        this.sent += 1;
        const view = views[handler].held!;
        const outcome = await send(url, token, randomCommand(view, random, mix), handler);
        this.outcomes.push(outcome);
        // A refused connection answers at once: pause instead of spinning while the server is away.
        if (outcome.status === 0) await new Promise((resolve) => setTimeout(resolve, 50));
      }
    });
  }

  /** Resolves once `count` commands were accepted; throws after `timeoutMs`, so a stalled burst fails the test. */
  async acceptedAtLeast(count: number, timeoutMs = 30_000): Promise<void> {
    const deadline = Date.now() + timeoutMs;
    const acceptedSoFar = () => this.outcomes.filter((outcome) => outcome.status === 200).length;
    while (acceptedSoFar() < count) {
      if (Date.now() > deadline)
        throw new Error(`Only ${acceptedSoFar()} of ${count} commands accepted within ${timeoutMs} ms`);
      await new Promise((resolve) => setTimeout(resolve, 10));
    }
  }

  /** Stops sending and waits for the answers of the requests still out. */
  async stop(): Promise<CommandOutcome[]> {
    this.stopped = true;
    await Promise.all(this.loops);
    return this.outcomes;
  }

  /** Waits until the limit is reached. */
  async finished(): Promise<CommandOutcome[]> {
    await Promise.all(this.loops);
    return this.outcomes;
  }
}
