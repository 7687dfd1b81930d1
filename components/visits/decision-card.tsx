import { View } from 'react-native';
import { space } from '@/components/theme';
import { Card } from '@/components/ui/card';
import { Chip } from '@/components/ui/chip';
import { Notice } from '@/components/ui/notice';
import { Text } from '@/components/ui/text';
import { SelectField } from '@/components/ui/select-field';
import { TextField } from '@/components/ui/text-field';
import { multilineStyle } from '@/components/forms/bound-fields';
import { KIND_LOOK } from '@/components/tags/tag-vocabulary';
import { expiryPhrase, formatInZone } from '@/components/tags/tag-time';
import { useTagColleaguesQuery } from '@/hooks/api/use-tags';
import { RELEASE_CHECKS, RELEASE_CHECK_LABELS, type ReleaseCheck } from '@/shared/rules/tags';
import { VISIT_DECISION_ACTIONS, VISIT_DECISION_LABELS, type VisitDecisionAction } from '@/shared/rules/visits';
import type { Tag } from '@/shared/types/tags';

export interface DecisionDraft {
  action: VisitDecisionAction | null;
  note: string;
  checks: Partial<Record<ReleaseCheck, boolean>>;
  /** The colleague offered the tag in hand-over. */
  toUserId?: number | null;
}

const ICONS = { leave: 'tag-outline', handover: 'account-switch', clear: 'lock-open-check-outline' } as const;

function noteLabel(tag: Tag, action: VisitDecisionAction | null) {
  if (action === 'clear') return 'Why it can be cleared';
  if (action === 'handover') return 'Note for whoever takes it on';
  return tag.kind === 'override' ? 'Note for whoever comes next (needed for an override)' : 'Note for whoever comes next';
}

/** One live tag the engineer holds: leave it, offer it in hand-over, or clear it — with the words that go with it. */
export function DecisionCard({ tag, draft, error, now, onChange }: { tag: Tag; draft: DecisionDraft; error?: string; now: Date; onChange: (d: DecisionDraft) => void }) {
  const kind = KIND_LOOK[tag.kind];
  const colleagues = useTagColleaguesQuery(draft.action === 'handover');
  const options = (colleagues.data ?? []).filter((c) => c.id !== tag.holder.id).map((c) => ({ value: c.id, label: c.name }));
  return (
    <Card>
      <View testID={`decision-${tag.id}`} style={{ gap: space.sm }}>
        <Text bold>{`${kind.word} on ${tag.asset.plantId} · ${tag.asset.name}`}</Text>
        <Text>{tag.reason}</Text>
        <Text variant="small" muted>{`Expiry ${formatInZone(tag.expiresAt, tag.asset.timeZone, now)} · ${expiryPhrase(tag.expiresAt, now)}`}</Text>
        <View style={{ flexDirection: 'row', flexWrap: 'wrap', gap: space.sm }} accessibilityRole="radiogroup">
          {VISIT_DECISION_ACTIONS.map((a) => (
            <Chip key={a} label={VISIT_DECISION_LABELS[a]} icon={ICONS[a]} selected={draft.action === a} onPress={() => onChange({ ...draft, action: a })} testID={`decision-${tag.id}-${a}`} />
          ))}
        </View>
        <TextField label={noteLabel(tag, draft.action)} value={draft.note} onChangeText={(note) => onChange({ ...draft, note })} multiline numberOfLines={3} style={multilineStyle} testID={`decision-${tag.id}-note`} error={error} />
        {draft.action === 'clear' && tag.kind === 'isolation' ? (
          <View style={{ gap: space.sm }}>
            <Text bold>Release checks</Text>
            {RELEASE_CHECKS.map((k) => (
              <Chip key={k} label={RELEASE_CHECK_LABELS[k]} selected={!!draft.checks[k]} onPress={() => onChange({ ...draft, checks: { ...draft.checks, [k]: !draft.checks[k] } })} testID={`decision-${tag.id}-check-${k}`} />
            ))}
          </View>
        ) : null}
        {draft.action === 'handover' ? (
          <View style={{ gap: space.sm }}>
            <SelectField<number> label="Colleague taking over" value={draft.toUserId ?? null} options={options} onChange={(v) => onChange({ ...draft, toUserId: v })} placeholder="Choose a colleague…" testID={`decision-${tag.id}-to`} />
            <Notice tone="info" word="Hand-over">You stay the holder until your colleague accepts the tag on site with their own lock on. Tell them in person as well.</Notice>
          </View>
        ) : null}
      </View>
    </Card>
  );
}
