import { View } from 'react-native';
import { space } from '@/components/theme';
import { Card } from '@/components/ui/card';
import { Text } from '@/components/ui/text';
import { formatInZone } from '@/components/tags/tag-time';
import { TAG_EVENT_LABELS } from '@/shared/rules/tags';
import { VISIT_DECISION_LABELS } from '@/shared/rules/visits';
import type { Visit } from '@/shared/types/visits';

const kindWord = (kind: string) => (kind === 'override' ? 'Override' : 'Isolation');

/** What a visit recorded: the end-of-visit decisions first, then tag actions, readings and photos. */
export function VisitActivityList({ visit, now }: { visit: Visit; now: Date }) {
  const zone = visit.site.timeZone;
  const at = (iso: string) => formatInZone(iso, zone, now);
  const a = visit.activity;
  const decisions = visit.decisions ?? [];
  return (
    <>
      {visit.endedAt ? (
        <Card>
          <Text variant="title">{`Live tags on leaving (${decisions.length})`}</Text>
          {decisions.length ? null : <Text>No live tags were held on this site when the visit ended.</Text>}
          {decisions.map((d) => (
            <View key={d.tagId} style={{ gap: 2 }} testID={`visit-decision-${d.tagId}`}>
              <Text bold>{`${kindWord(d.kind)} on ${d.item.plantId} ${d.item.name} — ${VISIT_DECISION_LABELS[d.action]}`}</Text>
              <Text variant="small">{`Reason: ${d.reason}`}</Text>
              {d.note ? <Text variant="small">{`Note: ${d.note}`}</Text> : null}
            </View>
          ))}
        </Card>
      ) : null}
      <Card>
        <Text variant="title">{`Tag actions (${a?.tagEvents.length ?? 0})`}</Text>
        {(a?.tagEvents ?? []).map((e, i) => (
          <Text key={`${e.tagId}-${i}`} variant="small">{`${at(e.at)} · ${TAG_EVENT_LABELS[e.type]} · ${kindWord(e.kind)} on ${e.item.plantId} ${e.item.name} — ${e.text ?? e.reason}`}</Text>
        ))}
      </Card>
      <Card>
        <Text variant="title">{`Readings (${a?.readings.length ?? 0})`}</Text>
        {(a?.readings ?? []).map((r) => (
          <Text key={r.id} variant="small">{`${at(r.takenAt)} · ${r.item.plantId} ${r.item.name} — ${r.flags.length ? r.flags.map((f) => f.message).join('; ') : 'no flags'}`}</Text>
        ))}
        <Text variant="title" style={{ marginTop: space.sm }}>{`Photos (${a?.photos.length ?? 0})`}</Text>
        {(a?.photos ?? []).map((p) => <Text key={p.id} variant="small">{`${at(p.at)} · ${p.subject}${p.caption ? ` — ${p.caption}` : ''}`}</Text>)}
      </Card>
    </>
  );
}
