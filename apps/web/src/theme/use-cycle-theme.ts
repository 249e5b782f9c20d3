import { useEffect } from 'react';
import { setViewedCycleNight } from './theme-mode.js';

/** Live screens declare whether their cycle flies at night, so the automatic theme can follow it. */
export function useCycleTheme(night: boolean | undefined) {
  useEffect(() => {
    setViewedCycleNight(night ?? null);
  }, [night]);
  useEffect(() => () => setViewedCycleNight(null), []);
}
