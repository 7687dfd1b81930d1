import createIconSet from '@expo/vector-icons/createIconSet';
import type { ComponentProps } from 'react';
import { ICON_GLYPHS } from '@/components/ui/icon-glyphs';

/**
 * The Material Design Icons font that @expo/vector-icons ships (served from our own build, never a CDN), with only
 * the glyphs the app uses: importing '@expo/vector-icons' itself would put every icon set's full glyph map
 * (about 480 KB of JavaScript) into the script every page loads. A name not in the subset is a type error:
 * run `npx tsx scripts/icon-glyphs.ts` to add it.
 */
export const MaterialCommunityIcons = createIconSet(
  ICON_GLYPHS,
  'material-community',
  require('@expo/vector-icons/build/vendor/react-native-vector-icons/Fonts/MaterialCommunityIcons.ttf'),
);

export type IconName = ComponentProps<typeof MaterialCommunityIcons>['name'];
