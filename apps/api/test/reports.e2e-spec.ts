import {
  LAUNCH_CAUTION,
  applyLineupChanges,
  type AircraftView,
  type CycleReplay,
  type CycleReport,
  type CycleView,
  type LineupSnapshot,
  type ReportLaunch,
  type ShotCounts,
  type SlotView,
} from '@catline/contracts';
import type { INestApplication } from '@nestjs/common';
import { parse } from 'csv-parse/sync';
import request from 'supertest';
import {
  AIR_OPS,
  HANDLER,
  LineupDriver,
  OBSERVER,
  catapultOfficer,
  goodConditions,
  launchKey,
  pilot,
} from './support/lineup-fixtures.js';
import { readChangeLog } from './support/change-log.js';
import { bearer } from './support/sign-in.js';
import { startTestApp } from './support/test-app.js';

// One cycle flown through the real commands: a reorder, a down aircraft replaced by a spare, a launch
// under the air boss's waiver, the window closed early so two launches fall outside it, a suspend and resume,
// and an aircraft left to be scratched at the close. Every expected figure is worked out here by hand
// from the times the API recorded.

const MINUTE = 60_000;
const DAY = 86_400_000;
const iso = (ms: number) => new Date(ms).toISOString();
const utcDay = (ms: number) => iso(ms).slice(0, 10);
/** An instant as the exports write it on the demo ship, which keeps UTC: to the second, offset +00:00. */
const onDemoShip = (iso: string) => `${iso.slice(0, 19)}+00:00`;
const seconds = (from: string, to: string) => (Date.parse(to) - Date.parse(from)) / 1000;

// The launch record's note of the waiver: the gate in words, then the air boss's reason.
const WAIVER = 'excess wind over deck below the recommended value: Ship cannot make more wind';
const SUSPEND = 'Launch bar not seated';

interface Flown {
  cycle: CycleView;
  /** Slot ids by side number. */
  ids: Record<string, number>;
  /** The lineup as the start change left it. */
  atStart: LineupSnapshot;
  /** The lineup after the close. */
  final: LineupSnapshot;
  launchedAt: Record<string, string>;
  windowEndAt: string;
}

/** Parses a CSV answer into its header and rows, after checking it opens with the launch caution line. */
function readCsv(response: request.Response): { header: string[]; rows: Record<string, string>[] } {
  const text = response.text;
  expect(text.startsWith(`\uFEFF# ${LAUNCH_CAUTION}\r\n`)).toBe(true);
  const records = parse(text, { bom: true, comment: '#', comment_no_infix: true }) as string[][];
  const [header, ...lines] = records;
  return { header, rows: lines.map((line) => Object.fromEntries(header.map((name, i) => [name, line[i]]))) };
}

describe('cycle reports, exports and shot counts', () => {
  let app: INestApplication;
  let url: string;
  let deck: LineupDriver;
  let flown: Flown;
  let range: { from: string; to: string };
  let shotsBefore: ShotCounts;

  const get = async (path: string, email = OBSERVER) =>
    request(url)
      .get(path)
      .set(bearer(await deck.token(email)));

  async function fly(): Promise<Flown> {
    const now = Date.now();
    const cycle = await deck.createCycle({
      plannedLaunchAt: iso(now - MINUTE),
      windowStartAt: iso(now - 10 * MINUTE),
      windowEndAt: iso(now + 50 * MINUTE),
    });
    const add = async (side: string, fields: Parameters<LineupDriver['addSlot']>[2] = {}) =>
      (await deck.addSlot(cycle.id, side, fields)).id;
    const ids: Record<string, number> = {
      C25: await add('C25', { pilotEmail: pilot(2) }),
      C26: await add('C26', { pilotEmail: pilot(3) }),
      D37: await add('D37', { pilotEmail: pilot(4), grossWeightLb: 51_000 }),
      // D38's pilot walks to the spare C27 when D38 goes down.
      D38: await add('D38', { pilotEmail: pilot(5) }),
      C27: await add('C27', { spare: true }),
      D39: await add('D39'),
    };

    await deck.place(cycle.id, ids['C25'], 1);
    await deck.place(cycle.id, ids['C26'], 1);
    await deck.place(cycle.id, ids['C26'], 1, 0);
    for (const side of ['D37', 'D38', 'D39']) await deck.place(cycle.id, ids[side], 2);
    const down = await deck.slot(cycle.id, ids['D38']);
    await deck.ok(HANDLER, 'post', `/api/cycles/${cycle.id}/lineup/slots/${down.id}/down`, {
      slotVersion: down.version,
      spareSlotId: ids['C27'],
    });

    // The lineup as the start left it, from the log: a read after it is projected from the later moment.
    const beforeStart = await deck.snapshot(cycle.id);
    const started = await deck.start(cycle.id);
    const atStart = applyLineupChanges(
      beforeStart,
      (await readChangeLog(url, await deck.token(OBSERVER), cycle.id, { since: beforeStart.version })).filter(
        (change) => change.version <= started.version,
      ),
    );
    const launchedAt: Record<string, string> = {};
    const launch = async (side: string) => {
      const response = await deck.launch(cycle.id, await deck.slot(cycle.id, ids[side]), launchKey());
      expect(response.status).toBe(200);
      launchedAt[side] = (await deck.slot(cycle.id, ids[side])).launchedAt!;
    };

    await deck.readyToLaunch(cycle.id, ids['C26'], pilot(3));
    await launch('C26');
    // 8 kt of tailwind with the ship stopped: D37 at 51,000 lb has excess wind over deck above zero but
    // under the recommended value (readiness.e2e-spec works the figure), which the air boss waives.
    const conditions = async (values: object) =>
      deck.ok(AIR_OPS, 'patch', `/api/cycles/${cycle.id}/conditions`, {
        basisVersion: (await deck.snapshot(cycle.id)).version,
        ...values,
      });
    await conditions({ shipSpeedKt: 0, trueWindFromDeg: 180, trueWindSpeedKt: 8 });
    const heavy = await deck.readyToLaunch(cycle.id, ids['D37'], pilot(4));
    expect(heavy.figures!.go).toBe(false);
    expect(
      (await deck.waive(cycle.id, ids['D37'], 'excess_below_recommended', 'Ship cannot make more wind')).status,
    ).toBe(200);
    await launch('D37');
    await conditions({ shipSpeedKt: goodConditions.shipSpeedKt, trueWindFromDeg: 0, trueWindSpeedKt: 10 });

    // The window closes a millisecond after the last launch so far: what follows launches outside it.
    const windowEndAt = iso(Math.max(Date.parse(launchedAt['C26']), Date.parse(launchedAt['D37'])) + 1);
    const { version } = await deck.snapshot(cycle.id);
    await deck.ok(AIR_OPS, 'patch', `/api/cycles/${cycle.id}/conditions`, { basisVersion: version, windowEndAt });

    await deck.readyToLaunch(cycle.id, ids['C25'], pilot(2));
    const tensioned = await deck.slot(cycle.id, ids['C25']);
    await deck.ok(catapultOfficer(1), 'post', `/api/cycles/${cycle.id}/lineup/slots/${tensioned.id}/suspend`, {
      slotVersion: tensioned.version,
      reason: SUSPEND,
    });
    expect((await deck.step(cycle.id, ids['C25'], 'resume')).status).toBe(200);
    await deck.stepThrough(cycle.id, ids['C25']);
    await launch('C25');
    await deck.readyToLaunch(cycle.id, ids['C27'], pilot(5));
    await launch('C27');

    const { version: last } = await deck.snapshot(cycle.id);
    await deck.ok(AIR_OPS, 'post', `/api/cycles/${cycle.id}/close`, { basisVersion: last });
    return { cycle, ids, atStart, final: await deck.snapshot(cycle.id), launchedAt, windowEndAt };
  }

  beforeAll(async () => {
    ({ app, url } = await startTestApp());
    deck = new LineupDriver(url);
    // Three UTC days around now, so a run across midnight still counts its own launches.
    range = { from: utcDay(Date.now() - DAY), to: utcDay(Date.now() + DAY) };
    shotsBefore = (await get(`/api/reports/shot-counts?from=${range.from}&to=${range.to}`)).body as ShotCounts;
    flown = await fly();
  }, 180_000);

  afterAll(async () => {
    await app.close();
  });

  describe('the cycle report', () => {
    let report: CycleReport;
    const line = (side: string): ReportLaunch =>
      report.catapults.flatMap((catapult) => catapult.launches).find((entry) => entry.sideNumber === side)!;
    const planned = (side: string): string =>
      flown.atStart.slots.find((slot) => slot.id === flown.ids[side])!.projectedLaunchAt!;

    beforeAll(async () => {
      const response = await get(`/api/cycles/${flown.cycle.id}/report`);
      expect(response.status).toBe(200);
      report = response.body as CycleReport;
    });

    it('reads the planned times from the lineup as it stood when the cycle started', () => {
      expect(report.cycle).toMatchObject({ id: flown.cycle.id, state: 'closed', windowEndAt: flown.windowEndAt });
      expect(report.plannedBasis).toBe('cycle_start');
      for (const side of ['C25', 'C26', 'D37', 'C27', 'D39']) {
        expect({ side, plannedAt: line(side).plannedAt }).toEqual({ side, plannedAt: planned(side) });
      }
      expect(line('C25')).toMatchObject({ plannedCatapultNumber: 1, catapultNumber: 1 });
      expect(line('C27')).toMatchObject({ plannedCatapultNumber: 2, catapultNumber: 2 });
    });

    it('sets each actual launch time against its planned time', () => {
      for (const side of ['C25', 'C26', 'D37', 'C27']) {
        expect({ side, launchedAt: line(side).launchedAt, deltaS: line(side).deltaS }).toEqual({
          side,
          launchedAt: flown.launchedAt[side],
          deltaS: seconds(planned(side), flown.launchedAt[side]),
        });
      }
      expect(line('D39')).toMatchObject({ status: 'scratched', launchedAt: null, deltaS: null, inWindow: null });
    });

    it('orders each catapult by launch, and measures the intervals per catapult and per pair', () => {
      const cat = (number: number) => report.catapults.find((catapult) => catapult.number === number)!;
      expect(cat(1).launches.map((entry) => entry.sideNumber)).toEqual(['C26', 'C25']);
      expect(cat(2).launches.map((entry) => entry.sideNumber)).toEqual(['D37', 'C27', 'D39']);
      expect(cat(3).launches).toEqual([]);
      expect(cat(1).intervals.map((interval) => interval.seconds)).toEqual([
        seconds(flown.launchedAt['C26'], flown.launchedAt['C25']),
      ]);
      expect(cat(2).intervals.map((interval) => interval.seconds)).toEqual([
        seconds(flown.launchedAt['D37'], flown.launchedAt['C27']),
      ]);

      // Catapults 1 and 2 are the bow pair: its four launches in the order they were made.
      const bow = report.pairs.find((pair) => pair.pair === 1)!;
      const order = ['C26', 'D37', 'C25', 'C27'];
      expect(bow.catapultNumbers).toEqual([1, 2]);
      expect(
        bow.intervals.map((interval) => [interval.fromSideNumber, interval.toSideNumber, interval.seconds]),
      ).toEqual(
        order.slice(1).map((side, i) => [order[i], side, seconds(flown.launchedAt[order[i]], flown.launchedAt[side])]),
      );
      const gaps = bow.intervals.map((interval) => interval.seconds);
      expect(bow.spread.shortestS).toBe(Math.min(...gaps));
      expect(bow.spread.longestS).toBe(Math.max(...gaps));
      expect(report.pairs.find((pair) => pair.pair === 2)!.intervals).toEqual([]);
    });

    it('judges the launches against the window as it was last set', () => {
      expect(['C26', 'D37', 'C25', 'C27'].map((side) => [side, line(side).inWindow])).toEqual([
        ['C26', true],
        ['D37', true],
        ['C25', false],
        ['C27', false],
      ]);
    });

    it('lists the suspend, the down aircraft with its spare and the waiver', () => {
      expect(report.suspends).toHaveLength(1);
      expect(report.suspends[0]).toMatchObject({
        sideNumber: 'C25',
        squadronCode: 'CWR',
        catapultNumber: 1,
        reason: SUSPEND,
        by: 'Lia Corrimand',
      });
      expect(Date.parse(report.suspends[0].resumedAt!)).toBeGreaterThanOrEqual(Date.parse(report.suspends[0].at));
      expect(report.downs).toEqual([
        expect.objectContaining({
          sideNumber: 'D38',
          squadronCode: 'DFM',
          catapultNumber: 2,
          by: 'Tomas Ebberhold',
          spare: { slotId: flown.ids['C27'], sideNumber: 'C27', squadronCode: 'CWR' },
        }),
      ]);
      expect(report.waivers).toEqual([
        {
          slotId: flown.ids['D37'],
          sideNumber: 'D37',
          squadronCode: 'DFM',
          catapultNumber: 2,
          launchedAt: flown.launchedAt['D37'],
          reason: WAIVER,
          by: 'Sam Dellavint',
        },
      ]);
    });

    it('sums the figures for the cycle and per squadron', () => {
      // C25, C26, C27 (CWR) and D37, D38, D39 (DFM); D38 down, D39 scratched; C26 and D37 inside the window.
      expect(report.totals).toEqual({
        aircraft: 6,
        launched: 4,
        onTime: 2,
        outsideWindow: 2,
        suspends: 1,
        down: 1,
        waivers: 1,
        scratched: 1,
      });
      expect(report.squadrons.map(({ squadronId: _id, ...figures }) => figures)).toEqual([
        {
          squadronCode: 'CWR',
          squadronName: 'Cinderwrights',
          aircraft: 3,
          launched: 3,
          onTime: 1,
          outsideWindow: 2,
          suspends: 1,
          down: 0,
          waivers: 0,
          scratched: 0,
        },
        {
          squadronCode: 'DFM',
          squadronName: 'Driftmenders',
          aircraft: 3,
          launched: 1,
          onTime: 1,
          outsideWindow: 0,
          suspends: 0,
          down: 1,
          waivers: 1,
          scratched: 1,
        },
      ]);
      const times = Object.values(flown.launchedAt).sort();
      expect(report).toMatchObject({ firstLaunchAt: times[0], lastLaunchAt: times[3] });
      expect(report.closedAt).not.toBeNull();
    });

    it('answers 404 for a cycle that does not exist and 400 for an id that is not a number', async () => {
      const missing = await get('/api/cycles/999999/report');
      expect(missing.status).toBe(404);
      expect(missing.body.message).toBe('Cycle 999999 does not exist.');
      expect((await get('/api/cycles/seven/report')).status).toBe(400);
    });
  });

  describe('the replay', () => {
    let replay: CycleReplay;

    beforeAll(async () => {
      const response = await get(`/api/cycles/${flown.cycle.id}/replay`);
      expect(response.status).toBe(200);
      replay = response.body as CycleReplay;
    });

    it('starts from the empty cycle at version 0 and holds every change in order', () => {
      expect(replay.start).toMatchObject({ version: 0, slots: [], pool: [] });
      expect(replay.start.cycle).toMatchObject({ id: flown.cycle.id, state: 'planning', version: 0, slotCount: 0 });
      expect(replay.start.lanes.map((lane) => lane.slotIds)).toEqual([[], [], [], []]);
      expect(replay.changes.map((change) => change.version)).toEqual(
        Array.from({ length: flown.final.version }, (_, i) => i + 1),
      );
    });

    it('rebuilds the lineup as it stood at the start and at the end', () => {
      const started = replay.changes.find((change) => change.kind === 'cycle_started')!;
      const upToStart = replay.changes.filter((change) => change.version <= started.version);
      expect(applyLineupChanges(replay.start, upToStart)).toEqual(flown.atStart);
      expect(applyLineupChanges(replay.start, replay.changes)).toEqual(flown.final);
    });
  });

  describe('CSV exports of a cycle', () => {
    it('exports the slots with planned and actual times', async () => {
      const response = await get(`/api/cycles/${flown.cycle.id}/slots.csv`);
      expect(response.status).toBe(200);
      expect(response.headers['content-type']).toBe('text/csv; charset=utf-8');
      expect(response.headers['content-disposition']).toBe(
        `attachment; filename="cycle-${flown.cycle.number}-slots.csv"`,
      );
      const { header, rows } = readCsv(response);
      expect(header).toEqual([
        'slot_id',
        'side_number',
        'type',
        'squadron',
        'pilot',
        'mission',
        'gross_weight_lb',
        'fuel_lb',
        'stores',
        'tanker',
        'early_warning',
        'spare',
        'status',
        'catapult',
        'position',
        'planned_catapult',
        'planned_at',
        'launched_at',
        'delta_s',
        'in_window',
        'pilot_weight_ack_at',
        'catapult_weight_ack_at',
        'suspend_reason',
        'waiver_reason',
        'down_at',
        'replaced_by',
        'record_source',
        'agreed_weight_lb',
        'launch_data_setting',
        'cross_check_setting',
        'wind_from_deg',
        'wind_speed_kt',
        'ship_course_deg',
        'ship_speed_kt',
        'wind_read_at',
        'headwind_kt',
        'crosswind_kt',
        'crosswind_side',
        'end_speed_kt',
        'margin_kt',
        'excess_wind_over_deck_kt',
        'recommended_excess_kt',
        'trim_deg',
        'afterburner',
        'waiver',
        'fired_by',
        'time_zone',
      ]);
      expect(rows.map((row) => row.side_number)).toEqual(['C25', 'C26', 'D37', 'D38', 'C27', 'D39']);
      const row = (side: string) => rows.find((candidate) => candidate.side_number === side)!;
      const plannedAt = flown.atStart.slots.find((slot) => slot.id === flown.ids['C25'])!.projectedLaunchAt!;
      expect(row('C25')).toMatchObject({
        slot_id: String(flown.ids['C25']),
        squadron: 'CWR',
        pilot: 'Jo Fettleworth',
        status: 'launched',
        catapult: '1',
        position: '2',
        planned_catapult: '1',
        planned_at: onDemoShip(plannedAt),
        launched_at: onDemoShip(flown.launchedAt['C25']),
        delta_s: String(seconds(plannedAt, flown.launchedAt['C25'])),
        in_window: 'false',
        spare: 'false',
        suspend_reason: '',
        time_zone: 'UTC',
      });
      expect(row('D37')).toMatchObject({ gross_weight_lb: '51000', waiver_reason: WAIVER, in_window: 'true' });
      expect(row('D38')).toMatchObject({ status: 'down', catapult: '', replaced_by: 'C27' });
      expect(row('C27')).toMatchObject({ spare: 'true', catapult: '2', position: '2' });
      expect(row('D39')).toMatchObject({ status: 'scratched', launched_at: '', planned_catapult: '2' });
    });

    it('exports the change log, one row per change in version order', async () => {
      const response = await get(`/api/cycles/${flown.cycle.id}/changes.csv`);
      expect(response.status).toBe(200);
      expect(response.headers['content-type']).toBe('text/csv; charset=utf-8');
      expect(response.headers['content-disposition']).toBe(
        `attachment; filename="cycle-${flown.cycle.number}-changes.csv"`,
      );
      const { header, rows } = readCsv(response);
      expect(header).toEqual(['version', 'at', 'kind', 'actor', 'actor_role', 'summary', 'command', 'time_zone']);
      const log = (await get(`/api/cycles/${flown.cycle.id}/lineup/changes?since=0&limit=500`)).body.items as {
        version: number;
        kind: string;
        summary: string;
        at: string;
      }[];
      expect(rows.map((row) => [Number(row.version), row.kind, row.summary, row.at])).toEqual(
        log.map((change) => [change.version, change.kind, change.summary, onDemoShip(change.at)]),
      );
      expect(rows[0]).toMatchObject({ kind: 'slot_added', actor: 'Priya Quennevar', actor_role: 'air_operations' });
      expect(JSON.parse(rows[0].command)).toMatchObject({ type: 'add_slot', aircraftId: expect.any(Number) });
      const suspended = rows.find((row) => row.kind === 'slot_suspended')!;
      expect(JSON.parse(suspended.command)).toMatchObject({
        type: 'suspend',
        slotId: flown.ids['C25'],
        reason: SUSPEND,
      });
    });
  });

  describe('shot counts', () => {
    const shots = async (from: string, to: string, email = pilot(1)) =>
      get(`/api/reports/shot-counts?from=${from}&to=${to}`, email);

    it('counts the launches of the range per airframe and per catapult', async () => {
      const response = await shots(range.from, range.to);
      expect(response.status).toBe(200);
      const after = response.body as ShotCounts;
      const airframe = (counts: ShotCounts, side: string) =>
        counts.airframes.find((entry) => entry.sideNumber === side)!;
      const catapult = (counts: ShotCounts, number: number) =>
        counts.catapults.find((entry) => entry.number === number)!;
      const added = (pick: (counts: ShotCounts) => { launches: number; lifetimeShots: number }) => ({
        launches: pick(after).launches - pick(shotsBefore).launches,
        lifetime: pick(after).lifetimeShots - pick(shotsBefore).lifetimeShots,
      });
      expect(after).toMatchObject({ from: range.from, to: range.to });
      expect(after.totalLaunches - shotsBefore.totalLaunches).toBe(4);
      for (const side of ['C25', 'C26', 'D37', 'C27']) {
        expect({ side, ...added((counts) => airframe(counts, side)) }).toEqual({ side, launches: 1, lifetime: 1 });
      }
      for (const side of ['D38', 'D39'])
        expect({ side, ...added((counts) => airframe(counts, side)) }).toEqual({ side, launches: 0, lifetime: 0 });
      expect(added((counts) => catapult(counts, 1))).toEqual({ launches: 2, lifetime: 2 });
      expect(added((counts) => catapult(counts, 2))).toEqual({ launches: 2, lifetime: 2 });
    });

    it('counts nothing in a range without launches, yet lists every airframe and catapult', async () => {
      const response = await shots('2001-01-01', '2001-01-31');
      expect(response.status).toBe(200);
      const counts = response.body as ShotCounts;
      const fleet = (await get('/api/aircraft?limit=200')).body.items as AircraftView[];
      expect(counts.totalLaunches).toBe(0);
      expect(counts.airframes.map((entry) => entry.sideNumber).sort()).toEqual(
        fleet.map((plane) => plane.sideNumber).sort(),
      );
      expect(counts.airframes.every((entry) => entry.launches === 0)).toBe(true);
      expect(counts.catapults.map((entry) => [entry.number, entry.launches])).toEqual([
        [1, 0],
        [2, 0],
        [3, 0],
        [4, 0],
      ]);
    });

    it('exports the same counts as CSV', async () => {
      const json = (await shots(range.from, range.to)).body as ShotCounts;
      const response = await get(`/api/reports/shot-counts.csv?from=${range.from}&to=${range.to}`);
      expect(response.status).toBe(200);
      expect(response.headers['content-type']).toBe('text/csv; charset=utf-8');
      expect(response.headers['content-disposition']).toBe(
        `attachment; filename="shot-counts-${range.from}-to-${range.to}.csv"`,
      );
      const { header, rows } = readCsv(response);
      expect(header).toEqual([
        'kind',
        'ship',
        'catapult',
        'side_number',
        'type',
        'squadron',
        'launches',
        'lifetime_shots',
      ]);
      expect(
        rows
          .filter((row) => row.kind === 'airframe')
          .map((row) => [row.side_number, row.type, row.squadron, Number(row.launches), Number(row.lifetime_shots)]),
      ).toEqual(
        json.airframes.map((entry) => [
          entry.sideNumber,
          entry.typeDesignation,
          entry.squadronCode,
          entry.launches,
          entry.lifetimeShots,
        ]),
      );
      expect(
        rows
          .filter((row) => row.kind === 'catapult')
          .map((row) => [row.ship, Number(row.catapult), Number(row.launches)]),
      ).toEqual(json.catapults.map((entry) => [entry.shipName, entry.number, entry.launches]));
    });

    it.each([
      [
        'a day the calendar lacks',
        'from=2027-02-30&to=2027-03-01',
        'invalid_date_range',
        'from: 2027-02-30 is not a calendar day; write it as YYYY-MM-DD, e.g. 2027-01-31.',
      ],
      [
        'a range that ends before it starts',
        'from=2027-03-02&to=2027-03-01',
        'invalid_date_range',
        'The range ends before it starts: to (2027-03-01) is earlier than from (2027-03-02).',
      ],
      [
        'a date in another format',
        'from=05/01/2027&to=2027-03-01',
        'validation_failed',
        'Invalid request: from must be a day written YYYY-MM-DD, e.g. 2027-01-01',
      ],
      [
        'a missing end',
        'from=2027-03-01',
        'validation_failed',
        'Invalid request: to must be a day written YYYY-MM-DD, e.g. 2027-01-31',
      ],
      [
        'an unknown parameter',
        'from=2027-03-01&to=2027-03-02&squadron=CWR',
        'validation_failed',
        'Invalid request: property squadron should not exist',
      ],
    ])('refuses %s with a readable 400', async (_name, query, code, message) => {
      for (const path of ['/api/reports/shot-counts', '/api/reports/shot-counts.csv']) {
        const response = await get(`${path}?${query}`);
        expect({ path, status: response.status, code: response.body.code, message: response.body.message }).toEqual({
          path,
          status: 400,
          code,
          message,
        });
      }
    });
  });

  it('reads the report of the demo cycle flown earlier, whose planned times come from its start', async () => {
    const response = await get('/api/cycles/1/report');
    expect(response.status).toBe(200);
    const report = response.body as CycleReport;
    expect(report.cycle.state).toBe('closed');
    expect(report.plannedBasis).toBe('cycle_start');
    expect(report.totals).toMatchObject({ launched: 9, down: 1, suspends: 1 });
    const launches = report.catapults.flatMap((catapult) => catapult.launches);
    expect(launches.every((entry: ReportLaunch) => entry.plannedAt !== null && entry.launchedAt !== null)).toBe(true);
    const slots = (await deck.snapshot(1)).slots.filter((slot: SlotView) => slot.status === 'launched');
    expect(launches.map((entry) => entry.sideNumber).sort()).toEqual(slots.map((slot) => slot.sideNumber).sort());
  });
});
