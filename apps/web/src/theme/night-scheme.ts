// The night display: a dim red-amber scheme for screens read on a darkened deck or bridge.
//
// The person's brightness control changes only the light the screen gives off where it matters, the text and
// lines: backgrounds stay near black at every level, and every text colour moves between a dimmest and a
// brightest value, both of which hold at least 4.5:1 against the lightest background it is drawn on (each pair
// was picked for that, and the night-display browser test has axe measure both ends). Each channel only rises
// from the dimmest to the brightest value, so every level in between lies between them in contrast too.
// A CSS brightness filter over the page would be less code, but axe reads the colours before the filter, so it
// would pass a page whose real contrast the filter had dragged below 4.5:1.
//
// Neutral text, lines and the accent are amber; go, no-go and caution keep their own hues, dimmed the same way,
// so a status still reads at a glance.

export const NIGHT_BRIGHTNESS = { dimmest: 1, brightest: 5, initial: 2 } as const;

/** A colour the brightness moves: [dimmest, brightest]. */
type Ramp = readonly [string, string];

interface NightPalette {
  subtle: string;
  muted: string;
  emphasized: string;
  solid: string;
  fg: Ramp;
  contrast: Ramp;
  border: Ramp;
  focusRing: Ramp;
}

const NIGHT_PALETTE_NAMES = ['gray', 'accent', 'go', 'nogo', 'caution'] as const;
export type NightPaletteName = (typeof NIGHT_PALETTE_NAMES)[number];

const palettes: Record<NightPaletteName, NightPalette> = {
  gray: {
    subtle: '#110e0b',
    muted: '#15120e',
    emphasized: '#1b1612',
    solid: '#1e1913',
    fg: ['#a8825d', '#c0a68b'],
    contrast: ['#a68665', '#c2ac95'],
    border: ['#3f3326', '#5f4d3a'],
    focusRing: ['#6e553b', '#9f7b56'],
  },
  accent: {
    subtle: '#150d05',
    muted: '#1a1006',
    emphasized: '#201507',
    solid: '#241708',
    fg: ['#cd720b', '#f39324'],
    contrast: ['#cc7715', '#ec9f46'],
    border: ['#4c2e0c', '#724613'],
    focusRing: ['#864b07', '#c16c0a'],
  },
  go: {
    subtle: '#091109',
    muted: '#0b150b',
    emphasized: '#0d1a0e',
    solid: '#0f1d10',
    fg: ['#3b9c43', '#55bf5e'],
    contrast: ['#439e4a', '#6ec275'],
    border: ['#1c3c1f', '#2a5a2e'],
    focusRing: ['#27662c', '#38933f'],
  },
  nogo: {
    subtle: '#1b0a08',
    muted: '#210c09',
    emphasized: '#2a0f0c',
    solid: '#2f100d',
    fg: ['#eb5847', '#f18f84'],
    contrast: ['#e36455', '#ed9a90'],
    border: ['#621d15', '#922c20'],
    focusRing: ['#ad2313', '#e94735'],
  },
  caution: {
    subtle: '#120e04',
    muted: '#171205',
    emphasized: '#1d1607',
    solid: '#201907',
    fg: ['#b38009', '#dd9f0c'],
    contrast: ['#b48413', '#e2a518'],
    border: ['#43330b', '#664c11'],
    focusRing: ['#755406', '#a87909'],
  },
};

/** The page's own backgrounds, text and lines. */
const neutral: Record<string, string | Ramp> = {
  bg: '#0a0403',
  'bg.subtle': '#110806',
  'bg.panel': '#130907',
  'bg.muted': '#190c08',
  'bg.emphasized': '#22100a',
  fg: ['#c57a39', '#d7a476'],
  'fg.muted': ['#b9773e', '#c88d59'],
  'fg.subtle': ['#b57944', '#be8452'],
  border: ['#452a1d', '#6a412d'],
  'border.muted': ['#2e1d14', '#4a2e20'],
  'border.emphasized': ['#5a3726', '#845138'],
};

/** The CSS variable a night colour is read from, e.g. `--night-bg-panel` for `bg.panel`. */
export const nightVariable = (token: string) => `--night-${token.replace('.', '-')}`;

/** A night colour as a theme token's value: whatever the brightness level has put in its variable. */
export const nightColour = (token: string) => `var(${nightVariable(token)})`;

const channels = (hex: string) => [1, 3, 5].map((at) => parseInt(hex.slice(at, at + 2), 16));

/** The colour `share` of the way from the dimmest to the brightest value, channel by channel. */
function along([dimmest, brightest]: Ramp, share: number): string {
  const [from, to] = [channels(dimmest), channels(brightest)];
  return `#${from
    .map((value, i) =>
      Math.round(value + (to[i] - value) * share)
        .toString(16)
        .padStart(2, '0'),
    )
    .join('')}`;
}

/** Every night colour at a brightness level, keyed by its CSS variable. */
export function nightColours(level: number): Record<string, string> {
  const share = (level - NIGHT_BRIGHTNESS.dimmest) / (NIGHT_BRIGHTNESS.brightest - NIGHT_BRIGHTNESS.dimmest);
  const colour = (value: string | Ramp) => (typeof value === 'string' ? value : along(value, share));
  const entries: [string, string | Ramp][] = [
    ...Object.entries(neutral),
    ...NIGHT_PALETTE_NAMES.flatMap((name) =>
      Object.entries(palettes[name]).map(([role, value]): [string, string | Ramp] => [`${name}.${role}`, value]),
    ),
  ];
  return Object.fromEntries(entries.map(([token, value]) => [nightVariable(token), colour(value)]));
}
