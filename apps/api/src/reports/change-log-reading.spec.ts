import type { ChangeKind, LineupChange, SlotView } from '@catline/contracts';
import { readChangeLog } from './change-log-reading.js';

type SlotState = Pick<SlotView, 'id' | 'status' | 'catapultId'> & Partial<SlotView>;

const view = (fields: SlotState) => ({ projectedLaunchAt: null, suspendReason: null, ...fields }) as SlotView;

let version = 0;
const change = (kind: ChangeKind, slots: SlotState[], at: string, actor = 'Tomas Ebberhold'): LineupChange => ({
  cycleId: 1,
  version: ++version,
  kind,
  actor: { id: 1, name: actor, role: 'handler' },
  at,
  summary: kind,
  patch: slots.length > 0 ? { slots: slots.map(view) } : {},
});

beforeEach(() => {
  version = 0;
});

describe('readChangeLog', () => {
  it('takes the planned times from the lineup as it stood at the cycle_started change, not later', () => {
    const log = [
      change('slot_added', [{ id: 1, status: 'planned', catapultId: null }], '2027-01-05T09:00:00.000Z'),
      change(
        'slot_moved',
        [{ id: 1, status: 'planned', catapultId: 7, projectedLaunchAt: '2027-01-05T10:00:00.000Z' }],
        '2027-01-05T09:01:00.000Z',
      ),
      change('cycle_started', [], '2027-01-05T09:58:00.000Z', 'Priya Quennevar'),
      change(
        'slot_advanced',
        [{ id: 1, status: 'taxiing', catapultId: 7, projectedLaunchAt: '2027-01-05T10:02:00.000Z' }],
        '2027-01-05T09:59:00.000Z',
      ),
    ];
    const reading = readChangeLog(log);
    expect(reading.plannedBasis).toBe('cycle_start');
    expect(reading.plannedAtVersion).toBe(3);
    expect(reading.startedAt).toBe('2027-01-05T09:58:00.000Z');
    // The projection at version 3 (10:00), not the one of version 4 (10:02).
    expect(reading.plannedViews.get(1)?.projectedLaunchAt).toBe('2027-01-05T10:00:00.000Z');
    expect(reading.plannedViews.get(1)?.catapultId).toBe(7);
  });

  it('falls back to the latest plan for a cycle that never started', () => {
    const log = [
      change('slot_added', [{ id: 1, status: 'planned', catapultId: null }], '2027-01-05T09:00:00.000Z'),
      change(
        'slot_moved',
        [{ id: 1, status: 'planned', catapultId: 7, projectedLaunchAt: '2027-01-05T10:00:00.000Z' }],
        '2027-01-05T09:01:00.000Z',
      ),
    ];
    const reading = readChangeLog(log);
    expect(reading.plannedBasis).toBe('latest_plan');
    expect(reading.plannedAtVersion).toBe(2);
    expect(reading.plannedViews.get(1)?.catapultId).toBe(7);
    expect(reading.startedAt).toBeNull();
  });

  it('finds each suspend with its reason and the time the aircraft went back on the catapult', () => {
    const log = [
      change('slot_added', [{ id: 2, status: 'planned', catapultId: 8 }], '2027-01-05T09:00:00.000Z'),
      change(
        'slot_suspended',
        [{ id: 2, status: 'suspended', catapultId: 8, suspendReason: 'Launch bar not seated' }],
        '2027-01-05T10:00:00.000Z',
        'Sam Dellavint',
      ),
      change(
        'slot_advanced',
        [{ id: 2, status: 'on_catapult', catapultId: 8 }],
        '2027-01-05T10:00:40.000Z',
        'Sam Dellavint',
      ),
      change(
        'slot_suspended',
        [{ id: 2, status: 'suspended', catapultId: 8, suspendReason: 'Deck crew clear' }],
        '2027-01-05T10:01:10.000Z',
        'Sam Dellavint',
      ),
      change('cycle_closed', [{ id: 2, status: 'scratched', catapultId: null }], '2027-01-05T10:20:00.000Z'),
    ];
    const reading = readChangeLog(log);
    expect(reading.suspends).toEqual([
      {
        slotId: 2,
        catapultId: 8,
        at: '2027-01-05T10:00:00.000Z',
        reason: 'Launch bar not seated',
        by: 'Sam Dellavint',
        resumedAt: '2027-01-05T10:00:40.000Z',
      },
      // Scratched at the close is not a resume.
      {
        slotId: 2,
        catapultId: 8,
        at: '2027-01-05T10:01:10.000Z',
        reason: 'Deck crew clear',
        by: 'Sam Dellavint',
        resumedAt: null,
      },
    ]);
    expect(reading.closedAt).toBe('2027-01-05T10:20:00.000Z');
  });

  it('records a down aircraft with the lane it left, and who launched each aircraft', () => {
    const log = [
      change('slot_added', [{ id: 3, status: 'planned', catapultId: null }], '2027-01-05T09:00:00.000Z'),
      change('slot_moved', [{ id: 3, status: 'planned', catapultId: 9 }], '2027-01-05T09:01:00.000Z'),
      change(
        'aircraft_down',
        [
          { id: 3, status: 'down', catapultId: null },
          { id: 4, status: 'planned', catapultId: 9 },
        ],
        '2027-01-05T09:30:00.000Z',
      ),
      change(
        'slot_launched',
        [{ id: 4, status: 'launched', catapultId: 9 }],
        '2027-01-05T10:03:00.000Z',
        'Ines Ashwicke',
      ),
    ];
    const reading = readChangeLog(log);
    expect(reading.downs).toEqual([
      { slotId: 3, catapultId: 9, at: '2027-01-05T09:30:00.000Z', by: 'Tomas Ebberhold' },
    ]);
    expect(reading.launchedBy).toEqual(new Map([[4, 'Ines Ashwicke']]));
  });

  it('reads an empty log as a plan at version 0', () => {
    const reading = readChangeLog([]);
    expect(reading.plannedAtVersion).toBe(0);
    expect(reading.plannedViews.size).toBe(0);
    expect(reading.suspends).toEqual([]);
  });
});
