import type { LaunchTimingView, TimingAgainstView } from '@catline/contracts';

/** Against the window's end: "3 min late" once past it, else "on time". */
export const windowTimingText = (window: TimingAgainstView): string =>
  window.verdict === 'late' ? `${window.minutes} min late` : 'on time';

/** Against the plan: "2 min behind plan", "1 min ahead of plan" or "on plan". */
export function planTimingText(plan: TimingAgainstView): string {
  if (plan.verdict === 'late') return `${plan.minutes} min behind plan`;
  if (plan.verdict === 'early') return `${plan.minutes} min ahead of plan`;
  return 'on plan';
}

/** A sentence for a title or a screen reader: both figures, with the minutes to spare before the window ends. */
export function launchTimingSummary(timing: LaunchTimingView): string {
  const window =
    timing.window.verdict === 'late'
      ? `${timing.window.minutes} min after the window ends`
      : `${timing.window.minutes} min before the window ends`;
  return timing.plan ? `${window}; ${planTimingText(timing.plan)}` : window;
}
