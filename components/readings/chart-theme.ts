import { colors, fonts, type as typeScale } from '@/components/theme';

export type MarkerShape = 'circle' | 'square' | 'triangle' | 'diamond';

export interface SeriesStyle {
  color: string;
  /** SVG stroke-dasharray; undefined for a solid line. */
  dash?: string;
  marker: MarkerShape;
}

// Series differ by colour, dash and marker together, so they stay apart in greyscale and for
// colour-blind readers. Red and yellow are left out: they mean danger and caution here.
const SERIES_STYLES: SeriesStyle[] = [
  { color: colors.brand, marker: 'circle' },
  { color: colors.mandatory, dash: '8 5', marker: 'square' },
  { color: '#6a3d9a', dash: '2 4', marker: 'triangle' },
  { color: '#7a4a12', dash: '12 4 3 4', marker: 'diamond' },
  { color: colors.ink, dash: '4 3', marker: 'circle' },
  { color: '#3d6b1f', dash: '1 3', marker: 'square' },
];

export const seriesStyle = (index: number): SeriesStyle => SERIES_STYLES[index % SERIES_STYLES.length];

export const chart = {
  phoneHeight: 240,
  wideHeight: 320,
  // Top margin leaves room for the unit above the highest tick label.
  margin: { top: 32, right: 16, bottom: 40, left: 52 },
  tickFont: { fontFamily: fonts.regular, fontSize: typeScale.small.fontSize },
  axis: colors.inkMuted,
  grid: colors.line,
  text: colors.ink,
  dangerLine: colors.danger,
  neutralLine: colors.inkMuted,
  plate: colors.surface,
  /** Average glyph width as a fraction of the font size, for sizing label plates. */
  charWidthEm: 0.55,
  strokeWidth: 2.5,
  markerRadius: 4.5,
  /** Roughly one x tick per this many pixels; a date label is under 60 px wide. */
  xTickSpacing: 72,
  yTicks: 5,
} as const;
