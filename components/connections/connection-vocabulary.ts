import type { MaterialCommunityIcons } from '@/components/ui/icons';
import type { ComponentProps } from 'react';
import { colors } from '@/components/theme';
import type { Medium } from '@/shared/rules/connections';

type IconName = ComponentProps<typeof MaterialCommunityIcons>['name'];

/** Each medium's glyph; lines in the diagram also carry the medium's name, so colour is never the only cue. */
export const MEDIUM_ICONS: Record<Medium, IconName> = {
  gas: 'fire',
  oil: 'oil',
  electrical: 'flash',
  'heating-flow': 'arrow-right-thick',
  'heating-return': 'arrow-left-thick',
  'hot-water': 'water-thermometer',
  'cold-water': 'water',
  'mains-water': 'water-pump',
  refrigerant: 'snowflake',
  'compressed-air': 'weather-windy',
};

// Line colours for the diagram: kept apart from the ISO 3864 safety colours, which mark item states.
export const MEDIUM_LINES: Record<Medium, { stroke: string; dash?: string }> = {
  gas: { stroke: colors.ink },
  oil: { stroke: colors.ink, dash: '2 4' },
  electrical: { stroke: colors.inkMuted, dash: '8 4' },
  'heating-flow': { stroke: colors.brand },
  'heating-return': { stroke: colors.brand, dash: '6 3' },
  'hot-water': { stroke: colors.brand, dash: '2 3' },
  'cold-water': { stroke: colors.focus },
  'mains-water': { stroke: colors.focus, dash: '6 3' },
  refrigerant: { stroke: colors.focus, dash: '2 3' },
  'compressed-air': { stroke: colors.inkMuted, dash: '2 3' },
};
