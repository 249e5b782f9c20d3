import { MAX_REPLAY_CHANGES, type LineupChange } from '@catline/contracts';

/** The whole change log of a cycle, read page by page through GET /lineup/changes. */
export async function readChangeLog(url: string, token: string, cycleId: number): Promise<LineupChange[]> {
  const log: LineupChange[] = [];
  for (;;) {
    const since = log.at(-1)?.version ?? 0;
    const response = await fetch(`${url}/api/cycles/${cycleId}/lineup/changes?since=${since}`, {
      headers: { Authorization: `Bearer ${token}` },
    });
    if (!response.ok) throw new Error(`Reading the change log answered ${response.status}`);
    const page = (await response.json()) as LineupChange[];
    log.push(...page);
    if (page.length < MAX_REPLAY_CHANGES) return log;
  }
}

/** Versions that are missing from, or repeated in, 1..last. */
export function versionProblems(log: readonly LineupChange[]): string[] {
  return log.flatMap((change, i) =>
    change.version === i + 1 ? [] : [`place ${i + 1} holds version ${change.version}`],
  );
}
