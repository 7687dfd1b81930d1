import { MaterialCommunityIcons } from '@/components/ui/icons';
import { useState } from 'react';
import { StyleSheet, View } from 'react-native';
import { colors, radius, space } from '@/components/theme';
import { Badge } from '@/components/ui/badge';
import { Button } from '@/components/ui/button';
import { ConfirmDialog } from '@/components/ui/confirm-dialog';
import { SelectField } from '@/components/ui/select-field';
import { Text } from '@/components/ui/text';
import { SiteAccessDialog } from '@/components/team/site-access-dialog';
import { ROLE_OPTIONS, memberStatus } from '@/components/team/team-vocabulary';
import { errorMessage } from '@/hooks/api/request';
import { useChangeUserMutation, useResendInviteMutation } from '@/hooks/api/use-team';
import { may } from '@/shared/rules/permissions';
import { ROLE_LABELS, type Role } from '@/shared/rules/roles';
import type { ChangeUserInput } from '@/shared/schemas/team';
import type { TeamMember } from '@/shared/types/team';

type Pending = { input: ChangeUserInput; title: string; message: string; confirm: string; danger?: boolean } | null;

/** One person: who they are, their standing, and the admin's actions on them. */
export function MemberCard({ member, isSelf, siteNames }: { member: TeamMember; isSelf: boolean; siteNames: Map<number, string> }) {
  const change = useChangeUserMutation();
  const resend = useResendInviteMutation();
  const [pending, setPending] = useState<Pending>(null);
  const [sitesOpen, setSitesOpen] = useState(false);
  const status = memberStatus(member);

  const askRole = (role: Role | null) => {
    if (!role || role === member.role) return;
    change.reset();
    setPending({ input: { role }, title: 'Change role', message: `Change ${member.name} from ${ROLE_LABELS[member.role]} to ${ROLE_LABELS[role]}?`, confirm: 'Change role' });
  };
  const askActive = () => {
    change.reset();
    setPending(member.active
      ? { input: { active: false }, title: 'Deactivate', message: `${member.name} will be signed out everywhere at once and cannot sign in until reactivated. Their tags and records stay.`, confirm: 'Deactivate', danger: true }
      : { input: { active: true }, title: 'Reactivate', message: `${member.name} will be able to sign in again with their password.`, confirm: 'Reactivate' });
  };
  const confirm = async () => {
    if (!pending) return;
    try {
      await change.mutateAsync({ id: member.id, input: pending.input });
      setPending(null);
    } catch { /* shown in the dialog */ }
  };
  // Only those without every site have a list of sites to show and change.
  const limited = !may(member, 'seeEverySite');
  const sites = member.siteIds.map((id) => siteNames.get(id) ?? `Site ${id}`);

  return (
    <View style={[styles.card, !member.active && styles.inactive]} testID={`member-${member.id}`}>
      <View style={styles.head}>
        <MaterialCommunityIcons name="account-circle-outline" size={28} color={colors.ink} />
        <View style={{ flex: 1, minWidth: 160 }}>
          <Text bold>{isSelf ? `${member.name} (you)` : member.name}</Text>
          <Text variant="small" muted>{member.email}</Text>
          {member.phone ? <Text variant="small" muted>{member.phone}</Text> : null}
        </View>
        <Badge tone={status.tone} icon={status.icon} label={status.word} testID={`member-status-${member.id}`} />
      </View>
      {limited ? (
        <Text variant="small" testID={`member-sites-${member.id}`}>{sites.length ? `Sites: ${sites.join(', ')}` : 'Sites: none yet — they see nothing until given a site.'}</Text>
      ) : null}
      <View style={styles.actions}>
        <View style={{ flexGrow: 1, flexBasis: 200 }}>
          <SelectField label={`Role of ${member.name}`} hideLabel value={member.role} options={ROLE_OPTIONS} onChange={askRole} disabled={isSelf || !member.active} testID={`member-role-${member.id}`} />
        </View>
        {limited ? <Button title="Site access" variant="secondary" onPress={() => setSitesOpen(true)} testID={`member-sites-edit-${member.id}`} /> : null}
        {member.invitePending && member.active ? (
          <Button title={resend.isSuccess ? 'Invitation resent' : 'Send new invitation'} variant="secondary" busy={resend.isPending} onPress={() => resend.mutate(member.id)} testID={`member-resend-${member.id}`} />
        ) : null}
        {!isSelf ? <Button title={member.active ? 'Deactivate' : 'Reactivate'} variant={member.active ? 'quiet' : 'secondary'} onPress={askActive} testID={`member-active-${member.id}`} /> : null}
      </View>
      {resend.isError ? <Text variant="small" style={{ color: colors.danger }}>⚠ {errorMessage(resend.error)}</Text> : null}
      <ConfirmDialog
        visible={!!pending}
        title={pending?.title ?? ''}
        message={pending?.message ?? ''}
        confirmLabel={pending?.confirm ?? ''}
        danger={pending?.danger}
        busy={change.isPending}
        error={change.isError ? errorMessage(change.error) : null}
        onConfirm={() => void confirm()}
        onCancel={() => setPending(null)}
      />
      {limited ? <SiteAccessDialog member={member} visible={sitesOpen} onClose={() => setSitesOpen(false)} /> : null}
    </View>
  );
}

const styles = StyleSheet.create({
  card: { backgroundColor: colors.surface, borderRadius: radius.md, borderWidth: 1, borderColor: colors.line, padding: space.md, gap: space.sm },
  inactive: { backgroundColor: colors.surfaceSunk },
  head: { flexDirection: 'row', flexWrap: 'wrap', alignItems: 'center', gap: space.sm },
  actions: { flexDirection: 'row', flexWrap: 'wrap', alignItems: 'center', gap: space.sm },
});
