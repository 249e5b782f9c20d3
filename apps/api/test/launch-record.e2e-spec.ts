import type { CycleReport, CycleView, LaunchRecord, SlotView, UpdateCycleConditionsRequest } from '@catline/contracts';
import type { INestApplication } from '@nestjs/common';
import { DataSource } from 'typeorm';
import { rebuildMissingLaunchRecords } from '../src/database/migrations/1796200292167-SlotLaunchRecord.js';
import { LaunchRecordWholeWind1796277785788 } from '../src/database/migrations/1796277785788-LaunchRecordWholeWind.js';
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

  /**
   * C21 launched from cat 1 under the driver's good conditions, or under a wind reading entered before its
   * steps; the slot as the lineup shows it after.
   */
  async function launchedAircraft(pilotEmail: string, reading?: Omit<UpdateCycleConditionsRequest, 'basisVersion'>) {
    const {
      cycle,
      slots: [first],
    } = await deck.executingCycle({ 1: [{ side: 'C21', pilotEmail }, 'C22'] });
    if (reading) {
      const { version } = await deck.snapshot(cycle.id);
      await deck.ok(AIR_OPS, 'patch', `/api/cycles/${cycle.id}/conditions`, { ...reading, basisVersion: version });
    }
    const ready = await deck.readyToLaunch(cycle.id, first.id, pilotEmail);
    const launch = await deck.launch(cycle.id, ready, launchKey());
    expect(launch.status).toBe(200);
    return { cycle, ready, launched: await deck.slot(cycle.id, first.id) };
  }

  it('freezes at the shot the weight, wind, figures and who fired, and keeps them after the wind changes', async () => {
    // A true wind from ahead with a spread, read five minutes before it was entered (still current).
    const readAt = new Date(Date.now() - 5 * 60_000).toISOString();
    const { cycle, ready, launched } = await launchedAircraft(pilot(5), {
      trueWindFromDeg: 0,
      trueWindSpeedKt: 10,
      windGustKt: 16,
      windLullKt: 7,
      windReadAt: readAt,
    });
    const record = launched.launchRecord!;
    expect(record).toMatchObject({
      source: 'shot',
      catapultNumber: 1,
      grossWeightLb: 44_000,
      fuelLb: 11_000,
      // Ship on 000 at 25 kt into a true wind from dead ahead: across the deck the speeds add, on the bow.
      windReading: {
        readAt,
        shipCourseDeg: 0,
        shipSpeedKt: 25,
        trueWindFromDeg: 0,
        trueWindSpeedKt: 10,
        windGustFromDeg: 0,
        windGustKt: 16,
        windLullFromDeg: 0,
        windLullKt: 7,
        relativeWindBearingDeg: 0,
        relativeWindSpeedKt: 35,
      },
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
    // The new reading has no spread and a later time: none of the frozen wind may follow it.
    expect(after.cycle).toMatchObject<Partial<CycleView>>({ windGustKt: 20, windLullKt: 20, windGustFromDeg: 90 });
    expect(Date.parse(after.cycle.windReadAt)).toBeGreaterThan(Date.parse(readAt));
    const still = after.slots.find((slot) => slot.id === launched.id)!;
    const waiting = after.slots.find((slot) => slot.id !== launched.id)!;
    expect(waiting.figures!.headwindKt).not.toBeCloseTo(record.headwindKt!, 1);
    // The whole record, the wind's spread and the wind across the deck with it.
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
    expect(await storedRecord(launched.id)).toEqual({ ...launched.launchRecord!, source: 'rebuilt' });
  });

  it('gives a record frozen before the whole reading was kept the wind across the deck, and no spread', async () => {
    const { launched } = await launchedAircraft(pilot(8));
    const dataSource = app.get(DataSource);
    await dataSource.query(
      `UPDATE slots SET launch_record = JSON_REMOVE(launch_record, '$.windReading.windGustFromDeg',
         '$.windReading.windGustKt', '$.windReading.windLullFromDeg', '$.windReading.windLullKt',
         '$.windReading.relativeWindBearingDeg', '$.windReading.relativeWindSpeedKt') WHERE id = ?`,
      [launched.id],
    );
    const runner = dataSource.createQueryRunner();
    try {
      await new LaunchRecordWholeWind1796277785788().up(runner);
    } finally {
      await runner.release();
    }
    const record = launched.launchRecord!;
    // The driver's ship on 000 at 25 kt, true wind 10 kt from dead ahead: 35 kt on the bow.
    expect(await storedRecord(launched.id)).toEqual({
      ...record,
      windReading: {
        ...record.windReading!,
        windGustFromDeg: null,
        windGustKt: null,
        windLullFromDeg: null,
        windLullKt: null,
        relativeWindBearingDeg: 0,
        relativeWindSpeedKt: 35,
      },
    });
  });

  async function storedRecord(slotId: number): Promise<LaunchRecord> {
    const [row]: { launch_record: string | LaunchRecord }[] = await app
      .get(DataSource)
      .query('SELECT launch_record FROM slots WHERE id = ?', [slotId]);
    // The driver hands JSON columns back parsed.
    return typeof row.launch_record === 'string' ? JSON.parse(row.launch_record) : row.launch_record;
  }
});
