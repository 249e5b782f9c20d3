import {
  countFigures,
  insideWindow,
  intervalSpread,
  launchIntervals,
  secondsBetween,
  type FlownLaunch,
} from './report-figures.js';

// Every expected value below is worked by hand from the times in the test (common practice, no source).

const at = (clock: string) => Date.parse(`2027-01-05T${clock}Z`);
const launch = (slotId: number, catapultNumber: number, clock: string): FlownLaunch => ({
  slotId,
  sideNumber: `C${20 + slotId}`,
  catapultNumber,
  launchedAtMs: at(clock),
});

describe('launchIntervals', () => {
  it('measures each launch from the one before it, in launch order whatever the input order', () => {
    const intervals = launchIntervals([
      launch(3, 1, '10:02:10.500'),
      launch(1, 1, '10:00:00.000'),
      launch(2, 2, '10:01:05.250'),
    ]);
    expect(intervals.map((interval) => [interval.fromSideNumber, interval.toSideNumber, interval.seconds])).toEqual([
      ['C21', 'C22', 65.25], // 10:00:00.000 → 10:01:05.250
      ['C22', 'C23', 65.25], // 10:01:05.250 → 10:02:10.500
    ]);
    expect(intervals[0]).toMatchObject({ fromCatapultNumber: 1, toCatapultNumber: 2 });
  });

  it('has no interval for fewer than two launches', () => {
    expect(launchIntervals([])).toEqual([]);
    expect(launchIntervals([launch(1, 1, '10:00:00.000')])).toEqual([]);
  });

  it('keeps simultaneous launches in slot order with a zero interval', () => {
    const intervals = launchIntervals([launch(9, 2, '10:00:00.000'), launch(4, 1, '10:00:00.000')]);
    expect(intervals).toHaveLength(1);
    expect(intervals[0]).toMatchObject({ fromSlotId: 4, toSlotId: 9, seconds: 0 });
  });
});

describe('intervalSpread', () => {
  it('gives the shortest, the mean to the millisecond and the longest', () => {
    const intervals = launchIntervals([
      launch(1, 1, '10:00:00.000'),
      launch(2, 1, '10:00:55.000'),
      launch(3, 1, '10:02:00.001'),
      launch(4, 1, '10:03:00.000'),
    ]);
    // 55.000, 65.001 and 59.999 s: mean 180.000 / 3 = 60.000 s.
    expect(intervalSpread(intervals)).toEqual({ shortestS: 55, meanS: 60, longestS: 65.001 });
  });

  it('rounds a mean that does not fall on a millisecond', () => {
    const intervals = launchIntervals([
      launch(1, 1, '10:00:00.000'),
      launch(2, 1, '10:00:00.001'),
      launch(3, 1, '10:00:00.003'),
    ]);
    // 1 ms and 2 ms: mean 1.5 ms, rounded half up to 2 ms.
    expect(intervalSpread(intervals).meanS).toBe(0.002);
  });

  it('is empty without intervals', () => {
    expect(intervalSpread([])).toEqual({ shortestS: null, meanS: null, longestS: null });
  });
});

describe('insideWindow', () => {
  const window = { startAt: '2027-01-05T09:50:00.000Z', endAt: '2027-01-05T10:35:00.000Z' };

  it('counts both ends of the window as inside', () => {
    expect(insideWindow('2027-01-05T09:50:00.000Z', window)).toBe(true);
    expect(insideWindow('2027-01-05T10:35:00.000Z', window)).toBe(true);
    expect(insideWindow('2027-01-05T10:10:00.000Z', window)).toBe(true);
  });

  it('counts a millisecond before or after as outside', () => {
    expect(insideWindow('2027-01-05T09:49:59.999Z', window)).toBe(false);
    expect(insideWindow('2027-01-05T10:35:00.001Z', window)).toBe(false);
  });
});

describe('secondsBetween', () => {
  it('is positive when the launch came after the plan and negative when before', () => {
    expect(secondsBetween('2027-01-05T10:00:00.000Z', '2027-01-05T10:01:30.250Z')).toBe(90.25);
    expect(secondsBetween('2027-01-05T10:00:00.000Z', '2027-01-05T09:59:45.000Z')).toBe(-15);
  });
});

describe('countFigures', () => {
  it('counts launches, window verdicts, down, waivers and scratched aircraft, with the suspends given', () => {
    const figures = countFigures(
      [
        { status: 'launched', inWindow: true, waiverReason: null },
        { status: 'launched', inWindow: false, waiverReason: 'Margin within ship limits' },
        { status: 'launched', inWindow: true, waiverReason: null },
        { status: 'down', inWindow: null, waiverReason: null },
        { status: 'scratched', inWindow: null, waiverReason: null },
      ],
      2,
    );
    expect(figures).toEqual({
      aircraft: 5,
      launched: 3,
      onTime: 2,
      outsideWindow: 1,
      suspends: 2,
      down: 1,
      waivers: 1,
      scratched: 1,
    });
  });
});
