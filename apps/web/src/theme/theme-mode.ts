import { useStore } from 'zustand';
import { createStore } from 'zustand/vanilla';

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

const theme = createStore<ThemeState>(() => ({ override: readOverride(), viewedCycleNight: null }));

export function effectiveMode(current: ThemeState = theme.getState()): ThemeMode {
  if (current.override !== 'auto') return current.override;
  return current.viewedCycleNight ? 'night' : 'day';
}

/** Chakra's `_dark` condition follows the `dark` class on the root element. */
export function applyToDocument() {
  const night = effectiveMode() === 'night';
  document.documentElement.classList.toggle('dark', night);
  document.documentElement.classList.toggle('light', !night);
  document.documentElement.style.colorScheme = night ? 'dark' : 'light';
}

// The document follows every change, before the screens draw with the new mode.
theme.subscribe(applyToDocument);

export function setThemeOverride(override: ThemeOverride) {
  localStorage.setItem(storageKey, override);
  theme.setState({ override });
}

export function setViewedCycleNight(night: boolean | null) {
  if (theme.getState().viewedCycleNight !== night) theme.setState({ viewedCycleNight: night });
}

export function useThemeState(): ThemeState & { mode: ThemeMode } {
  const current = useStore(theme);
  return { ...current, mode: effectiveMode(current) };
}
