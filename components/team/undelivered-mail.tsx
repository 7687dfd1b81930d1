import { MaterialCommunityIcons } from '@/components/ui/icons';
import { StyleSheet, View } from 'react-native';
import { colors, radius, space } from '@/components/theme';
import { Notice } from '@/components/ui/notice';
import { Text } from '@/components/ui/text';
import { MAIL_KIND_LABELS } from '@/components/team/team-vocabulary';
import { useUndeliveredMailQuery } from '@/hooks/api/use-team';

const when = (iso: string) =>
  new Intl.DateTimeFormat('en-GB', { day: 'numeric', month: 'short', year: 'numeric', hour: '2-digit', minute: '2-digit', hourCycle: 'h23' }).format(new Date(iso));

/**
 * E-mails the mail server refused for good, so an admin can act (a mistyped address, a mailbox that is gone).
 * Shows nothing while there are none.
 */
export function UndeliveredMail({ enabled }: { enabled: boolean }) {
  const mail = useUndeliveredMailQuery(enabled);
  const data = mail.data;
  if (!data?.total) return null;
  return (
    <View testID="undelivered-mail" style={{ gap: space.sm }}>
      <Notice tone="caution" word="Not delivered" title={`${data.total} e-mail${data.total === 1 ? '' : 's'}`}>
        The mail server refused these for good. Check each address on the person’s card; send an invitation again once it is right. A tag e-mail that did not arrive is still on the tag and the board.
      </Notice>
      {data.items.map((m) => (
        <View key={m.id} style={styles.row}>
          <MaterialCommunityIcons name="email-alert-outline" size={22} color={colors.ink} />
          <View style={{ flex: 1, gap: 2 }}>
            <Text variant="small" bold>{`${MAIL_KIND_LABELS[m.kind] ?? m.kind} to ${m.toEmail}`}</Text>
            <Text variant="small">{m.lastError ? `Mail server said: ${m.lastError}` : 'Refused by the mail server.'}</Text>
            <Text variant="small" muted>{`Written ${when(m.createdAt)} · given up ${when(m.givenUpAt)} after ${m.attempts} attempts`}</Text>
          </View>
        </View>
      ))}
    </View>
  );
}

const styles = StyleSheet.create({
  row: { flexDirection: 'row', gap: space.sm, padding: space.sm, borderRadius: radius.md, borderWidth: 1, borderColor: colors.line, backgroundColor: colors.surface },
});
