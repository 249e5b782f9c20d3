import { useEffect, useState } from 'react';

/** The current time, re-read every `everyMs` while `running`: for countdowns, which stop when not live. */
export function useNow(everyMs = 1_000, running = true): number {
  const [now, setNow] = useState(() => Date.now());
  useEffect(() => {
    if (!running) return undefined;
    const timer = setInterval(() => setNow(Date.now()), everyMs);
    return () => clearInterval(timer);
  }, [everyMs, running]);
  return now;
}
