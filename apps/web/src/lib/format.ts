const whole = new Intl.NumberFormat('en-GB', { maximumFractionDigits: 0 });
const oneDecimal = new Intl.NumberFormat('en-GB', { minimumFractionDigits: 1, maximumFractionDigits: 1 });

export const formatPounds = (lb: number) => `${whole.format(lb)} lb`;
/** Figures the server could not work out (e.g. a weight outside the launch table) arrive as null. */
export const formatKnots = (kt: number | null) => (kt === null ? '—' : `${oneDecimal.format(kt)} kt`);
export const formatSignedKnots = (kt: number | null) =>
  kt === null ? '—' : `${kt > 0 ? '+' : ''}${oneDecimal.format(kt)} kt`;
export const formatDegrees = (deg: number) => `${oneDecimal.format(deg)}°`;
export const formatWhole = (value: number) => whole.format(value);

/** "T-02:15" before the time, "T+00:40" after it. */
export function formatCountdown(targetIso: string, now: number): string {
  const deltaS = Math.round((Date.parse(targetIso) - now) / 1000);
  const abs = Math.abs(deltaS);
  const hours = Math.floor(abs / 3600);
  const minutes = Math.floor((abs % 3600) / 60);
  const seconds = abs % 60;
  const pad = (n: number) => String(n).padStart(2, '0');
  const body = hours > 0 ? `${hours}:${pad(minutes)}:${pad(seconds)}` : `${pad(minutes)}:${pad(seconds)}`;
  return `T${deltaS >= 0 ? '-' : '+'}${body}`;
}

/** Clearing turn in words: positive is to starboard (right), zero is none. */
export function formatClearingTurn(deg: number): string {
  if (deg === 0) return 'None — straight ahead';
  return `${Math.abs(deg)}° ${deg > 0 ? 'right' : 'left'}`;
}

export function ordinal(n: number): string {
  const tens = n % 100;
  if (tens >= 11 && tens <= 13) return `${n}th`;
  return `${n}${['th', 'st', 'nd', 'rd'][n % 10] ?? 'th'}`;
}
