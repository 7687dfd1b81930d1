/*
 * npx tsx scripts/icon-glyphs.ts — rewrites components/ui/icon-glyphs.ts, the glyphs the app's icons may use,
 * from the icon names found in app/, components/ and hooks/. Run it after using an icon not used before.
 */
import fs from 'node:fs';
import { SUBSET_FILE, readFullGlyphMap, subsetSource, usedGlyphNames } from '@/scripts/lib/icon-glyphs';

const full = readFullGlyphMap();
const names = usedGlyphNames(full);
fs.writeFileSync(SUBSET_FILE, subsetSource(full, names));
console.log(`components/ui/icon-glyphs.ts: ${names.length} glyphs`);
