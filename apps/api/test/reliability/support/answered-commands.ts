import { type LineupChange, type LineupCommandResult, applyLineupChanges, type LineupSnapshot } from '@catline/contracts';
import { versionProblems } from '../../support/change-log.js';
import { type CommandOutcome, accepted, acceptedVersion } from '../../support/random-lineup-commands.js';

/**
 * What must hold between the answers the clients got and the change log after any interruption:
 * every accepted command is its own version in the log, the log has no gap, nothing is in the log that
 * no request could have caused, and the log replays to the lineup the database holds.
 */
export function logProblems(outcomes: readonly CommandOutcome[], log: readonly LineupChange[], setUpVersions: number, first: LineupSnapshot, final: LineupSnapshot): string[] {
  const problems = [...versionProblems(log)];
  const acceptedOnes = outcomes.filter(accepted);
  for (const outcome of acceptedOnes) {
    const version = acceptedVersion(outcome);
    const change = (outcome.body as LineupCommandResult).change;
    if (JSON.stringify(log[version - 1]) !== JSON.stringify(change)) problems.push(`accepted version ${version} is not in the log as answered`);
  }
  const versions = acceptedOnes.map(acceptedVersion);
  if (new Set(versions).size !== versions.length) problems.push('two accepted commands share a version');
  const unanswered = outcomes.filter((outcome) => outcome.status === 0 || outcome.status >= 500).length;
  const unexplained = log.length - setUpVersions - acceptedOnes.length;
  if (unexplained > unanswered) problems.push(`${unexplained} logged changes but only ${unanswered} unanswered requests could explain them`);
  if (log.length !== final.version) problems.push(`the log ends at ${log.length}, the cycle is at ${final.version}`);
  if (JSON.stringify(applyLineupChanges(first, log)) !== JSON.stringify(final)) problems.push('the log does not replay to the lineup');
  return problems;
}
