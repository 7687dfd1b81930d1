import { Link } from 'expo-router';
import { View } from 'react-native';
import { space } from '@/components/theme';
import { Card } from '@/components/ui/card';
import { Text } from '@/components/ui/text';
import { agoPhrase, formatInZone } from '@/components/tags/tag-time';
import type { ReadingActivity, SinceLastVisit, TagActivity } from '@/shared/types/visits';

const kindWord = (kind: string) => (kind === 'override' ? 'override' : 'isolation');

function TagLines({ title, items, zone, now }: { title: string; items: TagActivity[]; zone: string; now: Date }) {
  if (!items.length) return null;
  return (
    <View style={{ gap: space.xs }}>
      <Text bold>{`${title} (${items.length})`}</Text>
      {items.map((e, i) => (
        <Link key={`${e.tagId}-${e.at}-${i}`} href={`/tags/${e.tagId}`}>
          <Text variant="small">{`${e.item.plantId} ${e.item.name} · ${kindWord(e.kind)} · ${e.by.name} · ${formatInZone(e.at, zone, now)} — ${e.text ?? e.reason}`}</Text>
        </Link>
      ))}
    </View>
  );
}

function ReadingLines({ items, zone, now }: { items: ReadingActivity[]; zone: string; now: Date }) {
  if (!items.length) return null;
  return (
    <View style={{ gap: space.xs }}>
      <Text bold>{`Readings with flags (${items.length})`}</Text>
      {items.map((r) => (
        <Link key={r.id} href={`/assets/${r.item.id}`}>
          <Text variant="small">{`${r.item.plantId} ${r.item.name} · ${r.by.name} · ${formatInZone(r.takenAt, zone, now)} — ${r.flags.map((f) => f.message).join('; ')}`}</Text>
        </Link>
      ))}
    </View>
  );
}

/** What others changed on a site or in a plant room since this person last left it. */
export function SinceLastVisitCard({ data, now }: { data: SinceLastVisit; now: Date }) {
  if (!data.since) return null;
  const zone = data.timeZone;
  const total = data.raised.length + data.cleared.length + data.notes.length + data.flaggedReadings.length;
  return (
    <Card>
      <View testID="since-last-visit" style={{ gap: space.sm }}>
        <Text variant="title">Since you were last here</Text>
        <Text muted variant="small">{`You left ${agoPhrase(data.since, now)}, ${formatInZone(data.since, zone, now)}.`}</Text>
        {total ? null : <Text>No tags raised or cleared, no notes and no flagged readings since then.</Text>}
        <TagLines title="Tags raised" items={data.raised} zone={zone} now={now} />
        <TagLines title="Tags cleared" items={data.cleared} zone={zone} now={now} />
        <TagLines title="Notes and hand-overs" items={data.notes} zone={zone} now={now} />
        <ReadingLines items={data.flaggedReadings} zone={zone} now={now} />
      </View>
    </Card>
  );
}
