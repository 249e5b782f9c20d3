import type { LineupSnapshot, SlotView } from '@catline/contracts';
import { describe, expect, it } from 'vitest';
import {
  canGoDownOnCatapult,
  canReportHangfire,
  holdbackLabel,
  lastLaunched,
  readBackFigure,
} from './cat-station-model.js';

const slot = (status: SlotView['status'], extra: Partial<SlotView> = {}) =>
  ({ id: 1, catapultId: 1, status, launchedAt: null, ...extra }) as SlotView;

describe('events at the catapult', () => {
  it('offers a hangfire only once tension is taken', () => {
    expect(canReportHangfire(slot('deflector_up'))).toBe(false);
    expect(canReportHangfire(slot('tensioned'))).toBe(true);
    expect(canReportHangfire(slot('pilot_ready'))).toBe(true);
    expect(canReportHangfire(slot('suspended'))).toBe(false);
  });

  it('offers down on the catapult once hooked up, or while suspended there, not while taxiing', () => {
    expect(canGoDownOnCatapult(slot('taxiing'))).toBe(false);
    expect(canGoDownOnCatapult(slot('on_catapult'))).toBe(true);
    expect(canGoDownOnCatapult(slot('suspended'))).toBe(true);
    expect(canGoDownOnCatapult(slot('launched'))).toBe(false);
  });

  it('reports a cold shot on the last aircraft launched from this catapult', () => {
    const slots = [
      slot('launched', { id: 1, launchedAt: '2026-03-01T10:00:00.000Z' }),
      slot('launched', { id: 2, launchedAt: '2026-03-01T10:01:30.000Z' }),
      slot('launched', { id: 3, catapultId: 2, launchedAt: '2026-03-01T10:02:00.000Z' }),
      slot('on_catapult', { id: 4 }),
    ];
    expect(lastLaunched({ slots } as LineupSnapshot, 1)?.id).toBe(2);
    expect(lastLaunched({ slots: [slots[3]] } as LineupSnapshot, 1)).toBeUndefined();
  });
});

describe('the setting read back from the console', () => {
  it('takes a whole-number setting as typed, and nothing else', () => {
    expect(readBackFigure(' 18 ')).toBe(18);
    expect(readBackFigure('0')).toBe(0);
    expect(readBackFigure('')).toBeNull();
    expect(readBackFigure('18.5')).toBeNull();
    expect(readBackFigure('-3')).toBeNull();
    expect(readBackFigure('1000')).toBeNull();
    expect(readBackFigure('1e2')).toBeNull();
  });
});

describe('the holdback at the hook-up', () => {
  it('names the element of the type, or says it is not recorded', () => {
    expect(holdbackLabel(slot('taxiing', { holdbackElement: 'RE-14', typeDesignation: 'WKD-41' }))).toBe(
      'Holdback: RE-14',
    );
    expect(holdbackLabel(slot('taxiing', { holdbackElement: null, typeDesignation: 'WKD-41' }))).toBe(
      'Holdback: not recorded for the WKD-41',
    );
  });
});
