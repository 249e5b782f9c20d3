import {
  type AircraftTypeView,
  type AircraftView,
  applyLineupChanges,
  type LineupCommandResult,
  type LineupSnapshot,
  type SlotStatus,
  type SlotView,
} from '@catline/contracts';
import type { INestApplication } from '@nestjs/common';
import { ConfigService } from '@nestjs/config';
import fc from 'fast-check';
import { readChangeLog, versionProblems } from './support/change-log.js';
import { staleBasisProblems } from './support/stale-basis.js';
import { createBusyCycle, handlerTokens } from './support/busy-cycle.js';
import { executingModelCommands } from './support/executing-model-commands.js';
import type { Fleet } from './support/fleet-model-commands.js';
import { ADMIN, AIR_BOSS, AIR_OPS, LineupDriver, OBSERVER, catapultOfficer, pilot } from './support/lineup-fixtures.js';
import { LineupFollower, allAt } from './support/lineup-follower.js';
import { type Person, lineupModelCommands, newModel } from './support/lineup-model-commands.js';
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
/** Launching cycles, each a fresh one (launches cannot be undone), for the crew's and pilots' commands. */
const EXECUTING_RUNS = Math.max(1, Math.round(TOTAL / 250));
const EXECUTING_MAX_COMMANDS = 200;
/** What the launching cycle's commands are told apart by: the last part of the path, and a step's target. */
const commandKind = (outcome: CommandOutcome) => {
  const action = outcome.command.path
    .split('/')
    .filter((part) => !/^\d+$/.test(part))
    .at(-1)!;
  const body = outcome.command.body as { to?: string; outcome?: string };
  return action === 'advance'
    ? body.to === 'resume'
      ? 'resume'
      : 'advance'
    : body.outcome
      ? `${action}:${body.outcome}`
      : action;
};
/** The launching cycle's aircraft by catapult number, each with a pilot of its own (pilot(2) on). */
const EXECUTING_LANES = { 1: ['C21', 'C22', 'C23'], 2: ['C24', 'C25'], 3: ['C26'] };
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
        const model = newModel(await deck.snapshot(cycleId));
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
    // These are accepted changes of the busy cycle too.
    outcomes.push(...(await catapultsUp()));

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

  it('matches the model command by command on a launching cycle (fast-check model-based run)', async () => {
    const crewTokens = [tokens[0]];
    const people: Person[] = [{ token: 0, role: 'handler', userId: 0, catapultId: null }];
    for (const number of [1, 2, 3, 4]) {
      const email = catapultOfficer(number);
      const { id, catapultId } = await deck.me(email);
      people.push({
        token: crewTokens.push(await deck.token(email)) - 1,
        role: 'catapult_officer',
        userId: id,
        catapultId,
      });
    }
    for (const [email, role] of [
      [AIR_BOSS, 'air_boss'],
      [AIR_OPS, 'air_operations'],
      [ADMIN, 'admin'],
    ] as const) {
      const { id } = await deck.me(email);
      people.push({ token: crewTokens.push(await deck.token(email)) - 1, role, userId: id, catapultId: null });
    }
    // Each aircraft with a pilot of its own, from pilot(2) on; the pilots answer the weight on their tablets.
    const pilots = Object.values(EXECUTING_LANES)
      .flat()
      .map((_, index) => pilot(2 + index));
    let next = 0;
    const lanes = Object.fromEntries(
      Object.entries(EXECUTING_LANES).map(([number, sides]) => [
        number,
        sides.map((side) => ({ side, pilotEmail: pilots[next++] })),
      ]),
    );
    for (const email of pilots) {
      const token = crewTokens.push(await deck.token(email)) - 1;
      people.push({ token, role: 'pilot', userId: await deck.pilotId(email), catapultId: null });
    }
    const answers = new Map<string, number>();
    // The demo ship's fleet and types, for the aircraft the model adds and the launch data it uploads again.
    const shipId = (await deck.demoShip()).id;
    const fleet: Fleet = {
      aircraft: await deck.all<AircraftView>(OBSERVER, '/api/aircraft'),
      types: (await deck.ok<AircraftTypeView[]>(ADMIN, 'get', '/api/aircraft-types')).filter(
        (type) => type.shipId === shipId,
      ),
    };
    await fc.assert(
      fc.asyncProperty(executingModelCommands(EXECUTING_MAX_COMMANDS), async (run) => {
        const { cycle, slots } = await deck.executingCycle(lanes);
        const model = newModel(await readyToLaunch(cycle.id, slots[0], lanes[1][0].pilotEmail), people, fleet);
        // The crew's last step may be undone for a while, as the model knows of its own steps.
        const [before, last] = model.snapshot.readinessSteps.slice(-2) as SlotStatus[];
        const ready = model.snapshot.slots.find((slot) => slot.id === slots[0].id)!;
        const officer = people.find(
          (person) => person.role === 'catapult_officer' && person.catapultId === ready.catapultId,
        )!;
        model.lastSteps.set(slots[0].id, {
          byUserId: officer.userId,
          sentAt: lastStepSentBy,
          from: before,
          to: last,
          reverifyBefore: null,
        });
        try {
          await fc.asyncModelRun(
            () => ({ model, real: { url, tokens: crewTokens, read: () => deck.snapshot(cycle.id) } }),
            run,
          );
          expect(await deck.snapshot(cycle.id)).toEqual(model.snapshot);
        } finally {
          for (const outcome of model.outcomes) {
            const code = (outcome.body as { code?: string } | null)?.code;
            const kind = `${commandKind(outcome)} ${outcome.status}${code ? ` ${code}` : ''}`;
            answers.set(kind, (answers.get(kind) ?? 0) + 1);
          }
          await catapultsUp();
        }
      }),
      { numRuns: EXECUTING_RUNS, seed: SEED, endOnFailure: true },
    );
    const table = [...answers].sort(([a], [b]) => a.localeCompare(b));
    console.log(
      `${table.reduce((sum, [, count]) => sum + count, 0)} commands on ${EXECUTING_RUNS} launching cycles, ` +
        `each predicted by the model:\n${table.map(([kind, count]) => `${kind}: ${count}`).join('\n')}`,
    );
  }, 600_000);

  /** A time just before readyToLaunch's last step went out: the model never takes that step for younger than it is. */
  let lastStepSentBy = 0;

  /**
   * The first aircraft of cat 1 taken to ready to launch before a run starts, so that launches and their
   * gates come early in the run rather than only after a long stretch of steps.
   */
  async function readyToLaunch(cycleId: number, slot: SlotView, pilotEmail: string): Promise<LineupSnapshot> {
    await deck.acknowledgeWeight(cycleId, slot.id, pilotEmail);
    const steps = (await deck.snapshot(cycleId)).readinessSteps;
    await deck.stepThrough(cycleId, slot.id, steps.at(-2));
    lastStepSentBy = Date.now();
    expect((await deck.step(cycleId, slot.id, steps.at(-1)!)).status).toBe(200);
    return deck.snapshot(cycleId);
  }

  /**
   * The demo ship's catapults back up after a run, through the same pipeline, for the specs that run after
   * this one. Sent on the busy cycle, which stays open: a launching run may have closed its own cycle, which
   * then refuses the command, and a catapult left down failed the next spec that needed it up.
   */
  async function catapultsUp(): Promise<CommandOutcome[]> {
    const answers: CommandOutcome[] = [];
    for (const lane of (await deck.snapshot(cycleId)).lanes.filter((candidate) => candidate.status !== 'up')) {
      const answer = await send(url, tokens[0], {
        path: `/api/cycles/${cycleId}/lineup/catapults/${lane.catapultId}/status`,
        body: { status: 'up', basisStatus: lane.status },
      });
      expect(answer.status).toBe(200);
      answers.push(answer);
    }
    return answers;
  }
});
