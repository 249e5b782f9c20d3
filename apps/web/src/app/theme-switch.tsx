import { chakra, HStack, NativeSelect } from '@chakra-ui/react';
import { MoonIcon, SunIcon } from '../components/icons.js';
import { NIGHT_BRIGHTNESS } from '../theme/night-scheme.js';
import { setNightBrightness, setThemeOverride, type ThemeOverride, useThemeState } from '../theme/theme-mode.js';

const choices: { value: ThemeOverride; label: string }[] = [
  { value: 'auto', label: 'Auto' },
  { value: 'day', label: 'Day' },
  { value: 'night', label: 'Night' },
];

/** The manual override of the automatic day/night theme, and by night the scheme's brightness. */
export function ThemeSwitch() {
  const { override, mode, nightBrightness } = useThemeState();
  return (
    <HStack gap="1.5" data-testid="theme-switch" data-mode={mode}>
      <span aria-hidden="true">{mode === 'night' ? <MoonIcon /> : <SunIcon />}</span>
      <NativeSelect.Root size="md" width="auto">
        <NativeSelect.Field
          aria-label="Theme"
          title="Auto dims the screen while the cycle on it flies at night"
          value={override}
          onChange={(event) => setThemeOverride(event.currentTarget.value as ThemeOverride)}
        >
          {choices.map((choice) => (
            <option key={choice.value} value={choice.value}>
              {choice.label}
            </option>
          ))}
        </NativeSelect.Field>
        <NativeSelect.Indicator />
      </NativeSelect.Root>
      {mode === 'night' && (
        <chakra.input
          type="range"
          aria-label="Night brightness"
          title="Dimmer to the left, brighter to the right; every text stays readable at either end"
          min={NIGHT_BRIGHTNESS.dimmest}
          max={NIGHT_BRIGHTNESS.brightest}
          step={1}
          value={nightBrightness}
          onChange={(event) => setNightBrightness(Number(event.currentTarget.value))}
          width="6rem"
          style={{ accentColor: 'var(--chakra-colors-accent-fg)' }}
        />
      )}
    </HStack>
  );
}
