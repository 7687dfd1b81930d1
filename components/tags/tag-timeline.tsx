import { MaterialCommunityIcons } from '@/components/ui/icons';
import { StyleSheet, View } from 'react-native';
import { colors, space } from '@/components/theme';
import { Text } from '@/components/ui/text';
import { formatInZone } from '@/components/tags/tag-time';
import { EVENT_ICONS } from '@/components/tags/tag-vocabulary';
import { RELEASE_CHECKS, RELEASE_CHECK_LABELS, TAG_EVENT_LABELS } from '@/shared/rules/tags';
import { PROOF_METHOD_LABELS, type ProofMethod } from '@/shared/rules/tag-isolation';
import type { TagEvent } from '@/shared/types/tags';

const str = (v: unknown) => (typeof v === 'string' ? v : '');
const nameOf = (v: unknown) => (v && typeof v === 'object' && 'name' in v ? str((v as { name: unknown }).name) : '');

function checksLine(v: unknown): string | null {
  if (!v || typeof v !== 'object') return null;
  const checks = v as Record<string, unknown>;
  const done = RELEASE_CHECKS.filter((k) => checks[k] === true);
  if (done.length === RELEASE_CHECKS.length) return 'All release checks confirmed.';
  if (!done.length) return null;
  return `Release checks confirmed: ${done.map((k) => RELEASE_CHECK_LABELS[k].toLowerCase()).join('; ')}.`;
}

/** What happened, in sentences, from the event's recorded details. */
function describe(e: TagEvent, timeZone: string, now: Date): string[] {
  const d = e.data ?? {};
  const at = (v: unknown) => (str(v) ? formatInZone(str(v), timeZone, now) : '—');
  switch (e.type) {
    case 'raised':
      return [str(d.reason), `Expiry ${at(d.expiresAt)}.`].filter(Boolean);
    case 'extended':
      return [`Expiry moved from ${at(d.from)} to ${at(d.to)}.`, str(d.reason) && `Reason: ${str(d.reason)}`].filter(Boolean);
    case 'proved':
      return [
        PROOF_METHOD_LABELS[str(d.method) as ProofMethod] ?? str(d.method),
        str(d.instrument) && `Instrument or gauge: ${str(d.instrument)}`,
        str(d.reading) && `Reading: ${str(d.reading)}`,
        str(d.note),
      ].filter(Boolean);
    case 'handover-offered':
      return [`Offered to ${nameOf(d.to)}; lapses ${at(d.lapsesAt)} unless accepted.`, str(d.note) && `Note: ${str(d.note)}`].filter(Boolean);
    case 'handover-withdrawn':
      return [nameOf(d.to) ? `The offer to ${nameOf(d.to)} was withdrawn.` : 'The offer was withdrawn.'];
    case 'handed-over':
      return [
        `${nameOf(d.from) || 'The holder'} handed over to ${nameOf(d.to) || e.by.name}, who accepted.`,
        str(d.lockNumber) && `New lock ${str(d.lockNumber)} on${str(d.fromLockNumber) ? `; ${str(d.fromLockNumber)} to come off` : ''}.`,
        str(d.note) && `Note: ${str(d.note)}`,
      ].filter(Boolean);
    case 'reassigned-in-absence':
      return [
        `Moved from ${nameOf(d.from)} to ${nameOf(d.to)}.`,
        d.holderNotOnSite === true ? 'The holder was confirmed not on site.' : '',
        str(d.contactAttempts) && `Attempts to reach them: ${str(d.contactAttempts)}`,
        str(d.reason) && `Reason: ${str(d.reason)}`,
        str(d.lockNumber) && `New lock ${str(d.lockNumber)}.`,
        'The holder is told and must acknowledge before they resume work.',
      ].filter(Boolean);
    case 'acknowledged':
      return ['The holder read what happened in their absence and acknowledged it.'];
    case 'note-added':
      return [str(d.text)];
    case 'cleared':
      return [str(d.reason) && `Reason: ${str(d.reason)}`, checksLine(d.checks) ?? ''].filter(Boolean);
    case 'cleared-in-absence':
      return [
        (d.holderNotOnSite ?? d.authorNotOnSite) === true ? 'The holder was confirmed not on site.' : '',
        str(d.contactAttempts) && `Attempts to reach them: ${str(d.contactAttempts)}`,
        str(d.reason) && `Reason: ${str(d.reason)}`,
        checksLine(d.checks) ?? '',
        d.holderToBeInformed === true ? 'The holder is to be told before they resume work.' : '',
      ].filter(Boolean);
    default:
      return [];
  }
}

/** A tag's history, oldest first: each event with who, when and what. The record is append-only. */
export function TagTimeline({ events, timeZone, now }: { events: TagEvent[]; timeZone: string; now: Date }) {
  return (
    <View testID="tag-timeline" role="list">
      {events.map((e, i) => (
        <View key={e.id} style={styles.entry} role="listitem" testID={`timeline-${e.type}`}>
          <View style={styles.rail}>
            <View style={[styles.dot, (e.type === 'cleared' || e.type === 'cleared-in-absence') && styles.dotEnd]}>
              <MaterialCommunityIcons name={EVENT_ICONS[e.type]} size={18} color={colors.ink} />
            </View>
            {i < events.length - 1 ? <View style={styles.line} /> : null}
          </View>
          <View style={styles.body}>
            <Text bold>{TAG_EVENT_LABELS[e.type]}</Text>
            <Text variant="small" muted>{`${e.by.name} · ${formatInZone(e.at, timeZone, now)}`}</Text>
            {describe(e, timeZone, now).map((line, j) => <Text key={j}>{line}</Text>)}
          </View>
        </View>
      ))}
    </View>
  );
}

const styles = StyleSheet.create({
  entry: { flexDirection: 'row', gap: space.md },
  rail: { width: 32, alignItems: 'center' },
  dot: { width: 32, height: 32, borderRadius: 16, borderWidth: 2, borderColor: colors.ink, backgroundColor: colors.surface, alignItems: 'center', justifyContent: 'center' },
  dotEnd: { backgroundColor: colors.surfaceSunk },
  line: { flex: 1, width: 2, backgroundColor: colors.line, marginVertical: 2 },
  body: { flex: 1, gap: 2, paddingBottom: space.lg },
});
