import { MaterialCommunityIcons } from '@/components/ui/icons';
import { Link } from 'expo-router';
import { onlineManager } from '@tanstack/react-query';
import { useMemo, useSyncExternalStore } from 'react';
import { Pressable, StyleSheet, View } from 'react-native';
import { colors, layout, radius, space } from '@/components/theme';
import { Button } from '@/components/ui/button';
import { Card } from '@/components/ui/card';
import { Notice } from '@/components/ui/notice';
import { Text } from '@/components/ui/text';
import { deviceZone } from '@/components/places/zone';
import { formatInZone } from '@/components/tags/tag-time';
import { useSiteQuery } from '@/hooks/api/use-sites';
import { useTagsQuery } from '@/hooks/api/use-tags';
import { flushOutbox, outbox } from '@/hooks/offline/send-or-queue';
import { useOutboxEntries } from '@/hooks/offline/use-outbox';
import type { OutboxEntry } from '@/hooks/offline/outbox-types';
import type { Asset } from '@/shared/types/register';

/** "Wed 2 Dec, 11:33" in the device's own zone: a month name, never a date that reads two ways. */
const when = (iso: string) => formatInZone(iso, deviceZone());

/** One action on this device: waiting to send, or refused by the server with its message. */
function PendingEntry({ entry, actions }: { entry: OutboxEntry; actions: boolean }) {
  if (entry.state === 'refused') {
    return (
      <View testID="pending-entry" style={{ gap: space.sm }}>
        <Notice tone="danger" word="Refused by the server" title={entry.summary}>
          {`${entry.refusal?.message ?? 'The server refused this action.'} (taken ${when(entry.createdAt)})`}
        </Notice>
        {actions ? (
          <View style={styles.row}>
            <Button title="Send again" variant="secondary" onPress={() => void outbox.retry(entry.key).then(flushOutbox)} />
            <Button title="Remove from this device" variant="secondary" onPress={() => void outbox.remove(entry.key)} testID="pending-remove" />
          </View>
        ) : null}
      </View>
    );
  }
  const clearance = entry.kind === 'tag-clear';
  const title = `${clearance ? 'Clearance waiting to send' : 'Waiting to send'}: ${entry.summary}`;
  return (
    <View testID="pending-entry" style={styles.waiting} accessibilityLabel={title}>
      <MaterialCommunityIcons name="cloud-upload-outline" size={26} color={colors.mandatory} />
      <View style={{ flex: 1 }}>
        <Text bold>{title}</Text>
        <Text muted variant="small">
          {clearance
            ? `Taken ${when(entry.createdAt)} on this device. The tag stays live on record until the server confirms the clearance.`
            : `Taken ${when(entry.createdAt)} on this device. Not on record until the server confirms it.`}
        </Text>
      </View>
    </View>
  );
}

/** The actions of one item (and of its tags) or of one tag still on this device; nothing when there are none. */
export function PendingForRecord({ assetId, tagId, tagIds }: { assetId?: number; tagId?: number; tagIds?: readonly number[] }) {
  const all = useOutboxEntries();
  const entries = all.filter((e) =>
    (assetId !== undefined && (e.assetId === assetId || (e.tagId !== undefined && !!tagIds?.includes(e.tagId)))) ||
    (tagId !== undefined && e.tagId === tagId));
  if (!entries.length) return null;
  return (
    <Card>
      <Text variant="title">On this device</Text>
      {entries.map((e) => <PendingEntry key={e.key} entry={e} actions={false} />)}
      <Link href="/pending" style={styles.link}><Text bold style={{ color: colors.brand }}>All pending actions</Text></Link>
    </Card>
  );
}

/**
 * On an item's record: its actions still on this device, and its site fetched alongside, so raising a tag
 * (which needs the site's time zone) works later with no signal.
 */
export function ItemOffline({ asset }: { asset: Pick<Asset, 'id' | 'siteId'> }) {
  useSiteQuery(asset.siteId);
  // The item's tags as its record shows them (the same cached list): a note or clearance queued on one belongs here too.
  const tags = useTagsQuery({ assetId: asset.id });
  const tagIds = useMemo(() => (tags.data?.items ?? []).map((t) => t.id), [tags.data]);
  return <PendingForRecord assetId={asset.id} tagIds={tagIds} />;
}

/** A strip at the top of every signed-in screen with no signal, and while anything waits or was refused. */
export function PendingBanner() {
  const entries = useOutboxEntries();
  const online = useSyncExternalStore(onlineManager.subscribe, () => onlineManager.isOnline(), () => true);
  const noSignal = online ? null : (
    <View style={styles.noSignal} testID="no-signal-banner" accessibilityRole="alert">
      <MaterialCommunityIcons name="cloud-off-outline" size={24} color={colors.ink} />
      <Text bold style={{ flex: 1 }}>No signal: showing what this device saved.</Text>
    </View>
  );
  if (!entries.length) return noSignal;
  const refused = entries.filter((e) => e.state === 'refused').length;
  const waiting = entries.length - refused;
  const words = [waiting ? `${waiting} waiting to send` : '', refused ? `${refused} refused` : ''].filter(Boolean).join(', ');
  return (
    <>
      {noSignal}
      <Link href="/pending" asChild>
        <Pressable style={StyleSheet.flatten([styles.banner, refused ? styles.bannerRefused : null])} accessibilityRole="link" testID="pending-banner">
          <MaterialCommunityIcons name={refused ? 'alert-octagon' : 'cloud-upload-outline'} size={24} color={colors.ink} />
          <Text bold>{`Actions on this device: ${words}`}</Text>
        </Pressable>
      </Link>
    </>
  );
}

/** Every action on this device, oldest first, with what to do about refused ones. */
export function PendingActionsList() {
  const entries = useOutboxEntries();
  if (!entries.length) {
    return <Notice tone="safe" word="All sent">Nothing is waiting on this device.</Notice>;
  }
  return (
    <View style={{ gap: space.md }} testID="pending-list">
      {entries.map((e) => <PendingEntry key={e.key} entry={e} actions />)}
      {entries.some((e) => e.state === 'waiting') ? <Button title="Send now" onPress={() => void flushOutbox()} testID="pending-send-now" /> : null}
    </View>
  );
}

const styles = StyleSheet.create({
  row: { flexDirection: 'row', flexWrap: 'wrap', gap: space.sm },
  waiting: { flexDirection: 'row', gap: space.md, alignItems: 'center', padding: space.md, borderRadius: radius.md, borderWidth: 2, borderColor: colors.mandatory, backgroundColor: colors.mandatorySoft },
  link: { minHeight: layout.minTouch, paddingVertical: space.md },
  banner: { flexDirection: 'row', gap: space.sm, alignItems: 'center', minHeight: layout.minTouch, paddingHorizontal: space.lg, backgroundColor: colors.mandatorySoft, borderBottomWidth: 2, borderBottomColor: colors.mandatory },
  bannerRefused: { backgroundColor: colors.dangerSoft, borderBottomColor: colors.danger },
  noSignal: { flexDirection: 'row', gap: space.sm, alignItems: 'center', minHeight: layout.minTouch, paddingHorizontal: space.lg, paddingVertical: space.xs, backgroundColor: colors.surfaceSunk, borderBottomWidth: 2, borderBottomColor: colors.line },
});
