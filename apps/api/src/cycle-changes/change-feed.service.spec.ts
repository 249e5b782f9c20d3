import type { LineupChange } from '@catline/contracts';
import { LineupChangeFeed } from './change-feed.service.js';
import type { LineupChangesService } from './lineup-changes.service.js';

const change = (version: number, cycleId = 1): LineupChange => ({
  cycleId,
  version,
  kind: 'slot_moved',
  actor: { id: 1, name: 'Tomas Ebberhold', role: 'handler' },
  at: '2026-12-02T10:00:00.000Z',
  summary: `change ${version}`,
  patch: {},
});

function feedWithLog(log: LineupChange[] = []) {
  const reader = {
    between: async (cycleId: number, first: number, last: number) =>
      log.filter((entry) => entry.cycleId === cycleId && entry.version >= first && entry.version <= last),
  } as unknown as LineupChangesService;
  const feed = new LineupChangeFeed(reader);
  const published: number[] = [];
  feed.subscribe((entry) => published.push(entry.version));
  return { feed, published };
}

describe('LineupChangeFeed', () => {
  it('publishes in version order when later commits settle first', () => {
    const { feed, published } = feedWithLog();
    const first = feed.reserve(1, 5);
    const second = feed.reserve(1, 6);
    second.prepare([change(6)]);
    second.committed();
    expect(published).toEqual([]);
    expect(feed.firstPending(1)).toBe(5);
    first.prepare([change(5)]);
    first.committed();
    expect(published).toEqual([5, 6]);
    expect(feed.lastPublished(1)).toBe(6);
    expect(feed.firstPending(1)).toBeUndefined();
  });

  it('skips a rolled-back ticket and keeps going', () => {
    const { feed, published } = feedWithLog();
    const refused = feed.reserve(1, 5);
    const accepted = feed.reserve(1, 5);
    accepted.prepare([change(5)]);
    accepted.committed();
    refused.rolledBack();
    expect(published).toEqual([5]);
  });

  it('publishes each version once', () => {
    const { feed, published } = feedWithLog();
    const ticket = feed.reserve(1, 3);
    ticket.prepare([change(3), change(4)]);
    ticket.committed();
    ticket.committed();
    const late = feed.reserve(1, 4);
    late.prepare([change(4)]);
    late.committed();
    expect(published).toEqual([3, 4]);
  });

  it('keeps cycles apart', () => {
    const { feed, published } = feedWithLog();
    const held = feed.reserve(1, 2);
    const other = feed.reserve(2, 9);
    other.prepare([change(9, 2)]);
    other.committed();
    expect(published).toEqual([9]);
    held.rolledBack();
  });

  it('asks the change log when a commit outcome is unknown, holding later tickets until it answers', async () => {
    const { feed, published } = feedWithLog([change(7)]);
    const unknown = feed.reserve(1, 7);
    unknown.prepare([change(7)]);
    const next = feed.reserve(1, 8);
    next.prepare([change(8)]);
    unknown.uncertain();
    next.committed();
    expect(published).toEqual([]);
    await new Promise((resolve) => setImmediate(resolve));
    expect(published).toEqual([7, 8]);
  });

  it('drops an unknown commit the change log does not hold', async () => {
    const { feed, published } = feedWithLog([]);
    const unknown = feed.reserve(1, 7);
    unknown.prepare([change(7)]);
    unknown.uncertain();
    await new Promise((resolve) => setImmediate(resolve));
    expect(published).toEqual([]);
    expect(feed.firstPending(1)).toBeUndefined();
  });

  it('counts versions committed by another process as published without holding back its own', () => {
    const { feed, published } = feedWithLog();
    const own = feed.reserve(1, 5);
    feed.noteCommittedElsewhere(1, 6);
    expect(feed.lastPublished(1)).toBe(6);
    own.prepare([change(5)]);
    own.committed();
    expect(published).toEqual([5]);
    expect(feed.lastPublished(1)).toBe(6);
    feed.noteCommittedElsewhere(1, 4);
    expect(feed.lastPublished(1)).toBe(6);
  });
});
