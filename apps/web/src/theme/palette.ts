// Catline's own colour scales. `hull` is the neutral blue-grey of the board, `tide` the accent,
// `kelp` means go, `ember` means no-go or stop, `flare` means caution.
type Scale = Record<'50' | '100' | '200' | '300' | '400' | '500' | '600' | '700' | '800' | '900' | '950', string>;

export const hull: Scale = {
  50: '#f4f7f9',
  100: '#e6ecf0',
  200: '#cdd8df',
  300: '#a9b9c4',
  400: '#7e93a1',
  500: '#5c7280',
  600: '#455966',
  700: '#33444f',
  800: '#22303a',
  900: '#151f27',
  950: '#0b1218',
};

export const tide: Scale = {
  50: '#e8f4f8',
  100: '#c6e3ee',
  200: '#93c9dc',
  300: '#5aa9c4',
  400: '#2f8aab',
  500: '#176f90',
  600: '#0f5875',
  700: '#0c465d',
  800: '#0a3547',
  900: '#082634',
  950: '#051822',
};

export const kelp: Scale = {
  50: '#e9f7ef',
  100: '#c8ebd6',
  200: '#95d6b0',
  300: '#5cbc86',
  400: '#2f9e63',
  500: '#1c824d',
  600: '#15683e',
  700: '#115232',
  800: '#0e3f27',
  900: '#0a2d1c',
  950: '#061b11',
};

export const ember: Scale = {
  50: '#fdecea',
  100: '#f9cfca',
  200: '#f2a197',
  300: '#e86e60',
  400: '#d94634',
  500: '#bb3222',
  600: '#97271a',
  700: '#751f15',
  800: '#561812',
  900: '#3b110d',
  950: '#220a07',
};

export const flare: Scale = {
  50: '#fff7e6',
  100: '#fde8bf',
  200: '#f9d184',
  300: '#f2b33d',
  400: '#e09a1a',
  500: '#c17e0b',
  600: '#9a6208',
  700: '#744a08',
  800: '#55370a',
  900: '#3b2709',
  950: '#231705',
};

export const scales = { hull, tide, kelp, ember, flare };
