import { describe, expect, it } from 'vitest';
import { layout } from '@/components/theme';
import { palettes, type ColorName, type ColorScheme } from '@/components/theme/palette';

// WCAG 2.1 "relative luminance": sRGB channels linearised, then 0.2126 R + 0.7152 G + 0.0722 B.
function luminance(hex: string): number {
  const [r, g, b] = [1, 3, 5].map((i) => parseInt(hex.slice(i, i + 2), 16) / 255).map((c) => (c <= 0.04045 ? c / 12.92 : ((c + 0.055) / 1.055) ** 2.4));
  return 0.2126 * r + 0.7152 * g + 0.0722 * b;
}

// WCAG 2.1 "contrast ratio": (L1 + 0.05) / (L2 + 0.05), L1 the lighter.
function contrast(a: string, b: string): number {
  const [hi, lo] = [luminance(a), luminance(b)].sort((x, y) => y - x);
  return (hi + 0.05) / (lo + 0.05);
}

// Text on the backgrounds it is drawn on across components/ui: body and muted text on pages, cards, sunk rows and
// the tinted notices; words on filled buttons and badges; links and quiet buttons; the side navigation.
const TEXT_PAIRS: [fg: ColorName, bg: ColorName][] = [
  ['ink', 'paper'], ['ink', 'surface'], ['ink', 'surfaceSunk'],
  ['ink', 'dangerSoft'], ['ink', 'cautionSoft'], ['ink', 'mandatorySoft'], ['ink', 'safeSoft'],
  ['inkMuted', 'paper'], ['inkMuted', 'surface'], ['inkMuted', 'surfaceSunk'],
  ['brandInk', 'brand'], ['brandInk', 'danger'], ['brandInk', 'mandatory'], ['cautionInk', 'caution'],
  ['brand', 'surface'], ['brand', 'paper'], ['paper', 'ink'], ['danger', 'surface'],
];

// Icons and borders that carry state next to their word: the notice and badge edges and the focus ring.
const NON_TEXT_PAIRS: [fg: ColorName, bg: ColorName][] = [
  ['danger', 'dangerSoft'], ['mandatory', 'mandatorySoft'], ['safe', 'safeSoft'], ['focus', 'surface'], ['focus', 'paper'],
];

describe('theme colours', () => {
  for (const scheme of ['light', 'dark'] as ColorScheme[]) {
    const p = palettes[scheme];
    it(`${scheme}: every text colour on its background reaches 4.5:1`, () => {
      for (const [fg, bg] of TEXT_PAIRS) {
        // WCAG 2.1 SC 1.4.3 Contrast (Minimum), level AA: 4.5:1 for normal-size text
        expect({ pair: `${fg} on ${bg}`, ratio: contrast(p[fg], p[bg]) >= 4.5 }).toEqual({ pair: `${fg} on ${bg}`, ratio: true });
      }
    });
    it(`${scheme}: state icons and the focus ring reach 3:1 against what is next to them`, () => {
      for (const [fg, bg] of NON_TEXT_PAIRS) {
        // WCAG 2.1 SC 1.4.11 Non-text Contrast, level AA: 3:1
        expect({ pair: `${fg} on ${bg}`, ok: contrast(p[fg], p[bg]) >= 3 }).toEqual({ pair: `${fg} on ${bg}`, ok: true });
      }
    });
  }

  it('computes the reference ratios of the WCAG formula', () => {
    // WCAG 2.1 definition of contrast ratio: black on white is 21:1, a colour on itself 1:1
    expect(contrast('#000000', '#ffffff')).toBeCloseTo(21, 5);
    expect(contrast('#777777', '#777777')).toBe(1);
    // from memory: #767676 on white is the classic lightest grey that passes 4.5:1 (≈4.54)
    expect(contrast('#767676', '#ffffff')).toBeCloseTo(4.54, 2);
  });

  it('keeps touch targets at 48 px for gloved hands', () => {
    // WCAG 2.1 SC 2.5.5 Target Size asks 44 CSS px; common practice, no published source: 48 for gloves
    expect(layout.minTouch).toBeGreaterThanOrEqual(48);
  });

  it('has the same colour names in both schemes', () => {
    expect(Object.keys(palettes.dark).sort()).toEqual(Object.keys(palettes.light).sort());
  });
});
