import { createBusyCycle, handlerTokens } from '../support/busy-cycle.js';
import { readChangeLog } from '../support/change-log.js';
import { CommandBurst } from '../support/command-burst.js';
import { LineupDriver, OBSERVER } from '../support/lineup-fixtures.js';
import { LineupFollower, allAt } from '../support/lineup-follower.js';
import { accepted } from '../support/random-lineup-commands.js';
import { eventually } from '../support/socket-client.js';
import { ApiProcess, type ApiSettings, apiSettings } from './support/api-process.js';
import { logProblems } from './support/answered-commands.js';
import { percentile, reportFigure } from './support/figures.js';

// `npm test` follows with 50 clients; `npm run soak` sets RELIABILITY_CLIENTS=300.
const CLIENTS = Number(process.env.RELIABILITY_CLIENTS ?? 50);
const HANDLERS = 4;
const SEED = Number(process.env.RELIABILITY_SEED ?? Date.now() % 1_000_000);

describe(`the API killed with kill -9 during a burst, ${CLIENTS} clients following (seed ${SEED})`, () => {
  let settings: ApiSettings;
  let api: ApiProcess | undefined;
  const followers: LineupFollower[] = [];
  const bursts: CommandBurst[] = [];

  beforeAll(async () => {
    settings = await apiSettings('crash');
    api = await ApiProcess.start(settings);
  });

  afterAll(async () => {
    await Promise.all(bursts.map((burst) => burst.stop()));
    for (const follower of followers) follower.close();
    await api?.stop();
  });

  it('keeps every answered command, and every client reconnects, resyncs and follows on', async () => {
    const deck = new LineupDriver(settings.url);
    const { cycleId, first, setUpVersions } = await createBusyCycle(deck);
    const tokens = await handlerTokens(deck, HANDLERS);
    const observer = await deck.token(OBSERVER);
    for (let i = 0; i < CLIENTS; i += 1) {
      followers.push(
        new LineupFollower({
          url: settings.url,
          origin: settings.origin,
          token: i < HANDLERS ? tokens[i] : observer,
          cycleId,
          reconnect: true,
        }),
      );
    }
    await Promise.all(followers.map((follower) => follower.ready()));

    const burst = new CommandBurst(settings.url, tokens, followers, SEED);
    bursts.push(burst);
    await burst.acceptedAtLeast(40);
    const killedAt = Date.now();
    api!.kill();
    expect((await api!.exited).signal).toBe('SIGKILL');
    // The handlers go on sending for a moment, so that requests sent after the kill are there to check.
    await new Promise((resolve) => setTimeout(resolve, 200));
    const sentInBurst = await burst.stop();
    // A request sent in the kill's own millisecond may be on either side of it, so it counts for neither.
    const cutOff = sentInBurst.filter((outcome) => outcome.sentAt < killedAt && outcome.status === 0);
    const sentAfterKill = sentInBurst.filter((outcome) => outcome.sentAt > killedAt);
    // Requests sent after the kill reached no server, so none of them may explain a row of the log.
    const beforeCrash = sentInBurst.filter((outcome) => outcome.sentAt <= killedAt);
    await eventually(
      () => followers.every((follower) => !follower.socket.connected),
      10_000,
      'every client to notice the crash',
    );

    api = await ApiProcess.start(settings);
    const upAt = Date.now();
    await eventually(
      () => followers.every((follower) => follower.resyncedAt.length > 0),
      60_000,
      'every client to resync',
    );
    const sinceUp = followers.map((follower) => follower.resyncedAt[0] - upAt);
    const sinceKill = followers.map((follower) => follower.resyncedAt[0] - killedAt);

    // Followers must be live again, not just resynced: they follow the commands sent after the restart.
    const afterRestart = await new CommandBurst(settings.url, tokens, followers, SEED + 100, 40).finished();
    const outcomes = [...beforeCrash, ...afterRestart];
    const final = await deck.snapshot(cycleId);
    const log = await readChangeLog(settings.url, observer, cycleId);

    reportFigure('kill -9', {
      clients: CLIENTS,
      commandsBeforeKill: beforeCrash.length,
      acceptedBeforeKill: beforeCrash.filter(accepted).length,
      unansweredAtKill: cutOff.length,
      sentAfterKill: sentAfterKill.length,
      restartMs: upAt - killedAt,
      resyncP95AfterRestartMs: percentile(sinceUp, 95),
      resyncMaxAfterRestartMs: Math.max(...sinceUp),
      resyncP95AfterKillMs: percentile(sinceKill, 95),
    });

    // Requests sent after the kill find no server; a kill between two requests would prove nothing about a
    // command cut off half way, and those later requests only find the door shut, so they do not count.
    expect(sentAfterKill.length).toBeGreaterThan(0);
    expect(
      sentAfterKill.filter((outcome) => outcome.status !== 0).map((o) => `${o.status} ${JSON.stringify(o.body)}`),
    ).toEqual([]);
    expect(cutOff.length).toBeGreaterThan(0);
    expect(logProblems(outcomes, log, setUpVersions, first, final)).toEqual([]);
    expect(outcomes.filter((outcome) => outcome.status >= 500).map((outcome) => outcome.body)).toEqual([]);
    expect(afterRestart.filter(accepted).length).toBeGreaterThan(0);
    await allAt(followers, final.version, 30_000);
    expect(followers.flatMap((follower) => follower.problems)).toEqual([]);
    expect(followers.map((follower) => follower.gaps)).toEqual(followers.map(() => 0));
    for (const follower of followers) expect(follower.held).toEqual(final);
  });
});
