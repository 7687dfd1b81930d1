/**
 * Colour values per scheme. Safety colours keep their ISO 3864-1 meanings in both: red danger/prohibition,
 * yellow caution, blue mandatory action, green safe condition. In the dark scheme the strong colours are lighter
 * and carry dark text (brandInk), so they stay readable as fills and as text on the dark surfaces.
 */
export const lightColors = {
  ink: '#14323d',
  inkMuted: '#4a626b',
  paper: '#f4f2ec',
  surface: '#ffffff',
  surfaceSunk: '#e9e6dc',
  line: '#cfcabb',
  brand: '#1f6f78',
  brandInk: '#ffffff',
  focus: '#0b57d0',
  danger: '#b3261e',
  dangerSoft: '#fbe3e1',
  caution: '#f2c200',
  cautionInk: '#2b2300',
  cautionSoft: '#fff5c7',
  mandatory: '#1b4f9c',
  mandatorySoft: '#e1ebf8',
  safe: '#2e7d32',
  safeSoft: '#e2f1e3',
  /** Dims the screen behind a dialog. */
  scrim: 'rgba(20, 50, 61, 0.6)',
};

export type ColorName = keyof typeof lightColors;

export const darkColors: Record<ColorName, string> = {
  ink: '#e6eef0',
  inkMuted: '#a8bcc3',
  paper: '#0e191d',
  surface: '#16252b',
  surfaceSunk: '#1f3239',
  line: '#4a6069',
  brand: '#6cc4cc',
  brandInk: '#08191d',
  focus: '#8ab4f8',
  danger: '#ff8f85',
  dangerSoft: '#3d1b19',
  caution: '#f2c200',
  cautionInk: '#2b2300',
  cautionSoft: '#3a3110',
  mandatory: '#93b8f2',
  mandatorySoft: '#1a2c47',
  safe: '#7fcf84',
  safeSoft: '#16301b',
  scrim: 'rgba(0, 0, 0, 0.7)',
};

export type ColorScheme = 'light' | 'dark';
export const palettes: Record<ColorScheme, Record<ColorName, string>> = { light: lightColors, dark: darkColors };

/** Printed labels are read by cameras: always dark on white, whatever the screen's scheme. */
export const printColors = { ink: lightColors.ink, paper: '#ffffff' } as const;
