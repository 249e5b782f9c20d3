import { useStore } from 'zustand';
import { createStore } from 'zustand/vanilla';
import { NIGHT_BRIGHTNESS, nightColours } from './night-scheme.js';

export type ThemeOverride = 'auto' | 'day' | 'night';
export type ThemeMode = 'day' | 'night';

const storageKey = 'catline.theme';
/** Kept per device, like the theme: a station's screen keeps the brightness its crew set. */
const brightnessKey = 'catline.nightBrightness';

interface ThemeState {
  override: ThemeOverride;
  /** Whether the cycle on screen is a night cycle; null when no cycle is on screen. */
  viewedCycleNight: boolean | null;
  /** The night scheme's brightness, NIGHT_BRIGHTNESS.dimmest to .brightest. */
  nightBrightness: number;
}

function readOverride(): ThemeOverride {
  const stored = globalThis.localStorage?.getItem(storageKey);
  return stored === 'day' || stored === 'night' ? stored : 'auto';
}

function readBrightness(): number {
  const stored = Number(globalThis.localStorage?.getItem(brightnessKey));
  return Number.isInteger(stored) && stored >= NIGHT_BRIGHTNESS.dimmest && stored <= NIGHT_BRIGHTNESS.brightest
    ? stored
    : NIGHT_BRIGHTNESS.initial;
}

const theme = createStore<ThemeState>(() => ({
  override: readOverride(),
  viewedCycleNight: null,
  nightBrightness: readBrightness(),
}));

export function effectiveMode(current: ThemeState = theme.getState()): ThemeMode {
  if (current.override !== 'auto') return current.override;
  return current.viewedCycleNight ? 'night' : 'day';
}

/** Chakra's `_dark` condition follows the `dark` class on the root element; the night colours, the brightness. */
export function applyToDocument() {
  const night = effectiveMode() === 'night';
  const root = document.documentElement;
  root.classList.toggle('dark', night);
  root.classList.toggle('light', !night);
  root.style.colorScheme = night ? 'dark' : 'light';
  const { nightBrightness } = theme.getState();
  root.dataset.nightBrightness = String(nightBrightness);
  for (const [variable, colour] of Object.entries(nightColours(nightBrightness)))
    root.style.setProperty(variable, colour);
}

// The document follows every change, before the screens draw with the new mode.
theme.subscribe(applyToDocument);

export function setThemeOverride(override: ThemeOverride) {
  localStorage.setItem(storageKey, override);
  theme.setState({ override });
}

export function setNightBrightness(level: number) {
  const nightBrightness = Math.min(NIGHT_BRIGHTNESS.brightest, Math.max(NIGHT_BRIGHTNESS.dimmest, Math.round(level)));
  localStorage.setItem(brightnessKey, String(nightBrightness));
  theme.setState({ nightBrightness });
}

export function setViewedCycleNight(night: boolean | null) {
  if (theme.getState().viewedCycleNight !== night) theme.setState({ viewedCycleNight: night });
}

export function useThemeState(): ThemeState & { mode: ThemeMode } {
  const current = useStore(theme);
  return { ...current, mode: effectiveMode(current) };
}
