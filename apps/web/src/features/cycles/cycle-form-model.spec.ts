import type { CycleView } from '@catline/contracts';
import { describe, expect, it } from 'vitest';
import {
  cycleFormSchema,
  type CycleFormValues,
  newCycleValues,
  toConditionsRequest,
  toCreateRequest,
  valuesFromCycle,
} from './cycle-form-model.js';

/** What the form would show under each field. */
function validateCycleForm(values: CycleFormValues, withNumber: boolean): Record<string, string> {
  const result = cycleFormSchema(withNumber).safeParse(values);
  return Object.fromEntries((result.error?.issues ?? []).map((issue) => [issue.path.join('.'), issue.message]));
}

// vitest.config.ts pins the device's zone to UTC; the form's times are the ship's clock all the same.
// Asia/Dubai keeps +04:00 all year (IANA tz database, "Zone Asia/Dubai ... 4:00 - +04").
const now = new Date('2026-12-02T09:12:34.000Z');
const SHIP_ZONE = 'Asia/Dubai';

describe('a new cycle', () => {
  it('is planned half an hour ahead, on the minute, with a window from 5 min before to 20 min after', () => {
    const values = newCycleValues(SHIP_ZONE, now, 4);
    expect(values.number).toBe('4');
    expect(values.plannedLaunchAt).toBe('2026-12-02T13:42');
    expect(values.windowStartAt).toBe('2026-12-02T13:37');
    expect(values.windowEndAt).toBe('2026-12-02T14:02');
    expect(validateCycleForm(values, true)).toEqual({});
  });

  it("becomes a create request with numbers and UTC instants, the times read on the ship's clock", () => {
    expect(toCreateRequest(newCycleValues(SHIP_ZONE, now, 4), 2, SHIP_ZONE)).toEqual({
      shipId: 2,
      number: 4,
      plannedLaunchAt: '2026-12-02T09:42:00.000Z',
      windowStartAt: '2026-12-02T09:37:00.000Z',
      windowEndAt: '2026-12-02T10:02:00.000Z',
      shipCourseDeg: 0,
      shipSpeedKt: 20,
      trueWindFromDeg: 0,
      trueWindSpeedKt: 10,
      temperatureC: 15,
      pressureHpa: 1013,
      weatherCase: 'I',
      night: false,
    });
  });
});

describe('editing a cycle', () => {
  const cycle: CycleView = {
    id: 9,
    shipId: 1,
    number: 12,
    state: 'planning',
    version: 5,
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
    plannedLaunchAt: '2026-12-02T14:30:00.000Z',
    windowStartAt: '2026-12-02T14:20:00.000Z',
    windowEndAt: '2026-12-02T15:00:00.000Z',
    shipCourseDeg: 275.5,
    shipSpeedKt: 24,
    trueWindFromDeg: 250,
    trueWindSpeedKt: 14,
    temperatureC: -3,
    pressureHpa: 998,
    weatherCase: 'III',
    night: true,
    landingArea: 'recovering',
    landingAreaReason: null,
    respot: null,
  };

  it('round-trips the cycle through the form into a conditions change on the version it saw', () => {
    const {
      shipId: _ship,
      number: _number,
      id: _id,
      state: _state,
      version: _version,
      slotCount: _slots,
      launchedCount: _launched,
      landingArea: _landingArea,
      landingAreaReason: _landingAreaReason,
      windGustFromDeg: _gustFrom,
      windGustKt: _gust,
      windLullFromDeg: _lullFrom,
      windLullKt: _lull,
      windReadAt: _readAt,
      windStaleAt: _staleAt,
      latitudeDeg: _latitude,
      longitudeDeg: _longitude,
      timeZone: _timeZone,
      launchPrerequisites: _prerequisites,
      respot: _respot,
      ...conditions
    } = cycle;
    expect(toConditionsRequest(valuesFromCycle(cycle), cycle)).toEqual({ ...conditions, basisVersion: 5 });
  });

  it('sends a wind read across the deck, with its gust and lull, in place of the true wind', () => {
    const values: CycleFormValues = {
      ...valuesFromCycle(cycle),
      windFrame: 'relative',
      relativeWindBearingDeg: '-12',
      relativeWindSpeedKt: '31',
      windGustKt: '36',
      windLullKt: '27',
    };
    const request = toConditionsRequest(values, cycle);
    expect(request).toMatchObject({
      relativeWindBearingDeg: -12,
      relativeWindSpeedKt: 31,
      windGustKt: 36,
      windLullKt: 27,
      basisVersion: 5,
    });
    expect(request).not.toHaveProperty('trueWindFromDeg');
    expect(request).not.toHaveProperty('trueWindSpeedKt');
  });

  it('asks for the bearing and speed of a wind across the deck, and leaves gust and lull optional', () => {
    const relative: CycleFormValues = { ...valuesFromCycle(cycle), windFrame: 'relative' };
    expect(validateCycleForm(relative, false)).toEqual({
      relativeWindBearingDeg: 'Enter a bearing off the bow from −180 to 180°.',
      relativeWindSpeedKt: 'Enter a wind speed from 0 to 120 kt.',
    });
    expect(validateCycleForm({ ...valuesFromCycle(cycle), windGustKt: '121' }, false)).toEqual({
      windGustKt: 'Enter a gust from 0 to 120 kt.',
    });
    // The true wind stays as it was and is not sent while the wind is read across the deck.
    expect(validateCycleForm({ ...relative, relativeWindBearingDeg: '0', relativeWindSpeedKt: '0' }, false)).toEqual(
      {},
    );
  });

  it('does not ask for the number, which a conditions change cannot alter', () => {
    expect(validateCycleForm({ ...valuesFromCycle(cycle), number: '' }, false)).toEqual({});
  });
});

describe('validateCycleForm', () => {
  const valid = newCycleValues(SHIP_ZONE, now, 1);

  it("asks for a whole cycle number within the server's range", () => {
    const message = 'Enter the cycle number, a whole number from 1 to 9,999.';
    expect(validateCycleForm({ ...valid, number: '2.5' }, true)).toEqual({ number: message });
    expect(validateCycleForm({ ...valid, number: '0' }, true)).toEqual({ number: message });
    expect(validateCycleForm({ ...valid, number: '10000' }, true)).toEqual({ number: message });
  });

  it.each([
    ['shipCourseDeg', '360.5', 'Enter a course from 0 to 360°.'],
    ['shipSpeedKt', '-1', 'Enter a speed from 0 to 40 kt.'],
    ['trueWindSpeedKt', '81', 'Enter a wind speed from 0 to 80 kt.'],
    ['temperatureC', '', 'Enter a temperature from −40 to 55 °C.'],
    ['temperatureC', '-40.1', 'Enter a temperature from −40 to 55 °C.'],
    ['pressureHpa', '1013 hPa', 'Enter a pressure from 870 to 1,085 hPa.'],
  ] as const)('refuses %s = "%s"', (field, value, message) => {
    expect(validateCycleForm({ ...valid, [field]: value }, true)).toEqual({ [field]: message });
  });

  it('accepts the ends of each range', () => {
    expect(
      validateCycleForm(
        { ...valid, shipSpeedKt: '40', temperatureC: '-40', pressureHpa: '870', trueWindFromDeg: '360' },
        true,
      ),
    ).toEqual({});
    expect(
      validateCycleForm(
        { ...valid, shipSpeedKt: '0', temperatureC: '55', pressureHpa: '1085', trueWindSpeedKt: '80' },
        true,
      ),
    ).toEqual({});
  });

  it('names every field in trouble at once, figures and window alike', () => {
    expect(
      Object.keys(validateCycleForm({ ...valid, shipSpeedKt: '41', windowEndAt: valid.plannedLaunchAt }, true)),
    ).toEqual(['shipSpeedKt', 'windowEndAt']);
  });

  it('wants the window to open no later than the planned launch and close after it', () => {
    expect(validateCycleForm({ ...valid, windowStartAt: '2026-12-02T13:43' }, true)).toEqual({
      windowStartAt: 'The window must open before the planned launch.',
    });
    expect(validateCycleForm({ ...valid, windowStartAt: valid.plannedLaunchAt }, true)).toEqual({});
    expect(validateCycleForm({ ...valid, windowEndAt: valid.plannedLaunchAt }, true)).toEqual({
      windowEndAt: 'The window must close after the planned launch.',
    });
  });

  it('asks for a date and time when one is missing, and then does not compare it', () => {
    expect(validateCycleForm({ ...valid, plannedLaunchAt: '' }, true)).toEqual({
      plannedLaunchAt: 'Enter a date and time.',
    });
  });
});
