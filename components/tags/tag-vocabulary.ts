import type { MaterialCommunityIcons } from '@/components/ui/icons';
import type { ComponentProps } from 'react';
import { colors } from '@/components/theme';
import type { AssetState, IsolationMethod, TagEventType, TagKind } from '@/shared/rules/tags';

type IconName = ComponentProps<typeof MaterialCommunityIcons>['name'];
export type StateTone = 'danger' | 'caution' | 'mandatory' | 'safe' | 'neutral';

/**
 * Isoledger's own marks for an item's state. Colours keep their ISO 3864-1 meanings (red danger, yellow caution,
 * blue mandatory action, green safe condition); every state also has its own glyph and word.
 */
export const STATE_LOOK: Record<AssetState | 'overdue' | 'cleared', { tone: StateTone; icon: IconName; word: string; meaning: string }> = {
  isolated: { tone: 'danger', icon: 'shield-lock', word: 'Isolated', meaning: 'Energy isolated for work. Do not operate.' },
  overridden: { tone: 'caution', icon: 'tune-vertical', word: 'Overridden', meaning: 'Deliberately left in a non-normal state.' },
  normal: { tone: 'safe', icon: 'check-circle-outline', word: 'Normal', meaning: 'No live tags on this item.' },
  // Blue: someone must act — clear the tag or extend it with a reason.
  overdue: { tone: 'mandatory', icon: 'clock-alert', word: 'Past expiry', meaning: 'A live tag has passed its expiry. It stays in force until a person clears it.' },
  cleared: { tone: 'neutral', icon: 'lock-open-check-outline', word: 'Cleared', meaning: 'No longer in force.' },
};

export const TONE_COLORS: Record<StateTone, { solid: string; soft: string; onSolid: string }> = {
  danger: { solid: colors.danger, soft: colors.dangerSoft, onSolid: colors.brandInk },
  caution: { solid: colors.caution, soft: colors.cautionSoft, onSolid: colors.cautionInk },
  mandatory: { solid: colors.mandatory, soft: colors.mandatorySoft, onSolid: colors.brandInk },
  safe: { solid: colors.safe, soft: colors.safeSoft, onSolid: colors.brandInk },
  neutral: { solid: colors.inkMuted, soft: colors.surfaceSunk, onSolid: colors.brandInk },
};

export const KIND_LOOK: Record<TagKind, { icon: IconName; word: string; tone: StateTone; explain: string }> = {
  isolation: {
    icon: 'shield-lock',
    word: 'Isolation',
    tone: 'danger',
    explain: 'The item has been made safe to work on: its energy isolated and locked or tagged off. Nobody operates it.',
  },
  override: {
    icon: 'tune-vertical',
    word: 'Override',
    tone: 'caution',
    explain: 'The item was deliberately left in a non-normal state: actuator on manual, setpoint changed, bypass opened, pump forced on, trip reset.',
  },
};

export const METHOD_ICONS: Record<IsolationMethod, IconName> = {
  'valve-locked': 'pipe-valve',
  'isolator-locked': 'electric-switch',
  'fuse-withdrawn': 'flash-off',
  'blank-fitted': 'circle-off-outline',
  disconnected: 'power-plug-off-outline',
  other: 'dots-horizontal-circle-outline',
};

export const EVENT_ICONS: Record<TagEventType, IconName> = {
  raised: 'tag-outline',
  proved: 'check-decagram-outline',
  extended: 'calendar-clock',
  'handover-offered': 'account-arrow-right-outline',
  'handover-withdrawn': 'account-cancel-outline',
  'handed-over': 'account-switch',
  'reassigned-in-absence': 'account-alert-outline',
  acknowledged: 'account-check-outline',
  'note-added': 'note-text-outline',
  'photo-added': 'camera-outline',
  cleared: 'lock-open-check-outline',
  'cleared-in-absence': 'account-alert-outline',
};
