/**
 * Isoledger's design tokens: one place for colours (palette.ts, light and dark), spacing, type and breakpoints.
 * Safety colours keep their ISO 3864-1 meanings: red danger/prohibition, yellow caution,
 * blue mandatory action, green safe condition. State is never shown by colour alone.
 */
export { colors } from '@/components/theme/colors';
export { printColors, type ColorScheme } from '@/components/theme/palette';

export const space = { xs: 4, sm: 8, md: 12, lg: 16, xl: 24, xxl: 32, xxxl: 48 } as const;
export const radius = { sm: 4, md: 8, lg: 14, pill: 999 } as const;

export const fonts = {
  regular: 'AtkinsonHyperlegible_400Regular',
  bold: 'AtkinsonHyperlegible_700Bold',
} as const;

// Sizes chosen for reading at arm's length in a dim plant room.
export const type = {
  small: { fontSize: 14, lineHeight: 20 },
  body: { fontSize: 17, lineHeight: 24 },
  label: { fontSize: 15, lineHeight: 20 },
  title: { fontSize: 22, lineHeight: 28 },
  heading: { fontSize: 28, lineHeight: 34 },
} as const;

export const layout = {
  /** Side navigation and tables from this width; one column below it. */
  wideFrom: 900,
  maxContentWidth: 1200,
  sideNavWidth: 232,
  /** Gloved fingers: WCAG 2.1 SC 2.5.5 asks 44 CSS px; we use 48 (Material's minimum target). */
  minTouch: 48,
} as const;
