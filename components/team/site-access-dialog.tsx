import { useEffect, useState } from 'react';
import { View } from 'react-native';
import { space } from '@/components/theme';
import { Button } from '@/components/ui/button';
import { Chip } from '@/components/ui/chip';
import { Dialog } from '@/components/ui/dialog';
import { Notice } from '@/components/ui/notice';
import { Text } from '@/components/ui/text';
import { errorMessage } from '@/hooks/api/request';
import { useSitesQuery } from '@/hooks/api/use-sites';
import { useSiteAccessMutation } from '@/hooks/api/use-team';
import type { TeamMember } from '@/shared/types/team';

/** Chooses the sites a viewer may see; the list replaces the previous one. */
export function SiteAccessDialog({ member, visible, onClose }: { member: TeamMember; visible: boolean; onClose: () => void }) {
  const sites = useSitesQuery();
  const save = useSiteAccessMutation();
  const [chosen, setChosen] = useState<number[]>(member.siteIds);
  useEffect(() => { if (visible) { setChosen(member.siteIds); save.reset(); } }, [visible, member.siteIds]); // eslint-disable-line react-hooks/exhaustive-deps
  const toggle = (id: number) => setChosen((c) => (c.includes(id) ? c.filter((x) => x !== id) : [...c, id]));
  const submit = async () => {
    try {
      await save.mutateAsync({ id: member.id, siteIds: chosen });
      onClose();
    } catch { /* shown below */ }
  };
  return (
    <Dialog visible={visible} title={`Sites ${member.name} can see`} onClose={onClose} testID="site-access-dialog">
      <Text muted>A viewer sees the register, tags and board of these sites only, read only.</Text>
      {sites.isError ? <Notice tone="danger" word="Cannot load">{errorMessage(sites.error)}</Notice> : null}
      <View style={{ flexDirection: 'row', flexWrap: 'wrap', gap: space.sm }} role="group" aria-label="Sites">
        {(sites.data?.items ?? []).map((s) => (
          <Chip key={s.id} label={s.name} selected={chosen.includes(s.id)} onPress={() => toggle(s.id)} testID={`site-access-${s.id}`} />
        ))}
      </View>
      <Text variant="small" muted>{chosen.length ? `${chosen.length} chosen` : 'No sites chosen: they will see nothing.'}</Text>
      {save.isError ? <Notice tone="danger" word="Not saved">{errorMessage(save.error)}</Notice> : null}
      <View style={{ flexDirection: 'row', flexWrap: 'wrap', gap: space.sm, justifyContent: 'flex-end' }}>
        <Button title="Cancel" variant="secondary" onPress={onClose} />
        <Button title="Save site access" busy={save.isPending} onPress={() => void submit()} testID="site-access-save" />
      </View>
    </Dialog>
  );
}
