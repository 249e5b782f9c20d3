import type { AircraftTypeView, AircraftView, LineupChange, Page, SettingTable, ShipView } from '@catline/contracts';
import type { INestApplication } from '@nestjs/common';
import { aircraftTypeBody } from './support/fleet-fixtures.js';
import { ADMIN, LineupDriver, launchKey, OBSERVER, pilot } from './support/lineup-fixtures.js';
import { startTestApp } from './support/test-app.js';

// The setting the Cat station shows comes from the ship's approved setting tables; Catline's energy model
// only cross-checks it. The demo's tables for the WKD-41 are invented (demo-fleet.ts).
describe('approved catapult settings', () => {
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

  /** A new type of the demo ship with the given tables and one aircraft of it: its side number. */
  async function aircraftOfNewType(tables: SettingTable[]): Promise<{ type: AircraftTypeView; side: string }> {
    const type = await deck.ok<AircraftTypeView>(ADMIN, 'post', '/api/aircraft-types', aircraftTypeBody(), 201);
    await deck.ok(ADMIN, 'put', `/api/aircraft-types/${type.id}/setting-tables`, { tables });
    const side = `S${Math.floor(Math.random() * 9_000_000) + 1_000_000}`;
    await deck.ok<AircraftView>(
      ADMIN,
      'post',
      '/api/aircraft',
      { sideNumber: side, typeId: type.id, squadronId: 1, parkedSpot: 'bow-1' },
      201,
    );
    return { type, side };
  }

  const cleanOnCat1 = (setting: number): SettingTable => ({
    catapultNumber: 1,
    configuration: 'clean',
    recommendedExcessKt: 9,
    rows: [{ upToLb: 40_000, setting }],
  });

  it('shows the row of the next weight at or above the agreed one, for the catapult and configuration', async () => {
    const cycle = await deck.createCycle();
    // WKD-41 off cat 1 (demo tables): clean up to 44,000 lb setting 16, up to 46,000 lb 19; with stores one more.
    const atRow = await deck.addSlot(cycle.id, 'C21', { grossWeightLb: 44_000 });
    const above = await deck.addSlot(cycle.id, 'C22', { grossWeightLb: 44_001 });
    const withStores = await deck.addSlot(cycle.id, 'C23', { grossWeightLb: 44_000, stores: '2 rocket pods' });
    for (const slot of [atRow, above, withStores]) await deck.place(cycle.id, slot.id, 1);
    const setting = async (slotId: number) => (await deck.slot(cycle.id, slotId)).figures!;
    expect((await setting(atRow.id)).catapultSetting).toBe(16);
    expect((await setting(above.id)).catapultSetting).toBe(19);
    expect(await setting(withStores.id)).toMatchObject({ catapultSetting: 17, recommendedExcessKt: 12 });
  });

  it('keeps the approved setting and the cross-check estimate in the launch record', async () => {
    const cycle = await deck.createCycle();
    const slot = await deck.addSlot(cycle.id, 'C24', { pilotEmail: pilot(6) });
    await deck.place(cycle.id, slot.id, 1);
    await deck.start(cycle.id);
    const ready = await deck.readyToLaunch(cycle.id, slot.id, pilot(6));
    expect(ready.figures).toMatchObject({ catapultSetting: 16, crossCheckSetting: expect.any(Number) });
    expect((await deck.launch(cycle.id, ready, launchKey())).status).toBe(200);
    expect((await deck.slot(cycle.id, slot.id)).launchRecord).toMatchObject({
      launchDataSetting: 16,
      crossCheckSetting: ready.figures!.crossCheckSetting,
    });
  });

  it('stops at the weight with no approved table for the combination: nothing to read back, no launch, and no waiver opens it', async () => {
    // Tables for cat 2 only: nothing approves a shot off cat 1.
    const { side, type } = await aircraftOfNewType([{ ...cleanOnCat1(10), catapultNumber: 2 }]);
    const cycle = await deck.createCycle();
    const slot = await deck.addSlot(cycle.id, side, { pilotEmail: pilot(7), grossWeightLb: 30_000, stores: '' });
    await deck.place(cycle.id, slot.id, 1);
    await deck.start(cycle.id);
    await deck.acknowledgeWeight(cycle.id, slot.id, pilot(7));
    await deck.stepThrough(cycle.id, slot.id, 'weight_agreed');
    const readBack = await deck.step(cycle.id, slot.id, 'setting_set');
    expect(readBack.status).toBe(409);
    expect(readBack.body).toMatchObject({ code: 'approved_setting_missing' });
    const ready = await deck.slot(cycle.id, slot.id);
    expect(ready.figures).toMatchObject({ catapultSetting: null, go: false });
    expect(ready.gates).toEqual(
      expect.arrayContaining([expect.objectContaining({ gate: 'approved_setting_missing', soft: false })]),
    );
    const refused = await deck.launch(cycle.id, ready, launchKey());
    expect(refused.status).toBe(409);
    expect(refused.body).toMatchObject({ code: 'approved_setting_missing' });
    expect(refused.body.message).toContain(
      `The approved launch data hold no clean setting table for the ${type.designation} on cat 1`,
    );
    expect((await deck.waive(cycle.id, slot.id, 'approved_setting_missing', 'Launch anyway')).status).toBe(400);
    expect((await deck.slot(cycle.id, slot.id)).status).toBe('weight_agreed');
  });

  it('refuses the launch above the last row of the table', async () => {
    const { side } = await aircraftOfNewType([cleanOnCat1(10)]);
    const cycle = await deck.createCycle();
    const slot = await deck.addSlot(cycle.id, side, { pilotEmail: pilot(7), grossWeightLb: 30_000, stores: '' });
    await deck.place(cycle.id, slot.id, 1);
    await deck.start(cycle.id);
    await deck.acknowledgeWeight(cycle.id, slot.id, pilot(7));
    await deck.ok(ADMIN, 'put', `/api/aircraft-types/${(await deck.slot(cycle.id, slot.id)).typeId}/setting-tables`, {
      tables: [{ ...cleanOnCat1(10), rows: [{ upToLb: 29_999, setting: 10 }] }],
    });
    const over = await deck.slot(cycle.id, slot.id);
    expect(over.figures!.reasons).toEqual([
      expect.objectContaining({
        code: 'approved_setting_missing',
        message: expect.stringContaining('Gross weight 30,000 lb is above the approved clean settings'),
      }),
    ]);
  });

  it('takes an aircraft of the type back to re-verify when its approved settings change under it', async () => {
    const { side, type } = await aircraftOfNewType([cleanOnCat1(10)]);
    const cycle = await deck.createCycle();
    const slot = await deck.addSlot(cycle.id, side, { pilotEmail: pilot(7), grossWeightLb: 30_000, stores: '' });
    await deck.place(cycle.id, slot.id, 1);
    await deck.start(cycle.id);
    const ready = await deck.readyToLaunch(cycle.id, slot.id, pilot(7));
    expect(ready).toMatchObject({ status: 'pilot_ready', figures: { catapultSetting: 10 } });
    const before = (await deck.snapshot(cycle.id)).version;

    await deck.ok(ADMIN, 'put', `/api/aircraft-types/${type.id}/setting-tables`, { tables: [cleanOnCat1(12)] });
    const dropped = await deck.slot(cycle.id, slot.id);
    expect(dropped).toMatchObject({
      status: 'weight_agreed',
      reverifyCause: 'launch_data',
      agreedWeightLb: 30_000,
      figures: { catapultSetting: 12 },
    });
    const refused = await deck.launch(cycle.id, dropped, launchKey());
    expect(refused.body).toMatchObject({
      code: 'reverify_required',
      message: `Figures changed (the launch data) — re-verify the setting for ${side}.`,
    });
    const { items } = await deck.ok<Page<LineupChange>>(
      OBSERVER,
      'get',
      `/api/cycles/${cycle.id}/lineup/changes?since=${before}`,
    );
    expect(items).toHaveLength(1);
    expect(items[0]).toMatchObject({
      kind: 'launch_data_changed',
      summary: `The approved setting tables of ${type.designation} changed; re-verify: ${side} to weight agreed`,
    });
  });

  it("flags an energy model further from the approved setting than the ship's tolerance, as a warning only", async () => {
    const { side, type } = await aircraftOfNewType([cleanOnCat1(10)]);
    const cycle = await deck.createCycle();
    const slot = await deck.addSlot(cycle.id, side, { grossWeightLb: 30_000, stores: '' });
    await deck.place(cycle.id, slot.id, 1);
    const estimate = (await deck.slot(cycle.id, slot.id)).figures!.crossCheckSetting!;
    const approve = (setting: number) =>
      deck.ok(ADMIN, 'put', `/api/aircraft-types/${type.id}/setting-tables`, { tables: [cleanOnCat1(setting)] });

    // The default tolerance is 2 settings.
    await approve(estimate + 2);
    expect((await deck.slot(cycle.id, slot.id)).figures).toMatchObject({
      catapultSetting: estimate + 2,
      crossCheckSetting: estimate,
      crossCheckFlagged: false,
    });
    await approve(estimate + 3);
    const flagged = (await deck.slot(cycle.id, slot.id)).figures!;
    expect(flagged).toMatchObject({ catapultSetting: estimate + 3, crossCheckFlagged: true });
    expect(flagged.reasons).toEqual([]);

    const ship = (await deck.ok<ShipView[]>(OBSERVER, 'get', '/api/ships'))[0];
    await deck.ok(ADMIN, 'patch', `/api/ships/${ship.id}`, {
      profile: { ...ship.profile, settingCrossCheckTolerance: 3 },
    });
    try {
      expect((await deck.slot(cycle.id, slot.id)).figures!.crossCheckFlagged).toBe(false);
      const refused = await deck.call(ADMIN, 'patch', `/api/ships/${ship.id}`, {
        profile: { ...ship.profile, settingCrossCheckTolerance: -1 },
      });
      expect(refused.status).toBe(400);
      expect(refused.body.message).toMatch(/settingCrossCheckTolerance must be at least 0 settings/);
    } finally {
      await deck.ok(ADMIN, 'patch', `/api/ships/${ship.id}`, { profile: ship.profile });
    }
  });
});
