import { useEffect, useState } from 'react';

/** The server lets the person who took a step undo it for 10 s; the button shows for as long. */
const UNDO_WINDOW_MS = 10_000;

/** The slot whose step this person just took, while it can still be undone; `took` starts the window. */
export function useUndoWindow() {
  const [taken, setTaken] = useState<{ slotId: number; step: string } | null>(null);
  useEffect(() => {
    if (!taken) return;
    const timer = setTimeout(() => setTaken(null), UNDO_WINDOW_MS);
    return () => clearTimeout(timer);
  }, [taken]);
  return { taken, took: setTaken, clear: () => setTaken(null) };
}
