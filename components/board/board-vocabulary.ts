import type { MaterialCommunityIcons } from '@/components/ui/icons';
import type { ComponentProps } from 'react';
import { STATE_LOOK, type StateTone } from '@/components/tags/tag-vocabulary';
import { BOARD_STATE_LABELS, type BoardState } from '@/shared/rules/board';

type IconName = ComponentProps<typeof MaterialCommunityIcons>['name'];

/**
 * Each board state has a glyph and a word as well as a colour. Overdue keeps the tag screens' blue "act now"
 * mark (ISO 3864-1 mandatory action); due soon is yellow caution; a live tag in date is a neutral mark.
 */
export const BOARD_STATE_LOOK: Record<BoardState, { tone: StateTone; icon: IconName; word: string }> = {
  overdue: { tone: STATE_LOOK.overdue.tone, icon: STATE_LOOK.overdue.icon, word: BOARD_STATE_LABELS.overdue },
  'due-soon': { tone: 'caution', icon: 'timer-sand', word: BOARD_STATE_LABELS['due-soon'] },
  live: { tone: 'neutral', icon: 'tag-outline', word: BOARD_STATE_LABELS.live },
};

/** "tel:" address for a contact number: digits and a leading + only. */
export const telHref = (phone: string): `tel:${string}` => `tel:${phone.replace(/[^0-9+]/g, '')}`;

/** "14:05:09", the time the board was computed, on this device's clock. */
export const clockTime = (iso: string | number) =>
  new Intl.DateTimeFormat('en-GB', { hour: '2-digit', minute: '2-digit', second: '2-digit', hourCycle: 'h23' }).format(new Date(iso));
