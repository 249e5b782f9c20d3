import type { INestApplication } from '@nestjs/common';
import type { AircraftTypeView, LineupChange, Page } from '@catline/contracts';
import {
  ADMIN,
  AIR_OPS,
  LineupDriver,
  OBSERVER,
  catapultOfficer,
  deckEdgeOperator,
  launchKey,
  pilot,
} from './support/lineup-fixtures.js';
import { startTestApp } from './support/test-app.js';

// The two-person check of the setting as the trade runs it: the figure on the catapult's console is
// read back and must equal the approved setting for the agreed weight (the order of the steps from
// NAVEDTRA 14310, catapult launching procedures; the figures themselves are the demo's invented tables).
describe('the setting read back from the console, and the holdback element', () => {
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

  /** An executing cycle with one WKD-41 on cat 1, its weight agreed by `agreedBy`. */
  async function weightAgreed(pilotEmail: string, agreedBy: string) {
    const {
      cycle,
      slots: [slot],
    } = await deck.executingCycle({ 1: [{ side: 'C21', pilotEmail }] });
    await deck.stepThrough(cycle.id, slot.id, 'weight_agreed', agreedBy);
    const agreed = await deck.slot(cycle.id, slot.id);
    return { cycle, slot: agreed, approved: agreed.figures!.catapultSetting! };
  }

  it('refuses a setting that is not the approved one for the agreed weight, naming both, and changes nothing', async () => {
    const { cycle, slot, approved } = await weightAgreed(pilot(11), catapultOfficer(1));
    const wrong = await deck.step(cycle.id, slot.id, 'setting_set', deckEdgeOperator(1), undefined, approved + 1);
    expect(wrong.status).toBe(409);
    expect(wrong.body).toMatchObject({
      code: 'setting_mismatch',
      message: `The console reads ${approved + 1}, but the approved setting for C21 at 44,000 lb is ${approved}; set ${approved} and read it back again.`,
    });
    const missing = await deck.call(
      deckEdgeOperator(1),
      'post',
      `/api/cycles/${cycle.id}/lineup/slots/${slot.id}/advance`,
      { slotVersion: slot.version, to: 'setting_set' },
    );
    expect(missing.status).toBe(409);
    expect(missing.body.code).toBe('setting_not_read_back');
    const junk = await deck.call(
      deckEdgeOperator(1),
      'post',
      `/api/cycles/${cycle.id}/lineup/slots/${slot.id}/advance`,
      { slotVersion: slot.version, to: 'setting_set', settingReadBack: 18.5 },
    );
    expect(junk.status).toBe(400);
    expect(await deck.slot(cycle.id, slot.id)).toMatchObject({
      version: slot.version,
      status: 'weight_agreed',
      settingReadBack: null,
    });
  });

  it('records the match with the setter and the confirmer, in the slot and in the change log', async () => {
    const { cycle, slot, approved } = await weightAgreed(pilot(12), deckEdgeOperator(1));
    const { version } = await deck.snapshot(cycle.id);
    const read = await deck.step(cycle.id, slot.id, 'setting_set', catapultOfficer(1), undefined, approved);
    expect(read.status).toBe(200);
    const log = await deck.ok<Page<LineupChange>>(
      OBSERVER,
      'get',
      `/api/cycles/${cycle.id}/lineup/changes?since=${version}`,
    );
    const [agreedBy, readBy] = [slot.weightAgreedBy, read.body.change.actor.name];
    expect(agreedBy).not.toBeNull();
    expect(agreedBy).not.toBe(readBy);
    expect(log.items).toEqual([
      expect.objectContaining({
        kind: 'slot_advanced',
        actor: expect.objectContaining({ role: 'catapult_officer', name: readBy }),
        summary: `C21 setting ${approved} read back on cat 1 by ${readBy}, the approved setting for 44,000 lb (weight agreed by ${agreedBy})`,
      }),
    ]);
    expect(await deck.slot(cycle.id, slot.id)).toMatchObject({
      status: 'setting_set',
      settingReadBack: {
        setting: approved,
        weightLb: 44_000,
        setBy: agreedBy,
        readBackBy: readBy,
        at: expect.any(String),
      },
    });
  });

  it('lets one catapult officer agree the weight and read the setting back, naming them as both', async () => {
    const { cycle, slot, approved } = await weightAgreed(pilot(13), catapultOfficer(1));
    expect((await deck.step(cycle.id, slot.id, 'setting_set', catapultOfficer(1))).status).toBe(200);
    const { settingReadBack } = await deck.slot(cycle.id, slot.id);
    expect(settingReadBack).toMatchObject({ setting: approved, setBy: slot.weightAgreedBy });
    expect(settingReadBack!.readBackBy).toBe(slot.weightAgreedBy);
  });

  it('drops the read-back with the aircraft when the wind changes, and takes it again before the launch', async () => {
    const { cycle, slot } = await weightAgreed(pilot(14), catapultOfficer(1));
    await deck.stepThrough(cycle.id, slot.id, 'tensioned');
    expect((await deck.slot(cycle.id, slot.id)).settingReadBack).not.toBeNull();
    const { version } = await deck.snapshot(cycle.id);
    await deck.ok(AIR_OPS, 'patch', `/api/cycles/${cycle.id}/conditions`, {
      basisVersion: version,
      trueWindSpeedKt: 14,
    });
    const dropped = await deck.slot(cycle.id, slot.id);
    expect(dropped).toMatchObject({
      status: 'weight_agreed',
      reverifyCause: 'wind',
      settingReadBack: null,
      weightAgreedBy: slot.weightAgreedBy,
    });
    const stale = await deck.step(cycle.id, slot.id, 'setting_set', catapultOfficer(1), undefined, 0);
    expect(stale.body.code).toBe('setting_mismatch');
    expect((await deck.step(cycle.id, slot.id, 'setting_set')).status).toBe(200);
    await deck.stepThrough(cycle.id, slot.id);
    const ready = await deck.slot(cycle.id, slot.id);
    expect(ready.settingReadBack).toMatchObject({ setting: ready.figures!.catapultSetting });
    expect((await deck.launch(cycle.id, ready, launchKey())).status).toBe(200);
  });

  it('drops the read-back and who agreed the weight when the pilot answers another figure', async () => {
    const { cycle, slot } = await weightAgreed(pilot(15), catapultOfficer(1));
    await deck.step(cycle.id, slot.id, 'setting_set');
    const set = await deck.slot(cycle.id, slot.id);
    await deck.ok(pilot(15), 'post', `/api/cycles/${cycle.id}/lineup/slots/${slot.id}/weight-ack`, {
      slotVersion: set.version,
      grossWeightLb: 46_500,
    });
    expect(await deck.slot(cycle.id, slot.id)).toMatchObject({
      status: 'on_catapult',
      agreedWeightLb: null,
      weightAgreedBy: null,
      settingReadBack: null,
    });
  });

  it('forgets the read-back when its step is undone', async () => {
    const { cycle, slot } = await weightAgreed(pilot(16), catapultOfficer(1));
    await deck.step(cycle.id, slot.id, 'setting_set');
    const set = await deck.slot(cycle.id, slot.id);
    await deck.ok(catapultOfficer(1), 'post', `/api/cycles/${cycle.id}/lineup/slots/${slot.id}/undo`, {
      slotVersion: set.version,
    });
    expect(await deck.slot(cycle.id, slot.id)).toMatchObject({ status: 'weight_agreed', settingReadBack: null });
  });

  it('names the holdback release element of the type, the admin’s to change, checked as typed, moving no figure', async () => {
    const types = await deck.ok<AircraftTypeView[]>(ADMIN, 'get', '/api/aircraft-types');
    const type = types.find((candidate) => candidate.designation === 'WKD-41')!;
    // The demo's invented designation.
    expect(type.holdbackElement).toBe('RE-14');
    const {
      cycle,
      slots: [slot],
    } = await deck.executingCycle({ 1: [{ side: 'C21', pilotEmail: pilot(17) }] });
    await deck.stepThrough(cycle.id, slot.id, 'tensioned');
    expect((await deck.slot(cycle.id, slot.id)).holdbackElement).toBe('RE-14');
    const path = `/api/aircraft-types/${type.id}`;
    const bad = await deck.call(ADMIN, 'patch', path, { holdbackElement: 'RE 14;' });
    expect(bad.status).toBe(400);
    expect(bad.body.message).toContain('holdbackElement is the designation marked on the element');
    expect((await deck.call(pilot(17), 'patch', path, { holdbackElement: 'RE-15' })).status).toBe(403);
    try {
      const changed = await deck.ok<AircraftTypeView>(ADMIN, 'patch', path, { holdbackElement: 'RE-15' });
      expect(changed.holdbackElement).toBe('RE-15');
      // Which element is fitted does not change the setting: the aircraft stays where it was.
      expect(await deck.slot(cycle.id, slot.id)).toMatchObject({
        holdbackElement: 'RE-15',
        status: 'tensioned',
        reverifyCause: null,
      });
      expect((await deck.ok<AircraftTypeView>(ADMIN, 'patch', path, { holdbackElement: null })).holdbackElement).toBe(
        null,
      );
    } finally {
      await deck.ok(ADMIN, 'patch', path, { holdbackElement: 'RE-14' });
    }
  });
});
