import type { MaterialCommunityIcons } from '@/components/ui/icons';
import type { ComponentProps } from 'react';
import { colors } from '@/components/theme';
import type { CheckFlagLevel } from '@/shared/calc';

type IconName = ComponentProps<typeof MaterialCommunityIcons>['name'];

interface FlagStyle {
  word: string;
  icon: IconName;
  bg: string;
  border: string;
  fg: string;
  iconColor: string;
}

// ISO 3864-1 meanings: red for danger, yellow for caution. A note is informative only, so it is grey
// rather than the blue that ISO 3864 keeps for mandatory actions. Icon and word always go with the colour.
export const FLAG_STYLES: Record<CheckFlagLevel, FlagStyle> = {
  danger: { word: 'Danger', icon: 'alert-octagon', bg: colors.dangerSoft, border: colors.danger, fg: colors.ink, iconColor: colors.danger },
  caution: { word: 'Caution', icon: 'alert', bg: colors.cautionSoft, border: colors.caution, fg: colors.cautionInk, iconColor: colors.cautionInk },
  info: { word: 'Note', icon: 'information-outline', bg: colors.surfaceSunk, border: colors.inkMuted, fg: colors.ink, iconColor: colors.ink },
};

const RANK: Record<CheckFlagLevel, number> = { info: 0, caution: 1, danger: 2 };

/** The most serious level among some flags, or null when there are none. */
export function worstLevel(flags: { level: CheckFlagLevel }[]): CheckFlagLevel | null {
  return flags.reduce<CheckFlagLevel | null>((worst, f) => (worst === null || RANK[f.level] > RANK[worst] ? f.level : worst), null);
}
