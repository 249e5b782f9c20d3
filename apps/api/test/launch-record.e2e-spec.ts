import type { CycleReport, LaunchRecord, SlotView } from '@catline/contracts';
import type { INestApplication } from '@nestjs/common';
import { DataSource } from 'typeorm';
import { rebuildMissingLaunchRecords } from '../src/database/migrations/1796200292167-SlotLaunchRecord.js';
import { parse } from 'csv-parse/sync';
import { AIR_OPS, LineupDriver, OBSERVER, launchKey, pilot } from './support/lineup-fixtures.js';
import { startTestApp } from './support/test-app.js';

describe('the launch record', () => {
  let app: INestApplication;
  let deck: LineupDriver;

  beforeAll(async () => {
    const started = await startTestApp();
    app = started.app;
    deck = new LineupDriver(started.url);
  });

  afterAll(async () => {
    await app.close();
  });

  /** C21 launched from cat 1 under the driver's good conditions; the slot as the lineup shows it after. */
  async function launchedAircraft(pilotEmail: string) {
    const {
      cycle,
      slots: [first],
    } = await deck.executingCycle({ 1: [{ side: 'C21', pilotEmail }, 'C22'] });
    const ready = await deck.readyToLaunch(cycle.id, first.id, pilotEmail);
    const launch = await deck.launch(cycle.id, ready, launchKey());
    expect(launch.status).toBe(200);
    return { cycle, ready, launched: await deck.slot(cycle.id, first.id) };
  }

  it('freezes at the shot the weight, wind, figures and who fired, and keeps them after the wind changes', async () => {
    const { cycle, ready, launched } = await launchedAircraft(pilot(5));
    const record = launched.launchRecord!;
    expect(record).toMatchObject({
      source: 'shot',
      catapultNumber: 1,
      grossWeightLb: 44_000,
      fuelLb: 11_000,
      windReading: { shipSpeedKt: 25, trueWindFromDeg: 0, trueWindSpeedKt: 10 },
      headwindKt: ready.figures!.headwindKt,
      crosswindKt: ready.figures!.crosswindKt,
      endSpeedKt: ready.figures!.endSpeedKt,
      excessWindKt: ready.figures!.marginKt,
      excessWindOverDeckKt: ready.figures!.excessWindOverDeckKt,
      recommendedExcessKt: ready.figures!.recommendedExcessKt,
      launchDataSetting: ready.figures!.catapultSetting,
      crossCheckSetting: ready.figures!.crossCheckSetting,
      trimDeg: ready.trimDeg,
      afterburnerRequired: ready.afterburnerRequired,
      go: true,
      waiver: null,
      firedBy: { name: expect.any(String), role: 'catapult_officer' },
    });
    expect(record.launchedAt).toBe(launched.launchedAt);

    // The wind drops and backs to the beam: every figure worked out now would differ.
    const { version } = await deck.snapshot(cycle.id);
    await deck.ok(AIR_OPS, 'patch', `/api/cycles/${cycle.id}/conditions`, {
      basisVersion: version,
      shipSpeedKt: 5,
      trueWindFromDeg: 90,
      trueWindSpeedKt: 20,
    });
    const after = await deck.snapshot(cycle.id);
    const still = after.slots.find((slot) => slot.id === launched.id)!;
    const waiting = after.slots.find((slot) => slot.id !== launched.id)!;
    expect(waiting.figures!.headwindKt).not.toBeCloseTo(record.headwindKt!, 1);
    expect(still.launchRecord).toEqual(record);
    expect(still.figures).toEqual(launched.figures);
    expect(still.figures!.headwindKt).toBe(record.headwindKt);

    const report = await deck.ok<CycleReport>(OBSERVER, 'get', `/api/cycles/${cycle.id}/report`);
    const line = report.catapults
      .flatMap((catapult) => catapult.launches)
      .find((entry) => entry.slotId === launched.id)!;
    expect(line.launchRecord).toEqual(record);

    const csv = await deck.call(OBSERVER, 'get', `/api/cycles/${cycle.id}/slots.csv`);
    const rows: Record<string, string>[] = parse(csv.text, {
      columns: true,
      bom: true,
      comment: '#',
      comment_no_infix: true,
    });
    const row = rows.find((candidate) => Number(candidate.slot_id) === launched.id)!;
    expect(row).toMatchObject({
      record_source: 'shot',
      agreed_weight_lb: '44000',
      wind_from_deg: '0',
      wind_speed_kt: '10',
      headwind_kt: String(record.headwindKt),
      end_speed_kt: String(record.endSpeedKt),
      margin_kt: String(record.excessWindKt),
      excess_wind_over_deck_kt: String(record.excessWindOverDeckKt),
      recommended_excess_kt: String(record.recommendedExcessKt),
      fired_by: record.firedBy!.name,
    });
    expect(rows.find((candidate) => Number(candidate.slot_id) === waiting.id)!.record_source).toBe('');
  });

  it('keeps the record in the replay: the launch change carries it', async () => {
    const { cycle, launched } = await launchedAircraft(pilot(6));
    const replay = await deck.ok<{ changes: { kind: string; patch: { slots?: SlotView[] } }[] }>(
      OBSERVER,
      'get',
      `/api/cycles/${cycle.id}/replay`,
    );
    const launch = replay.changes.find((change) => change.kind === 'slot_launched')!;
    const view = launch.patch.slots!.find((slot) => slot.id === launched.id)!;
    expect(view.launchRecord).toEqual<LaunchRecord>(launched.launchRecord!);
  });

  it('rebuilds, for a slot launched before the record existed, the same figures from its launch change', async () => {
    const { cycle, launched } = await launchedAircraft(pilot(7));
    // The wind changes after the shot; the rebuilt record must still hold the wind of the shot.
    const { version } = await deck.snapshot(cycle.id);
    await deck.ok(AIR_OPS, 'patch', `/api/cycles/${cycle.id}/conditions`, {
      basisVersion: version,
      trueWindSpeedKt: 3,
    });
    const dataSource = app.get(DataSource);
    await dataSource.query('UPDATE slots SET launch_record = NULL WHERE id = ?', [launched.id]);
    const runner = dataSource.createQueryRunner();
    try {
      await rebuildMissingLaunchRecords(runner);
    } finally {
      await runner.release();
    }
    const [row]: { launch_record: string | LaunchRecord }[] = await dataSource.query(
      'SELECT launch_record FROM slots WHERE id = ?',
      [launched.id],
    );
    // The driver hands JSON columns back parsed.
    const rebuilt = typeof row.launch_record === 'string' ? JSON.parse(row.launch_record) : row.launch_record;
    expect(rebuilt).toEqual({ ...launched.launchRecord!, source: 'rebuilt' });
  });
});
