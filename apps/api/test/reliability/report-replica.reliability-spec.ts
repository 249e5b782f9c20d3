import type { CycleReplay } from '@catline/contracts';
import { grantAppUser } from '../../../../scripts/lib/mariadb.mjs';
import { createBusyCycle, handlerTokens, placeFromPool } from '../support/busy-cycle.js';
import { LineupDriver, OBSERVER } from '../support/lineup-fixtures.js';
import { LineupFollower } from '../support/lineup-follower.js';
import { testEnvironment } from '../support/own-database.js';
import { ApiProcess, type ApiSettings, apiSettings } from './support/api-process.js';
import { ReplicaPair } from './support/replica-pair.js';

const servers = new ReplicaPair('replica');

describe('Reports and exports on an asynchronous replica', () => {
  let settings: ApiSettings;
  let api: ApiProcess | undefined;
  const followers: LineupFollower[] = [];

  beforeAll(async () => {
    await servers.start();
    grantAppUser(servers.primary, { ...testEnvironment(), DB_NAME: 'catline' });
    const onPrimary = await apiSettings('replica', { DB_PORT: servers.primaryPort });
    settings = {
      ...onPrimary,
      env: { ...onPrimary.env, DB_REPLICA_HOST: '127.0.0.1', DB_REPLICA_PORT: String(servers.replicaPort) },
    };
    await servers.caughtUp();
    api = await ApiProcess.start(settings);
  }, 120_000);

  afterAll(async () => {
    for (const follower of followers) follower.close();
    await api?.stop();
    servers.stop();
  });

  it('answers reports from the replica, as far as it has got, and everything else from the primary', async () => {
    const deck = new LineupDriver(settings.url);
    const { cycleId } = await createBusyCycle(deck);
    const observer = await deck.token(OBSERVER);
    const get = (path: string) =>
      fetch(`${settings.url}/api/cycles/${cycleId}/${path}`, { headers: { Authorization: `Bearer ${observer}` } });
    const reported = async () => {
      const replay = (await (await get('replay')).json()) as CycleReplay;
      // Less the caution line and the header line.
      const csvRows = (await (await get('changes.csv')).text()).trim().split('\r\n').length - 2;
      return { replayed: replay.changes.length, csvRows };
    };

    await servers.caughtUp();
    const before = (await deck.snapshot(cycleId)).version;
    expect(await reported()).toEqual({ replayed: before, csvRows: before });

    servers.pause();
    await placeFromPool(deck, cycleId, 3);
    // Commands, the lineup and socket joins read the primary: they see the three moves at once.
    expect((await deck.snapshot(cycleId)).version).toBe(before + 3);
    const follower = new LineupFollower({ url: settings.url, origin: settings.origin, token: observer, cycleId });
    followers.push(follower);
    await follower.ready();
    expect(follower.version).toBe(before + 3);
    // Plain reads outside a transaction too: a person created just now signs in (found on the primary).
    expect(await handlerTokens(deck, 2)).toHaveLength(2);
    // The report and the export read the paused replica: not yet.
    expect(await reported()).toEqual({ replayed: before, csvRows: before });

    servers.resume();
    await servers.caughtUp();
    expect(await reported()).toEqual({ replayed: before + 3, csvRows: before + 3 });
  });
});
