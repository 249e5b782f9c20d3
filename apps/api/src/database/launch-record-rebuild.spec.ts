import type { LineupPatch, SlotView } from '@catline/contracts';
import { rebuildLaunchRecord, type LaunchedSlotRow } from './launch-record-rebuild.js';

const slot: LaunchedSlotRow = {
  id: 7,
  catapultId: 3,
  catapultNumber: 2,
  launchedAt: new Date('2026-12-01T09:14:05.000Z'),
  grossWeightLb: 44_000,
  fuelLb: 11_000,
  stores: '2 tanks',
  overrideReason: null,
  statusById: 12,
  statusByName: 'Officer of cat 2',
};

// The slot's view as the launch change's patch kept it (figures of that version; values invented).
const view = {
  id: 7,
  trimDeg: 9,
  afterburnerRequired: false,
  figures: {
    headwindKt: 31.2,
    crosswindKt: 2.1,
    crosswindSide: 'port',
    catapultSetting: 14,
    endSpeedKt: 118.4,
    requiredAirspeedKt: 140,
    requiredWindOverDeckKt: 21.6,
    marginKt: 9.6,
    go: true,
    reasons: [],
    clearingTurnDeg: 10,
  },
} as unknown as SlotView;

const patch = {
  slots: [view],
  cycle: {
    shipCourseDeg: 350,
    shipSpeedKt: 22,
    trueWindFromDeg: 340,
    trueWindSpeedKt: 12,
    temperatureC: 18,
    pressureHpa: 1011,
  },
} as unknown as LineupPatch;

describe('rebuildLaunchRecord', () => {
  it('takes the figures, trim and wind the launch change kept, and its actor as the one who fired', () => {
    const record = rebuildLaunchRecord(slot, {
      actorId: 12,
      actorName: 'Lt Vane',
      actorRole: 'catapult_officer',
      patch,
    });
    expect(record).toMatchObject({
      source: 'rebuilt',
      launchedAt: '2026-12-01T09:14:05.000Z',
      catapultNumber: 2,
      grossWeightLb: 44_000,
      crossCheckSetting: 14,
      headwindKt: 31.2,
      crosswindKt: 2.1,
      crosswindSide: 'port',
      endSpeedKt: 118.4,
      excessWindKt: 9.6,
      trimDeg: 9,
      afterburnerRequired: false,
      clearingTurnDeg: 10,
      windReading: { shipCourseDeg: 350, shipSpeedKt: 22, trueWindFromDeg: 340, trueWindSpeedKt: 12 },
      firedBy: { id: 12, name: 'Lt Vane', role: 'catapult_officer' },
    });
    // This change was logged before the cycle kept a spread and a time of reading: none is made up.
    expect(record.windReading).toMatchObject({
      readAt: null,
      windGustFromDeg: null,
      windGustKt: null,
      windLullFromDeg: null,
      windLullKt: null,
    });
  });

  it('keeps only the slot row when the log lost the launch change: every figure null, marked rebuilt', () => {
    const record = rebuildLaunchRecord({ ...slot, overrideReason: 'Margin checked' }, null);
    expect(record).toMatchObject({
      source: 'rebuilt',
      grossWeightLb: 44_000,
      headwindKt: null,
      endSpeedKt: null,
      windReading: null,
      go: null,
      waiver: 'Margin checked',
      firedBy: { id: 12, name: 'Officer of cat 2', role: null },
    });
  });
});
