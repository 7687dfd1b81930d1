import { MaterialCommunityIcons } from '@/components/ui/icons';
import { useState } from 'react';
import { ActivityIndicator, StyleSheet, View } from 'react-native';
import { colors, radius, space } from '@/components/theme';
import { Button } from '@/components/ui/button';
import { Notice } from '@/components/ui/notice';
import { Text } from '@/components/ui/text';
import { AUDIT_EVENT_LABELS } from '@/components/team/team-vocabulary';
import { errorMessage } from '@/hooks/api/request';
import { useAuditQuery } from '@/hooks/api/use-team';
import type { AuditEntry } from '@/shared/types/team';
import { ROLE_LABELS, type Role } from '@/shared/rules/roles';

const PAGE = 20;

const when = (iso: string) =>
  new Intl.DateTimeFormat('en-GB', { weekday: 'short', day: 'numeric', month: 'short', year: 'numeric', hour: '2-digit', minute: '2-digit', hourCycle: 'h23' }).format(new Date(iso));

const roleWord = (r: unknown) => (typeof r === 'string' && r in ROLE_LABELS ? ROLE_LABELS[r as Role] : String(r));

/** What happened, in a sentence, from the event's type and detail. */
function describe(e: AuditEntry, nameOf: (id: number | null) => string | null): string {
  const who = nameOf(e.userId) ?? (typeof e.detail?.email === 'string' ? e.detail.email : 'someone');
  const by = e.actorId && e.actorId !== e.userId ? ` by ${nameOf(e.actorId) ?? 'a former member'}` : '';
  const d = e.detail ?? {};
  switch (e.type) {
    case 'role-change': return `${who}: ${roleWord(d.from)} → ${roleWord(d.to)}${by}`;
    case 'user-invited': return `${who} invited as ${roleWord(d.role)}${d.resent ? ' (new link)' : ''}${by}`;
    case 'site-access-change': {
      const n = (k: string) => (Array.isArray(d[k]) ? (d[k] as unknown[]).length : 0);
      return `${who}: ${n('added')} site(s) added, ${n('removed')} removed${by}`;
    }
    case 'password-reset': return `${who}: ${d.stage === 'password-set' ? 'password chosen from a link' : 'reset link sent'}`;
    case 'sign-in-failed': return `Failed sign-in for ${who}`;
    default: return `${who}${by}`;
  }
}

/** Security events of the organisation, newest first, a page at a time. */
export function AuditLog({ nameOf }: { nameOf: (id: number | null) => string | null }) {
  const [page, setPage] = useState(1);
  const audit = useAuditQuery(page, PAGE);
  const data = audit.data;
  const pages = data ? Math.max(1, Math.ceil(data.total / data.pageSize)) : 1;
  return (
    <View style={{ gap: space.sm }} testID="audit-log">
      {audit.isError ? <Notice tone="danger" word="Cannot load">{errorMessage(audit.error)}</Notice> : null}
      {!data ? <ActivityIndicator color={colors.brand} accessibilityLabel="Loading" /> : null}
      {data?.items.map((e) => {
        const look = AUDIT_EVENT_LABELS[e.type] ?? { word: e.type, icon: 'information-outline' as const };
        return (
          <View key={e.id} style={styles.row}>
            <MaterialCommunityIcons name={look.icon} size={22} color={e.type === 'sign-in-failed' ? colors.danger : colors.ink} />
            <View style={{ flex: 1, gap: 2 }}>
              <Text variant="small" bold>{look.word}</Text>
              <Text variant="small">{describe(e, nameOf)}</Text>
              <Text variant="small" muted>{`${when(e.at)}${e.ip ? ` · from ${e.ip}` : ''}`}</Text>
            </View>
          </View>
        );
      })}
      {data && data.total === 0 ? <Text muted>Nothing recorded yet.</Text> : null}
      {data ? (
        <View style={styles.pager}>
          <Button title="Newer" variant="secondary" disabled={page <= 1} onPress={() => setPage((p) => p - 1)} testID="audit-newer" />
          <Text variant="small" bold style={{ flex: 1, textAlign: 'center' }}>{`Page ${page} of ${pages}`}</Text>
          <Button title="Older" variant="secondary" disabled={page >= pages} onPress={() => setPage((p) => p + 1)} testID="audit-older" />
        </View>
      ) : null}
    </View>
  );
}

const styles = StyleSheet.create({
  row: { flexDirection: 'row', gap: space.sm, padding: space.sm, borderRadius: radius.md, borderWidth: 1, borderColor: colors.line, backgroundColor: colors.surface },
  pager: { flexDirection: 'row', alignItems: 'center', gap: space.sm },
});
