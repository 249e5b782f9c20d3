import type { LineupChange, Page } from '@catline/contracts';

/**
 * The change log of a cycle after `since`, as a client catches up: page after page of
 * GET /lineup/changes (of `limit` changes, the server's default unless given), each from the last
 * version read, until a page holds every change left.
 */
export async function readChangeLog(
  url: string,
  token: string,
  cycleId: number,
  { since = 0, limit }: { since?: number; limit?: number } = {},
): Promise<LineupChange[]> {
  const log: LineupChange[] = [];
  for (;;) {
    const from = log.at(-1)?.version ?? since;
    const size = limit === undefined ? '' : `&limit=${limit}`;
    const response = await fetch(`${url}/api/cycles/${cycleId}/lineup/changes?since=${from}${size}`, {
      headers: { Authorization: `Bearer ${token}` },
    });
    if (!response.ok) throw new Error(`Reading the change log answered ${response.status}`);
    const page = (await response.json()) as Page<LineupChange>;
    log.push(...page.items);
    if (page.items.length >= page.total) return log;
  }
}

/** Versions that are missing from, or repeated in, 1..last. */
export function versionProblems(log: readonly LineupChange[]): string[] {
  return log.flatMap((change, i) =>
    change.version === i + 1 ? [] : [`place ${i + 1} holds version ${change.version}`],
  );
}
