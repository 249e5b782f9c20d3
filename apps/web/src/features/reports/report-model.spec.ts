import {
  zoneName,
  type CatapultTimeline,
  type CycleReport,
  type CycleView,
  type ReportLaunch,
} from '@catline/contracts';
import { describe, expect, it } from 'vitest';
import { formatDelta, formatDuration, pickReportCycle, timelinePoints, timelineSummary } from './report-model.js';

function cycle(id: number, plannedLaunchAt: string, state: CycleView['state']): CycleView {
  return {
    id,
    shipId: 1,
    number: id,
    state,
    version: 1,
    slotCount: 0,
    launchedCount: 0,
    windGustFromDeg: 0,
    windGustKt: 10,
    windLullFromDeg: 0,
    windLullKt: 10,
    windReadAt: '2026-12-02T05:30:00.000Z',
    windStaleAt: '2026-12-02T06:00:00.000Z',
    latitudeDeg: null,
    longitudeDeg: null,
    timeZone: 'UTC',
    launchPrerequisites: [],
    plannedLaunchAt,
    windowStartAt: plannedLaunchAt,
    windowEndAt: plannedLaunchAt,
    shipCourseDeg: 0,
    shipSpeedKt: 20,
    trueWindFromDeg: 0,
    trueWindSpeedKt: 10,
    temperatureC: 15,
    pressureHpa: 1013,
    weatherCase: 'I',
    night: false,
    landingArea: 'clear',
    landingAreaReason: null,
    respot: null,
  };
}

function launch(
  slotId: number,
  sideNumber: string,
  catapultNumber: number,
  plannedAt: string | null,
  launchedAt: string | null,
  deltaS: number | null,
): ReportLaunch {
  return {
    slotId,
    sideNumber,
    typeDesignation: 'KX-9',
    squadronId: 1,
    squadronCode: 'VX-41',
    pilotName: null,
    mission: 'CAP',
    catapultNumber,
    plannedCatapultNumber: catapultNumber,
    plannedAt,
    launchedAt,
    deltaS,
    inWindow: launchedAt ? true : null,
    status: launchedAt ? 'launched' : 'scratched',
    waiverReason: null,
    launchRecord: null,
  };
}

function catapult(number: number, launches: ReportLaunch[]): CatapultTimeline {
  return {
    catapultId: 10 + number,
    number,
    position: 'bow',
    pair: 1,
    resetIntervalS: 45,
    launches,
    intervals: [],
    spread: { shortestS: null, meanS: null, longestS: null },
  };
}

function report(catapults: CatapultTimeline[]): CycleReport {
  const empty = {
    aircraft: 0,
    launched: 0,
    onTime: 0,
    outsideWindow: 0,
    suspends: 0,
    down: 0,
    waivers: 0,
    scratched: 0,
  };
  return {
    // A ship on +04:00 all year (IANA tz database, "Zone Asia/Dubai ... 4:00 - +04"): 10:00Z is 14:00 on board.
    cycle: { ...cycle(1, '2026-12-02T10:00:00.000Z', 'closed'), timeZone: 'Asia/Dubai' },
    plannedBasis: 'cycle_start',
    plannedAtVersion: 3,
    startedAt: null,
    closedAt: null,
    firstLaunchAt: null,
    lastLaunchAt: null,
    catapults,
    pairs: [],
    suspends: [],
    downs: [],
    waivers: [],
    totals: empty,
    squadrons: [],
  };
}

describe('pickReportCycle', () => {
  const cycles = [
    cycle(1, '2026-12-01T08:00:00.000Z', 'closed'),
    cycle(2, '2026-12-01T12:00:00.000Z', 'closed'),
    cycle(3, '2026-12-01T16:00:00.000Z', 'executing'),
  ];

  it('opens on the cycle asked for', () => {
    expect(pickReportCycle(cycles, 1)?.id).toBe(1);
  });

  it('otherwise opens on the latest closed cycle by planned launch', () => {
    expect(pickReportCycle(cycles, null)?.id).toBe(2);
    expect(pickReportCycle(cycles, 99)?.id).toBe(2);
  });

  it('opens on the latest cycle when none is closed, and on nothing without cycles', () => {
    expect(
      pickReportCycle(
        [cycles[0], cycles[2]].map((each) => ({ ...each, state: 'planning' as const })),
        null,
      )?.id,
    ).toBe(3);
    expect(pickReportCycle([], null)).toBeUndefined();
  });
});

describe('durations for people', () => {
  it.each([
    [58.44, '58.4 s'],
    [119.94, '119.9 s'],
    [120, '2 min 00 s'],
    [2095, '34 min 55 s'],
    [-7.25, '7.3 s'],
  ])('%d s reads "%s"', (seconds, text) => {
    expect(formatDuration(seconds)).toBe(text);
  });

  it('signs a delta by late or early, and calls a twentieth of a second "as planned"', () => {
    expect(formatDelta(12.5)).toBe('+12.5 s');
    expect(formatDelta(-3)).toBe('−3.0 s');
    expect(formatDelta(0.049)).toBe('as planned');
    expect(formatDelta(null)).toBe('—');
  });
});

describe('the timeline', () => {
  const cat1 = catapult(1, [
    launch(1, 'C21', 1, '2026-12-02T10:00:00.000Z', '2026-12-02T10:00:12.000Z', 12),
    launch(2, 'C22', 1, '2026-12-02T10:01:00.000Z', '2026-12-02T10:00:58.000Z', -2),
    launch(3, 'C23', 1, '2026-12-02T10:02:00.000Z', null, null),
  ]);
  const cat2 = catapult(2, [launch(4, 'D33', 2, null, '2026-12-02T10:03:00.000Z', null)]);

  it('marks planned and actual launches with a label each', () => {
    const { planned, actual } = timelinePoints(report([cat1, cat2]));
    const zone = zoneName('Asia/Dubai');
    expect(planned.map((point) => point.label)).toEqual([
      `C21 planned 14:00:00 ${zone} on cat 1`,
      `C22 planned 14:01:00 ${zone} on cat 1`,
      `C23 planned 14:02:00 ${zone} on cat 1`,
    ]);
    expect(actual.map((point) => [point.slotId, point.time])).toEqual([
      [1, Date.parse('2026-12-02T10:00:12.000Z')],
      [2, Date.parse('2026-12-02T10:00:58.000Z')],
      [4, Date.parse('2026-12-02T10:03:00.000Z')],
    ]);
  });

  it('summarises each catapult with its launches, their span and the mean delta', () => {
    const zone = zoneName('Asia/Dubai');
    expect(timelineSummary(report([cat1, cat2, catapult(3, [])]))).toBe(
      `Cat 1: 2 of 3 launched, from 14:00:12 ${zone} to 14:00:58 ${zone}, on average +5.0 s against the plan. Cat 2: 1 of 1 launched, from 14:03:00 ${zone} to 14:03:00 ${zone}.`,
    );
  });

  it('says so when no aircraft was planned on a catapult', () => {
    expect(timelineSummary(report([catapult(1, [])]))).toBe('No aircraft were planned on a catapult in this cycle.');
  });
});
