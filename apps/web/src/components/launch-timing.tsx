import { Text } from '@chakra-ui/react';
import type { LaunchTimingView } from '@catline/contracts';
import { launchTimingSummary, planTimingText, windowTimingText } from '../lib/launch-timing.js';

/**
 * How an aircraft runs against its window ("3 min late", "on time") and, once launching, against the plan.
 * `windowOnly` (a board card, too narrow for both on one line) leaves the plan to the title.
 */
export function LaunchTiming({
  timing,
  windowOnly = false,
}: {
  timing: LaunchTimingView | null;
  windowOnly?: boolean;
}) {
  if (!timing) return null;
  const late = timing.window.verdict === 'late';
  return (
    <Text as="span" data-testid="launch-timing" title={launchTimingSummary(timing)}>
      <Text as="span" color={late ? 'nogo.fg' : undefined} fontWeight={late ? '700' : undefined}>
        {windowTimingText(timing.window)}
      </Text>
      {timing.plan && !windowOnly && ` · ${planTimingText(timing.plan)}`}
    </Text>
  );
}
