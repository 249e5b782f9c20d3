import { readdirSync, rmSync } from 'node:fs';
import path from 'node:path';
import type { LineupChange, LineupSnapshot } from '@catline/contracts';
import { findBackup, restoreBackup, takeBackup } from '../../../../scripts/lib/backup.mjs';
import {
  grantAppUser,
  isMariaDBRunning,
  mariadbServer,
  startMariaDB,
  stopMariaDB,
} from '../../../../scripts/lib/mariadb.mjs';
import { createBusyCycle, placeFromPool } from '../support/busy-cycle.js';
import { readChangeLog } from '../support/change-log.js';
import { LineupDriver, OBSERVER } from '../support/lineup-fixtures.js';
import { freePort } from '../support/mail-catcher.js';
import { testEnvironment } from '../support/own-database.js';
import { ApiProcess, type ApiSettings, apiSettings } from './support/api-process.js';
import { reportFigure } from './support/figures.js';

// A MariaDB of this spec's own, made afresh each run: the restore replaces its whole data folder.
const server = mariadbServer('mariadb-pitr');
const backupsDir = `${server.dataDir}-backups`;

function removeServerFiles(): void {
  for (const folder of [server.dataDir, backupsDir, `${server.dataDir}.restore.log`])
    rmSync(folder, { recursive: true, force: true });
  const parent = path.dirname(server.dataDir);
  for (const name of readdirSync(parent)) {
    if (name.startsWith(`${path.basename(server.dataDir)}.replaced-`))
      rmSync(path.join(parent, name), { recursive: true, force: true });
  }
}

const sleep = (ms: number) => new Promise((resolve) => setTimeout(resolve, ms));

describe('A backup restored to a point in time', () => {
  let port: number;
  let settings: ApiSettings;
  let api: ApiProcess | undefined;

  beforeAll(async () => {
    removeServerFiles();
    port = await freePort();
    await startMariaDB(server, port);
    grantAppUser(server, { ...testEnvironment(), DB_NAME: 'catline' });
    settings = await apiSettings('pitr', { DB_PORT: port });
    api = await ApiProcess.start(settings);
  }, 120_000);

  afterAll(async () => {
    await api?.stop();
    if (isMariaDBRunning(server)) stopMariaDB(server);
    removeServerFiles();
  });

  it('holds the change log and the lineup of that time, and the API starts on it', async () => {
    const deck = new LineupDriver(settings.url);
    const { cycleId } = await createBusyCycle(deck);
    const observer = await deck.token(OBSERVER);
    const state = async (): Promise<{ lineup: LineupSnapshot; log: LineupChange[] }> => ({
      lineup: await deck.snapshot(cycleId),
      log: await readChangeLog(settings.url, observer, cycleId),
    });

    const backup = takeBackup(server, { into: backupsDir });
    const atBackup = await state();
    await placeFromPool(deck, cycleId, 3);
    // The binary log stamps events to the second: the chosen time is the next whole second, and the later
    // changes wait for it.
    const until = new Date(Math.ceil(Date.now() / 1000) * 1000);
    const atUntil = await state();
    await sleep(until.getTime() - Date.now() + 50);
    await placeFromPool(deck, cycleId, 4);
    const latest = await state();
    expect(atUntil.lineup.version).toBe(atBackup.lineup.version + 3);
    expect(latest.lineup.version).toBe(atUntil.lineup.version + 4);

    await api!.stop();
    stopMariaDB(server);
    const restored = await restoreBackup(server, findBackup(backup.dir), { port, until });
    await startMariaDB(server, port);
    const startedAt = Date.now();
    api = await ApiProcess.start(settings);
    reportFigure('backup and restore', {
      backupMs: backup.tookMs,
      restoreMs: restored.tookMs,
      apiUpAfterMs: Date.now() - startedAt,
      versionsReplayed: atUntil.lineup.version - atBackup.lineup.version,
    });

    expect(restored.replayed).toBe(true);
    expect(await state()).toEqual(atUntil);
  });
});
