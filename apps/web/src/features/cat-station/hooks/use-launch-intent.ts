import { useRef } from 'react';

function randomKey(): string {
  // getRandomValues works on plain-http ship networks, where randomUUID does not exist.
  const bytes = crypto.getRandomValues(new Uint8Array(16));
  return Array.from(bytes, (byte) => byte.toString(16).padStart(2, '0')).join('');
}

/**
 * One idempotency key per launch intent: every tap or retry to launch the same aircraft sends the same
 * key, so the server records the shot once; the next aircraft gets a new key.
 */
export function useLaunchIntent(slotId: number | undefined) {
  const intent = useRef<{ slotId: number; key: string } | null>(null);
  return () => {
    if (slotId === undefined) throw new Error('No aircraft to launch');
    if (intent.current?.slotId !== slotId) intent.current = { slotId, key: randomKey() };
    return intent.current.key;
  };
}
