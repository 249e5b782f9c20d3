import { createSystem, defineConfig } from '@chakra-ui/react';
import { chakraBaseConfig } from './chakra-base.js';
import { scales } from './palette.js';

type ScaleName = keyof typeof scales;
type Shade = keyof (typeof scales)['hull'];

const ref = (scale: ScaleName, shade: Shade) => `{colors.${scale}.${shade}}`;
const dayNight = (day: string, night: string) => ({ value: { _light: day, _dark: night } });

/** A colour palette usable as `colorPalette`: bright and firm by day, dark and dim by night. */
function semanticPalette(scale: ScaleName, dayContrast = '{colors.white}') {
  return {
    contrast: dayNight(dayContrast, ref(scale, '100')),
    fg: dayNight(ref(scale, '700'), ref(scale, '300')),
    subtle: dayNight(ref(scale, '100'), ref(scale, '950')),
    muted: dayNight(ref(scale, '200'), ref(scale, '900')),
    emphasized: dayNight(ref(scale, '300'), ref(scale, '800')),
    solid: dayNight(ref(scale, '600'), ref(scale, '800')),
    focusRing: dayNight(ref(scale, '500'), ref(scale, '400')),
    border: dayNight(ref(scale, '600'), ref(scale, '700')),
  };
}

const tokenScale = (scale: ScaleName) =>
  Object.fromEntries(Object.entries(scales[scale]).map(([shade, value]) => [shade, { value }]));

const plexStack = "'IBM Plex Sans', system-ui, 'Segoe UI', sans-serif";

const catlineConfig = defineConfig({
  globalCss: {
    'html, body': { bg: 'bg', color: 'fg', minHeight: '100%' },
    body: { fontFamily: 'body', fontSize: 'md', lineHeight: '1.45', overflowX: 'hidden' },
    // On a tablet every control takes a finger, whatever size its screen drew it at for a mouse.
    'button, a[href], input, select, textarea, [role=tab], [role=button]': {
      '@media (pointer: coarse)': { minHeight: 'tap', minWidth: 'tap' },
    },
  },
  theme: {
    tokens: {
      colors: {
        hull: tokenScale('hull'),
        tide: tokenScale('tide'),
        kelp: tokenScale('kelp'),
        ember: tokenScale('ember'),
        flare: tokenScale('flare'),
        // Chakra's own components default to the gray palette: make it ours.
        gray: tokenScale('hull'),
      },
      fonts: { heading: { value: plexStack }, body: { value: plexStack } },
      // tap: the least a finger can hit (44 px, WCAG 2.5.5); touch: a station's action, hit in a hurry on a moving deck (60 px).
      sizes: { touch: { value: '3.75rem' }, tap: { value: '2.75rem' } },
      spacing: { gutter: { value: '1rem' }, 'gutter.wide': { value: '1.5rem' } },
      radii: { card: { value: '0.5rem' } },
    },
    semanticTokens: {
      colors: {
        bg: {
          DEFAULT: dayNight('{colors.white}', ref('hull', '950')),
          subtle: dayNight(ref('hull', '50'), '#0f1920'),
          muted: dayNight(ref('hull', '100'), ref('hull', '900')),
          emphasized: dayNight(ref('hull', '200'), ref('hull', '800')),
          panel: dayNight('{colors.white}', ref('hull', '900')),
        },
        fg: {
          DEFAULT: dayNight(ref('hull', '950'), ref('hull', '300')),
          muted: dayNight(ref('hull', '700'), ref('hull', '400')),
          subtle: dayNight(ref('hull', '600'), ref('hull', '500')),
        },
        border: {
          DEFAULT: dayNight(ref('hull', '400'), ref('hull', '800')),
          muted: dayNight(ref('hull', '300'), ref('hull', '900')),
          emphasized: dayNight(ref('hull', '600'), ref('hull', '700')),
        },
        gray: {
          ...semanticPalette('hull'),
          solid: dayNight(ref('hull', '900'), ref('hull', '700')),
          fg: dayNight(ref('hull', '800'), ref('hull', '300')),
        },
        accent: semanticPalette('tide'),
        go: semanticPalette('kelp'),
        nogo: semanticPalette('ember'),
        caution: {
          ...semanticPalette('flare', ref('hull', '950')),
          solid: dayNight(ref('flare', '300'), ref('flare', '800')),
        },
      },
    },
    textStyles: {
      figure: { value: { fontVariantNumeric: 'tabular-nums', fontWeight: '600' } },
    },
  },
});

export const system = createSystem(chakraBaseConfig, catlineConfig);
