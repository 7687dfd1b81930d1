import fs from 'node:fs';
import path from 'node:path';
import { describe, expect, it } from 'vitest';
import { ICON_GLYPHS } from '@/components/ui/icon-glyphs';
import { SUBSET_FILE, readFullGlyphMap, subsetSource, usedGlyphNames } from '@/scripts/lib/icon-glyphs';

const ROOT = path.resolve(__dirname, '../../..');
const full = readFullGlyphMap();

function filesUnder(dir: string): string[] {
  return fs.readdirSync(dir, { withFileTypes: true }).flatMap((e) => (e.isDirectory() ? filesUnder(path.join(dir, e.name)) : /\.tsx?$/.test(e.name) ? [path.join(dir, e.name)] : []));
}

describe('the icon glyph subset', () => {
  it('is the generated file for the names the sources use today (npx tsx scripts/icon-glyphs.ts)', () => {
    expect(fs.readFileSync(SUBSET_FILE, 'utf8')).toBe(subsetSource(full, usedGlyphNames(full)));
  });

  it('keeps the code point of every glyph as the font shipped with @expo/vector-icons has it', () => {
    const names = Object.keys(ICON_GLYPHS) as (keyof typeof ICON_GLYPHS)[];
    expect(names.length).toBeGreaterThan(50);
    for (const name of names) expect([name, ICON_GLYPHS[name]]).toEqual([name, full[name]]);
    // from memory: Material Design Icons (pictogrammers.com) lists "alert" at F0026 and "check" at F012C
    expect([ICON_GLYPHS.alert, ICON_GLYPHS.check]).toEqual([0xf0026, 0xf012c]);
  });

  it('is a small part of the full map', () => {
    expect(Object.keys(ICON_GLYPHS).length).toBeLessThan(Object.keys(full).length / 20);
  });

  it('is the only way screens reach @expo/vector-icons, so no page loads every icon set', () => {
    const offenders = ['app', 'components', 'hooks']
      .flatMap((d) => filesUnder(path.join(ROOT, d)))
      .filter((f) => /from '@expo\/vector-icons['/]/.test(fs.readFileSync(f, 'utf8')))
      .map((f) => path.relative(ROOT, f));
    expect(offenders).toEqual(['components/ui/icons.ts']);
  });
});
