import { useMemo } from 'react';
import { View } from 'react-native';
import { space } from '@/components/theme';
import { useBreakpoints } from '@/components/theme/use-breakpoints';
import { LoadingView } from '@/components/ui/loading-view';
import { Notice } from '@/components/ui/notice';
import { Screen } from '@/components/ui/screen';
import { Text } from '@/components/ui/text';
import { AuditLog } from '@/components/team/audit-log';
import { InviteForm } from '@/components/team/invite-form';
import { MemberCard } from '@/components/team/member-card';
import { UndeliveredMail } from '@/components/team/undelivered-mail';
import { errorMessage } from '@/hooks/api/request';
import { useSitesQuery } from '@/hooks/api/use-sites';
import { useTeamQuery } from '@/hooks/api/use-team';
import { usePermissions } from '@/hooks/auth/use-permissions';

export default function TeamScreen() {
  const { actor: me, may } = usePermissions();
  const isAdmin = may('administerTeam');
  const { isWide } = useBreakpoints();
  const team = useTeamQuery(isAdmin);
  const sites = useSitesQuery();
  const siteNames = useMemo(() => new Map((sites.data?.items ?? []).map((s) => [s.id, s.name])), [sites.data]);
  const names = useMemo(() => new Map((team.data?.items ?? []).map((u) => [u.id, u.name])), [team.data]);

  if (me && !isAdmin) {
    return (
      <Screen title="Team">
        <Notice tone="info" word="Admins only">Only an administrator can invite people and change roles.</Notice>
      </Screen>
    );
  }
  const members = team.data?.items ?? [];
  return (
    <Screen title="Team" subtitle="People, roles and site access · every change is logged">
      <InviteForm />
      <UndeliveredMail enabled={isAdmin} />
      <View style={{ flexDirection: isWide ? 'row' : 'column', gap: space.lg, alignItems: 'flex-start' }}>
        <View style={{ flex: isWide ? 3 : undefined, width: isWide ? undefined : '100%', gap: space.sm }}>
          <Text variant="title">{team.data ? `People (${team.data.total})` : 'People'}</Text>
          {team.isError ? <Notice tone="danger" word="Cannot load">{errorMessage(team.error)}</Notice> : null}
          {team.isPending ? <LoadingView /> : null}
          {members.map((m) => <MemberCard key={m.id} member={m} isSelf={m.id === me?.id} siteNames={siteNames} />)}
        </View>
        <View style={{ flex: isWide ? 2 : undefined, width: isWide ? undefined : '100%', gap: space.sm }}>
          <Text variant="title">Audit log</Text>
          <AuditLog nameOf={(id) => (id ? names.get(id) ?? null : null)} />
        </View>
      </View>
    </Screen>
  );
}
