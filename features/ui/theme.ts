// Conestack's look: warm paper background, ink text, one teal accent. Chart series colours are
// chosen to stay distinct for the common colour-vision deficiencies and pair with line styles.
export const colors = {
  paper: '#f4f1ea',
  card: '#fffdf8',
  ink: '#14212b',
  inkSoft: '#4a5a66',
  rule: '#d9d2c3',
  accent: '#0f766e',
  accentSoft: '#d5ece9',
  warn: '#9a3412',
  grid: '#e6e0d3',
  gridStrong: '#c9c0ad',
  series: ['#0f5fa8', '#c2410c', '#15803d', '#7e22ce'],
} as const;

export const fonts = {
  regular: 'Manrope_400Regular',
  semibold: 'Manrope_600SemiBold',
  bold: 'Manrope_700Bold',
} as const;

export const space = { xs: 4, sm: 8, md: 12, lg: 16, xl: 24, xxl: 32 } as const;
export const radius = { sm: 6, md: 10, lg: 16 } as const;

export const fontFiles = {
  [fonts.regular]: require('../../assets/fonts/Manrope_400Regular.ttf'),
  [fonts.semibold]: require('../../assets/fonts/Manrope_600SemiBold.ttf'),
  [fonts.bold]: require('../../assets/fonts/Manrope_700Bold.ttf'),
};
