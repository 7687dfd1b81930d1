import { View } from 'react-native';
import { space } from '@/components/theme';
import { Badge } from '@/components/ui/badge';
import { isolatedLabel, summaryOf, type StateSource } from '@/components/tags/tag-summary';
import { STATE_LOOK } from '@/components/tags/tag-vocabulary';

/**
 * An item's tag state in a list row: Isolated ×N, Overridden, Overdue or Normal — glyph and word, never colour alone.
 * Pass the server's summary, or the item's live tags.
 */
export function TagStateBadge(props: StateSource & { hideNormal?: boolean; now?: Date; testID?: string }) {
  // A list row re-renders with its data; a timer per row would cost more than it shows.
  const s = summaryOf(props, props.now ?? new Date());
  if (s.state === 'normal' && props.hideNormal) return null;
  const look = STATE_LOOK[s.state];
  const main = s.state === 'isolated' ? isolatedLabel(s.liveIsolations) : look.word;
  return (
    <View style={{ flexDirection: 'row', flexWrap: 'wrap', gap: space.xs }} testID={props.testID ?? 'tag-state-badge'}>
      <Badge tone={look.tone} icon={look.icon} label={main} />
      {s.state === 'isolated' && s.liveOverrides > 0 ? <Badge tone={STATE_LOOK.overridden.tone} icon={STATE_LOOK.overridden.icon} label="Overridden" /> : null}
      {s.overdue ? <Badge tone={STATE_LOOK.overdue.tone} icon={STATE_LOOK.overdue.icon} label={STATE_LOOK.overdue.word} /> : null}
    </View>
  );
}
