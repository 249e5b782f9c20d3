import { applyLineupPatch, type LineupChange, type LineupSnapshot } from '@catline/contracts';
import { type CommandOutcome, acceptedVersion } from './random-lineup-commands.js';

interface Basis {
  slotId?: number;
  slotVersion?: number;
  toCatapultId?: number | null;
  targetLaneOrder?: number[];
  basisVersion?: number;
  basisStatus?: string;
}

const sameIds = (a: readonly number[], b: readonly number[]) =>
  a.length === b.length && a.every((id, i) => id === b[i]);

/**
 * Accepted commands that were based on something stale: each must have seen the lineup as it stood just
 * before its own version, read back by replaying the change log from the cycle's first snapshot (a move's
 * slot version and target lane order, a down's slot version, an applied lineup's basis version, a
 * catapult's basis status). One sentence per problem.
 */
export function staleBasisProblems(
  first: LineupSnapshot,
  log: readonly LineupChange[],
  acceptedOnes: readonly CommandOutcome[],
): string[] {
  const before = new Map<number, LineupSnapshot>();
  let state = first;
  for (const change of log) {
    before.set(change.version, state);
    state = applyLineupPatch(state, change.version, change.patch);
  }
  return acceptedOnes.flatMap((outcome) => {
    const version = acceptedVersion(outcome);
    const seen = before.get(version);
    if (!seen) return [`version ${version} of ${outcome.command.path} is not in the log`];
    const basis = outcome.command.body as Basis;
    const problems: string[] = [];
    const what = `${outcome.command.path} (version ${version})`;
    if (basis.slotId !== undefined || basis.slotVersion !== undefined) {
      const slotId = basis.slotId ?? Number(/slots\/(\d+)\//.exec(outcome.command.path)?.[1]);
      const slot = seen.slots.find((candidate) => candidate.id === slotId);
      if (slot?.version !== basis.slotVersion)
        problems.push(`${what} sent slot version ${basis.slotVersion}; it was ${slot?.version}`);
    }
    if (basis.targetLaneOrder !== undefined && basis.toCatapultId != null) {
      const lane = seen.lanes.find((candidate) => candidate.catapultId === basis.toCatapultId);
      if (!lane || !sameIds(lane.slotIds, basis.targetLaneOrder))
        problems.push(`${what} saw lane [${basis.targetLaneOrder}]; it held [${lane?.slotIds}]`);
    }
    if (basis.basisVersion !== undefined && basis.basisVersion !== seen.version)
      problems.push(`${what} was based on version ${basis.basisVersion}, not ${seen.version}`);
    if (basis.basisStatus !== undefined) {
      const catapultId = Number(/catapults\/(\d+)\//.exec(outcome.command.path)?.[1]);
      const lane = seen.lanes.find((candidate) => candidate.catapultId === catapultId);
      if (lane?.status !== basis.basisStatus)
        problems.push(`${what} saw the catapult ${basis.basisStatus}; it was ${lane?.status}`);
    }
    return problems;
  });
}
