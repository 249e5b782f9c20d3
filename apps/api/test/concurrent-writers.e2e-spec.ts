import { applyLineupChanges, type LineupCommandResult, type LineupSnapshot } from '@catline/contracts';
import type { INestApplication } from '@nestjs/common';
import { ConfigService } from '@nestjs/config';
import fc from 'fast-check';
import { readChangeLog, versionProblems } from './support/change-log.js';
import { staleBasisProblems } from './support/stale-basis.js';
import { createBusyCycle, handlerTokens } from './support/busy-cycle.js';
import { LineupDriver, OBSERVER } from './support/lineup-fixtures.js';
import { LineupFollower, allAt } from './support/lineup-follower.js';
import { type LineupModel, lineupModelCommands } from './support/lineup-model-commands.js';
import {
  type CommandOutcome,
  accepted,
  acceptedVersion,
  randomCommand,
  seededRandom,
  send,
} from './support/random-lineup-commands.js';
import { startTestApp } from './support/test-app.js';

// `npm test` sends 1,000 commands; `npm run soak` sets RELIABILITY_COMMANDS=10000.
const TOTAL = Number(process.env.RELIABILITY_COMMANDS ?? 1_000);
const HANDLERS = 16;
/** A quarter of the commands go through fast-check's model-based run (one at a time, predicted); the rest race. */
const MODEL_RUNS = Math.max(1, Math.round(TOTAL / 100));
const MODEL_MAX_COMMANDS = 50;
const SEED = Number(process.env.RELIABILITY_SEED ?? Date.now() % 1_000_000);

describe(`${HANDLERS} handlers sending ${TOTAL} lineup commands at one cycle (seed ${SEED})`, () => {
  let app: INestApplication;
  let url: string;
  let deck: LineupDriver;
  let cycleId: number;
  let first: LineupSnapshot;
  let setUpVersions: number;
  const tokens: string[] = [];
  const followers: LineupFollower[] = [];
  const outcomes: CommandOutcome[] = [];

  beforeAll(async () => {
    ({ app, url } = await startTestApp());
    deck = new LineupDriver(url);
    const origin = app.get(ConfigService).get<string>('WEB_ORIGINS')!.split(',')[0].trim();
    ({ cycleId, first, setUpVersions } = await createBusyCycle(deck));
    tokens.push(...(await handlerTokens(deck, HANDLERS)));
    for (const token of tokens) followers.push(await new LineupFollower({ url, origin, token, cycleId }).ready());
  }, 120_000);

  afterAll(async () => {
    for (const follower of followers) follower.close();
    await app.close();
  });

  it('matches the model command by command (fast-check model-based run)', async () => {
    await fc.assert(
      fc.asyncProperty(lineupModelCommands(HANDLERS, MODEL_MAX_COMMANDS), async (commands) => {
        const model: LineupModel = { snapshot: await deck.snapshot(cycleId), outcomes: [] };
        try {
          await fc.asyncModelRun(
            () => ({ model, real: { url, tokens, read: () => deck.snapshot(cycleId) } }),
            commands,
          );
        } finally {
          outcomes.push(...model.outcomes);
        }
        // Each command was checked against the model as it ran; the last lineup read is still the database's.
        expect(await deck.snapshot(cycleId)).toEqual(model.snapshot);
      }),
      { numRuns: MODEL_RUNS, seed: SEED, endOnFailure: true },
    );
  }, 600_000);

  it('keeps every client and the change log consistent while the handlers race', async () => {
    const budget = Math.max(0, TOTAL - outcomes.length);
    const mix = { down: Math.min(0.05, 4 / Math.max(budget, 1)), catapult: 0.02, suggestion: 0.03 };
    let issued = 0;
    const raced: CommandOutcome[] = [];
    await Promise.all(
      followers.map(async (follower, handler) => {
        const random = seededRandom(SEED + handler);
        while (issued < budget) {
          issued += 1;
          raced.push(await send(url, tokens[handler], randomCommand(follower.held!, random, mix), handler));
        }
      }),
    );
    outcomes.push(...raced);
    // Put the shared ship's catapults back up, through the same pipeline (these are accepted changes too).
    const now = await deck.snapshot(cycleId);
    for (const lane of now.lanes.filter((candidate) => candidate.status !== 'up')) {
      outcomes.push(
        await send(url, tokens[0], {
          path: `/api/cycles/${cycleId}/lineup/catapults/${lane.catapultId}/status`,
          body: { status: 'up', basisStatus: lane.status },
        }),
      );
    }

    const final = await deck.snapshot(cycleId);
    const log = await readChangeLog(url, await deck.token(OBSERVER), cycleId);
    const acceptedOnes = outcomes.filter(accepted);
    const refused = outcomes.filter((outcome) => !accepted(outcome));
    console.log(
      `${outcomes.length} commands (${outcomes.length - raced.length} predicted one by one, ${raced.length} raced): ` +
        `${acceptedOnes.length} accepted, ${refused.filter((o) => o.status === 409).length} refused 409, ` +
        `${refused.filter((o) => o.status === 400).length} refused 400; final version ${final.version}`,
    );

    expect(outcomes.length).toBeGreaterThanOrEqual(TOTAL);
    expect(
      refused
        .filter((outcome) => outcome.status !== 409 && outcome.status !== 400)
        .map((o) => `${o.status} ${JSON.stringify(o.body)}`),
    ).toEqual([]);
    expect(acceptedOnes.length).toBeGreaterThan(TOTAL / 10);

    // Versions 1..final without a gap or a repeat; each accepted command is exactly one of them.
    expect(versionProblems(log)).toEqual([]);
    expect(log.length).toBe(final.version);
    const versions = acceptedOnes.map(acceptedVersion).sort((a, b) => a - b);
    expect(versions).toEqual(log.slice(setUpVersions).map((change) => change.version));
    for (const outcome of acceptedOnes) {
      expect((outcome.body as LineupCommandResult).change).toEqual(log[acceptedVersion(outcome) - 1]);
    }

    // No accepted command was based on a stale lane, slot, version or catapult status.
    expect(staleBasisProblems(first, log, acceptedOnes)).toEqual([]);

    // The database is the change log replayed from the cycle's first, empty snapshot.
    expect(first.version).toBe(0);
    expect(applyLineupChanges(first, log)).toEqual(final);

    await allAt(followers, final.version, 30_000);
    expect(followers.flatMap((follower) => follower.problems)).toEqual([]);
    expect(followers.map((follower) => follower.gaps)).toEqual(followers.map(() => 0));
    for (const follower of followers) expect(follower.held).toEqual(final);
  }, 1_800_000);
});
