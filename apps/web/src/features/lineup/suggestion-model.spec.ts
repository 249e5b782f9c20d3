import type { CycleView, LaneView, LineupSnapshot, SlotView, SuggestedLineup } from '@catline/contracts';
import { describe, expect, it } from 'vitest';
import { compareSuggestion } from './suggestion-model.js';

const cycle = { id: 7, number: 3, state: 'planning', windowEndAt: '2026-12-02T10:20:00.000Z' } as CycleView;

const slot = (id: number, sideNumber: string, extra: Partial<SlotView> = {}) =>
  ({
    id,
    sideNumber,
    status: 'planned',
    spare: false,
    heldSpare: false,
    catapultId: null,
    projectedLaunchAt: null,
    missesWindow: false,
    ...extra,
  }) as SlotView;

const lane = (catapultId: number, number: number, slotIds: number[]) => ({ catapultId, number, slotIds }) as LaneView;

// Now: cat 1 launches C21 (10:05) then C22 (10:22, late); cat 2 launches D33 (10:06); G43 waits in the pool.
function board(): LineupSnapshot {
  return {
    readinessSteps: [],
    cycle,
    version: 12,
    lanes: [lane(11, 1, [1, 2]), lane(12, 2, [3])],
    pool: [4],
    slots: [
      slot(1, 'C21', { catapultId: 11, projectedLaunchAt: '2026-12-02T10:05:00.000Z' }),
      slot(2, 'C22', { catapultId: 11, projectedLaunchAt: '2026-12-02T10:22:00.000Z', missesWindow: true }),
      slot(3, 'D33', { catapultId: 12, projectedLaunchAt: '2026-12-02T10:06:00.000Z' }),
      slot(4, 'G43'),
    ],
    lastLaunchAt: '2026-12-02T10:22:00.000Z',
  };
}

// Suggested: C22 moves to cat 2 behind D33 and G43 joins cat 1 behind C21; everything is off by 10:09:30.
const suggestion: SuggestedLineup = {
  basisVersion: 12,
  lanes: [
    { catapultId: 11, slotIds: [1, 4] },
    { catapultId: 12, slotIds: [3, 2] },
  ],
  unassigned: [],
  lastLaunchAt: '2026-12-02T10:09:30.000Z',
  projected: [
    { slotId: 1, catapultId: 11, launchAt: '2026-12-02T10:05:00.000Z', missesWindow: false },
    { slotId: 3, catapultId: 12, launchAt: '2026-12-02T10:06:00.000Z', missesWindow: false },
    { slotId: 4, catapultId: 11, launchAt: '2026-12-02T10:08:00.000Z', missesWindow: false },
    { slotId: 2, catapultId: 12, launchAt: '2026-12-02T10:09:30.000Z', missesWindow: false },
  ],
};

describe('compareSuggestion', () => {
  it('says per catapult who joins and leaves, with the lane’s last launch before and after', () => {
    expect(compareSuggestion(board(), suggestion).lanes).toEqual([
      {
        catapultId: 11,
        number: 1,
        now: { count: 2, lastAt: '2026-12-02T10:22:00.000Z' },
        suggested: { count: 2, lastAt: '2026-12-02T10:08:00.000Z' },
        joining: ['G43'],
        leaving: ['C22'],
        reordered: false,
      },
      {
        catapultId: 12,
        number: 2,
        now: { count: 1, lastAt: '2026-12-02T10:06:00.000Z' },
        suggested: { count: 2, lastAt: '2026-12-02T10:09:30.000Z' },
        joining: ['C22'],
        leaving: [],
        reordered: false,
      },
    ]);
  });

  it('gives the gain: the last launch 12 min 30 s sooner, one window miss fewer', () => {
    const comparison = compareSuggestion(board(), suggestion);
    expect(comparison.lastLaunch.gainMs).toBe(12 * 60_000 + 30_000);
    expect(comparison.missesWindow).toEqual({ now: 1, suggested: 0 });
    expect(comparison.leftInPool).toEqual([]);
  });

  it('tells a new order of the same aircraft from no change, and keeps aircraft already taxiing in front', () => {
    const snapshot = board();
    snapshot.slots[0] = { ...snapshot.slots[0], status: 'taxiing' };
    snapshot.lanes = [lane(11, 1, [1, 2, 4]), lane(12, 2, [3])];
    const swapped: SuggestedLineup = {
      ...suggestion,
      lanes: [
        { catapultId: 11, slotIds: [4, 2] },
        { catapultId: 12, slotIds: [3] },
      ],
    };
    const [cat1, cat2] = compareSuggestion(snapshot, swapped).lanes;
    expect([cat1.reordered, cat1.joining, cat1.leaving]).toEqual([true, [], []]);
    expect(cat2.reordered).toBe(false);
  });

  it('names planned aircraft the suggestion leaves in the deck pool, and a called spare, but not a held spare', () => {
    const snapshot = board();
    // C30 is still held aside; C31 was called for a down aircraft, so it is one of the cycle's aircraft now.
    snapshot.slots.push(slot(5, 'C30', { spare: true, heldSpare: true }), slot(6, 'C31', { spare: true }));
    const withoutG43: SuggestedLineup = {
      ...suggestion,
      lanes: [
        { catapultId: 11, slotIds: [1] },
        { catapultId: 12, slotIds: [3, 2] },
      ],
    };
    expect(compareSuggestion(snapshot, withoutG43).leftInPool).toEqual(['G43', 'C31']);
  });
});
