/**
 * Isoledger's design tokens: one place for colours, spacing, type and breakpoints.
 * Safety colours keep their ISO 3864-1 meanings: red danger/prohibition, yellow caution,
 * blue mandatory action, green safe condition. State is never shown by colour alone.
 */
export const colors = {
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
} as const;

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
  minTouch: 44,
} as const;
