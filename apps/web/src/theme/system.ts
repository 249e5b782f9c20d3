import { createSystem, defineConfig } from '@chakra-ui/react';
import { chakraBaseConfig } from './chakra-base.js';
import { type NightPaletteName, nightColour as night } from './night-scheme.js';
import { scales } from './palette.js';

type ScaleName = keyof typeof scales;
type Shade = keyof (typeof scales)['hull'];

const ref = (scale: ScaleName, shade: Shade) => `{colors.${scale}.${shade}}`;
const dayNight = (day: string, night: string) => ({ value: { _light: day, _dark: night } });

/** A colour palette usable as `colorPalette`: bright and firm by day, the dim night scheme's by night. */
function semanticPalette(scale: ScaleName, name: NightPaletteName, dayContrast = '{colors.white}') {
  const byNight = (role: string) => night(`${name}.${role}`);
  return {
    contrast: dayNight(dayContrast, byNight('contrast')),
    fg: dayNight(ref(scale, '700'), byNight('fg')),
    subtle: dayNight(ref(scale, '100'), byNight('subtle')),
    muted: dayNight(ref(scale, '200'), byNight('muted')),
    emphasized: dayNight(ref(scale, '300'), byNight('emphasized')),
    solid: dayNight(ref(scale, '600'), byNight('solid')),
    focusRing: dayNight(ref(scale, '500'), byNight('focusRing')),
    border: dayNight(ref(scale, '600'), byNight('border')),
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
          DEFAULT: dayNight('{colors.white}', night('bg')),
          subtle: dayNight(ref('hull', '50'), night('bg.subtle')),
          muted: dayNight(ref('hull', '100'), night('bg.muted')),
          emphasized: dayNight(ref('hull', '200'), night('bg.emphasized')),
          panel: dayNight('{colors.white}', night('bg.panel')),
        },
        fg: {
          DEFAULT: dayNight(ref('hull', '950'), night('fg')),
          muted: dayNight(ref('hull', '700'), night('fg.muted')),
          subtle: dayNight(ref('hull', '600'), night('fg.subtle')),
          // Chakra's own components' message colours, in the night scheme's hues.
          error: dayNight('{colors.red.500}', night('nogo.fg')),
          warning: dayNight('{colors.orange.600}', night('caution.fg')),
          success: dayNight('{colors.green.600}', night('go.fg')),
        },
        border: {
          DEFAULT: dayNight(ref('hull', '400'), night('border')),
          muted: dayNight(ref('hull', '300'), night('border.muted')),
          emphasized: dayNight(ref('hull', '600'), night('border.emphasized')),
        },
        gray: {
          ...semanticPalette('hull', 'gray'),
          solid: dayNight(ref('hull', '900'), night('gray.solid')),
          fg: dayNight(ref('hull', '800'), night('gray.fg')),
        },
        accent: semanticPalette('tide', 'accent'),
        go: semanticPalette('kelp', 'go'),
        nogo: semanticPalette('ember', 'nogo'),
        caution: {
          ...semanticPalette('flare', 'caution', ref('hull', '950')),
          // flare.700 on its own subtle tint reads 6.4:1; the Cat station's state colours need 7:1 in sun (WCAG 1.4.6).
          fg: dayNight(ref('flare', '800'), night('caution.fg')),
          solid: dayNight(ref('flare', '300'), night('caution.solid')),
        },
      },
    },
    textStyles: {
      figure: { value: { fontVariantNumeric: 'tabular-nums', fontWeight: '600' } },
    },
  },
});

export const system = createSystem(chakraBaseConfig, catlineConfig);
