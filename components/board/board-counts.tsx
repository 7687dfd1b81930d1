import { MaterialCommunityIcons } from '@/components/ui/icons';
import type { ComponentProps } from 'react';
import { Pressable, StyleSheet, View } from 'react-native';
import { colors, layout, radius, space } from '@/components/theme';
import { Notice } from '@/components/ui/notice';
import { Text } from '@/components/ui/text';
import { BOARD_STATE_LOOK } from '@/components/board/board-vocabulary';
import type { BoardState } from '@/shared/rules/board';
import type { BoardResponse } from '@/shared/types/board';

type IconName = ComponentProps<typeof MaterialCommunityIcons>['name'];

interface Props {
  counts: BoardResponse['counts'];
  siteId: number | null;
  state: BoardState | null;
  onSite: (siteId: number | null) => void;
  onState: (state: BoardState | null) => void;
}

/** The overview over every live tag the person may see; tapping a figure narrows the list below to it. */
export function BoardCounts({ counts, siteId, state, onSite, onState }: Props) {
  return (
    <View style={{ gap: space.sm }} testID="board-counts">
      <View style={styles.tiles}>
        <Tile label="Live tags" value={counts.total} icon="tag-multiple-outline" selected={!state && !siteId} onPress={() => { onState(null); onSite(null); }} testID="count-total" />
        <Tile label="Past expiry" value={counts.overdue} icon={BOARD_STATE_LOOK.overdue.icon} alert={counts.overdue > 0} selected={state === 'overdue'} onPress={() => onState(state === 'overdue' ? null : 'overdue')} testID="count-overdue" />
        <Tile label="Due within 24 h" value={counts.dueSoon} icon={BOARD_STATE_LOOK['due-soon'].icon} selected={state === 'due-soon'} onPress={() => onState(state === 'due-soon' ? null : 'due-soon')} testID="count-due-soon" />
      </View>
      {counts.notProved ? (
        <View style={styles.notProved} testID="count-not-proved">
          <MaterialCommunityIcons name="alert" size={20} color={colors.cautionInk} />
          <Text variant="label" bold style={{ color: colors.cautionInk }}>{`Not proved: ${counts.notProved} live isolation${counts.notProved === 1 ? '' : 's'} with no proof of isolation recorded`}</Text>
        </View>
      ) : null}
      {counts.perSite.length ? (
        <View style={styles.sites} role="list" aria-label="Live tags per site">
          {counts.perSite.map((s) => {
            const on = siteId === s.siteId;
            return (
              <Pressable
                key={s.siteId}
                role="listitem"
                accessibilityRole="button"
                accessibilityState={{ selected: on }}
                accessibilityLabel={`${s.siteName}: ${s.total} live, ${s.overdue} past expiry, ${s.dueSoon} due within 24 hours${on ? ', shown' : ''}`}
                onPress={() => onSite(on ? null : s.siteId)}
                style={StyleSheet.flatten([styles.site, on && styles.siteOn])}
                testID={`count-site-${s.siteId}`}
              >
                <MaterialCommunityIcons name={on ? 'check-circle' : 'office-building-outline'} size={20} color={on ? colors.brandInk : colors.ink} />
                <Text variant="label" bold style={{ color: on ? colors.brandInk : colors.ink }} numberOfLines={1}>{s.siteName}</Text>
                <Text variant="label" style={{ color: on ? colors.brandInk : colors.ink }}>
                  {`· ${s.total} live${s.overdue ? `, ${s.overdue} past expiry` : ''}`}
                </Text>
              </Pressable>
            );
          })}
        </View>
      ) : null}
    </View>
  );
}

function Tile({ label, value, icon, selected, alert, onPress, testID }: { label: string; value: number; icon: IconName; selected: boolean; alert?: boolean; onPress: () => void; testID: string }) {
  const fg = alert ? colors.brandInk : colors.ink;
  return (
    <Pressable
      accessibilityRole="button"
      accessibilityState={{ selected }}
      accessibilityLabel={`${label}: ${value}`}
      onPress={onPress}
      style={StyleSheet.flatten([styles.tile, alert && styles.tileAlert, selected && styles.tileSelected])}
      testID={testID}
    >
      <View style={styles.tileTop}>
        <MaterialCommunityIcons name={icon} size={24} color={fg} />
        <Text variant="heading" style={{ color: fg }} testID={`${testID}-value`}>{String(value)}</Text>
      </View>
      <Text variant="small" bold style={{ color: fg }}>{label}</Text>
    </Pressable>
  );
}

const styles = StyleSheet.create({
  notProved: { flexDirection: 'row', alignItems: 'center', gap: space.sm, padding: space.sm, borderRadius: radius.md, borderWidth: 2, borderColor: colors.caution, backgroundColor: colors.cautionSoft },
  tiles: { flexDirection: 'row', gap: space.sm },
  tile: { flex: 1, minHeight: layout.minTouch, padding: space.sm, gap: 2, borderRadius: radius.md, borderWidth: 2, borderColor: colors.line, backgroundColor: colors.surface },
  tileAlert: { backgroundColor: colors.mandatory, borderColor: colors.mandatory },
  tileSelected: { borderColor: colors.ink, borderWidth: 3 },
  tileTop: { flexDirection: 'row', alignItems: 'center', gap: space.sm },
  sites: { flexDirection: 'row', flexWrap: 'wrap', gap: space.sm },
  site: { flexDirection: 'row', alignItems: 'center', gap: space.xs, minHeight: layout.minTouch, paddingHorizontal: space.md, borderRadius: radius.pill, borderWidth: 2, borderColor: colors.ink, backgroundColor: colors.surface, maxWidth: '100%' },
  siteOn: { backgroundColor: colors.brand, borderColor: colors.brand },
});

/** Sites whose yearly review of the isolation procedure is overdue (OSHA 29 CFR 1910.147(c)(6)). */
export function BoardReviewsOverdue({ sites }: { sites: BoardResponse['reviewsOverdue'] }) {
  if (!sites.length) return null;
  return (
    <View testID="board-reviews-overdue">
      <Notice tone="caution" word="Review overdue">
        {`Isolation procedure review more than 12 months old: ${sites.map((s) => `${s.siteName} (${s.lastReviewedOn ? `last ${s.lastReviewedOn}` : 'none recorded'})`).join('; ')}.`}
      </Notice>
    </View>
  );
}
