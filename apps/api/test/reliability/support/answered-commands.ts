import {
  type ChangeKind,
  type LineupChange,
  type LineupCommandResult,
  applyLineupChanges,
  type LineupSnapshot,
} from '@catline/contracts';
import { versionProblems } from '../../support/change-log.js';
import {
  type CommandOutcome,
  type LineupCommand,
  accepted,
  acceptedVersion,
} from '../../support/random-lineup-commands.js';

/** The kind of change a command makes, and the slot or catapult it must touch (by the change's patch). */
function expectedChange(command: LineupCommand): { kind: ChangeKind; slotId?: number; catapultId?: number } {
  const body = command.body as { slotId?: number };
  const idAfter = (segment: string) => Number(command.path.split(`/${segment}/`)[1]?.split('/')[0]);
  if (command.path.endsWith('/moves')) return { kind: 'slot_moved', slotId: body.slotId };
  if (command.path.endsWith('/suggestion/apply')) return { kind: 'suggestion_applied' };
  if (command.path.endsWith('/down')) return { kind: 'aircraft_down', slotId: idAfter('slots') };
  if (command.path.endsWith('/status')) return { kind: 'catapult_status_set', catapultId: idAfter('catapults') };
  throw new Error(`No expected change for ${command.path}`);
}

/** Whether a logged change is what the command asks for: its kind, and the slot or catapult it names. */
function changeFits(change: LineupChange, command: LineupCommand): boolean {
  const expected = expectedChange(command);
  if (change.kind !== expected.kind) return false;
  if (expected.slotId !== undefined && !(change.patch.slots ?? []).some((slot) => slot.id === expected.slotId))
    return false;
  if (
    expected.catapultId !== undefined &&
    !(change.patch.lanes ?? []).some((lane) => lane.catapultId === expected.catapultId)
  )
    return false;
  return true;
}

const describeCommand = (command: LineupCommand) => `${command.path} ${JSON.stringify(command.body)}`;

/**
 * What must hold between the answers the clients got and the change log after any interruption, row by
 * row: every accepted command is its own version in the log, as answered, and of the kind and slot it
 * asked for; every other row after the set-up is the change of a request that got no answer (cut off
 * by the interruption), each such request explaining one row at most; the log has no gap and replays to
 * the lineup the database holds.
 */
export function logProblems(
  outcomes: readonly CommandOutcome[],
  log: readonly LineupChange[],
  setUpVersions: number,
  first: LineupSnapshot,
  final: LineupSnapshot,
): string[] {
  const problems = [...versionProblems(log)];
  const claimed = new Set<number>();
  for (const outcome of outcomes.filter(accepted)) {
    const version = acceptedVersion(outcome);
    const row = log[version - 1];
    if (claimed.has(version)) problems.push(`two accepted commands share version ${version}`);
    claimed.add(version);
    if (JSON.stringify(row) !== JSON.stringify((outcome.body as LineupCommandResult).change))
      problems.push(`accepted version ${version} is not in the log as answered`);
    else if (!changeFits(row, outcome.command))
      problems.push(`version ${version} is a ${row.kind}, not what ${describeCommand(outcome.command)} asked for`);
  }
  const unanswered = outcomes.filter((outcome) => outcome.status === 0 || outcome.status >= 500);
  for (const row of log.slice(setUpVersions)) {
    if (claimed.has(row.version)) continue;
    const cause = unanswered.findIndex((outcome) => changeFits(row, outcome.command));
    if (cause === -1)
      problems.push(`version ${row.version} (${row.kind}: ${row.summary}) answers no request that was sent`);
    else unanswered.splice(cause, 1);
  }
  if (log.length !== final.version) problems.push(`the log ends at ${log.length}, the cycle is at ${final.version}`);
  if (JSON.stringify(applyLineupChanges(first, log)) !== JSON.stringify(final))
    problems.push('the log does not replay to the lineup');
  return problems;
}
