import { useLocalSearchParams, useRouter } from 'expo-router';
import { Notice } from '@/components/ui/notice';
import { QueryScreen } from '@/components/ui/query-screen';
import { Screen } from '@/components/ui/screen';
import { SiteForm } from '@/components/register/site-form';
import { useSiteQuery, useUpdateSiteMutation } from '@/hooks/api/use-sites';
import { usePermissions } from '@/hooks/auth/use-permissions';

export default function EditSiteScreen() {
  const id = Number(useLocalSearchParams<{ id: string }>().id);
  const router = useRouter();
  const perms = usePermissions();
  const site = useSiteQuery(id);
  const update = useUpdateSiteMutation(id);
  return (
    <QueryScreen query={site} title="Edit site">
      {(s) => (
        <Screen title="Edit site" subtitle={s.name}>
          {perms.canCreateSite ? (
            <SiteForm
              site={s}
              submitLabel="Save site"
              onSubmit={async (input) => {
                await update.mutateAsync(input);
                router.replace(`/sites/${id}`);
              }}
              onCancel={() => router.back()}
            />
          ) : (
            <Notice tone="info" word="Not allowed">Only supervisors and administrators edit sites.</Notice>
          )}
        </Screen>
      )}
    </QueryScreen>
  );
}
