import { useSyncExternalStore } from 'react';

export type ThemeOverride = 'auto' | 'day' | 'night';
export type ThemeMode = 'day' | 'night';

const storageKey = 'catline.theme';

interface ThemeState {
  override: ThemeOverride;
  /** Whether the cycle on screen is a night cycle; null when no cycle is on screen. */
  viewedCycleNight: boolean | null;
}

function readOverride(): ThemeOverride {
  const stored = globalThis.localStorage?.getItem(storageKey);
  return stored === 'day' || stored === 'night' ? stored : 'auto';
}

let state: ThemeState = { override: readOverride(), viewedCycleNight: null };
const listeners = new Set<() => void>();

export function effectiveMode(current: ThemeState = state): ThemeMode {
  if (current.override !== 'auto') return current.override;
  return current.viewedCycleNight ? 'night' : 'day';
}

function update(next: Partial<ThemeState>) {
  state = { ...state, ...next };
  applyToDocument();
  listeners.forEach((listener) => listener());
}

/** Chakra's `_dark` condition follows the `dark` class on the root element. */
export function applyToDocument() {
  const night = effectiveMode() === 'night';
  document.documentElement.classList.toggle('dark', night);
  document.documentElement.classList.toggle('light', !night);
  document.documentElement.style.colorScheme = night ? 'dark' : 'light';
}

export function setThemeOverride(override: ThemeOverride) {
  localStorage.setItem(storageKey, override);
  update({ override });
}

export function setViewedCycleNight(night: boolean | null) {
  if (state.viewedCycleNight !== night) update({ viewedCycleNight: night });
}

function subscribe(listener: () => void) {
  listeners.add(listener);
  return () => listeners.delete(listener);
}

export function useThemeState(): ThemeState & { mode: ThemeMode } {
  const current = useSyncExternalStore(subscribe, () => state);
  return { ...current, mode: effectiveMode(current) };
}
