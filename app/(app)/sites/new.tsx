import { useRouter } from 'expo-router';
import { Notice } from '@/components/ui/notice';
import { Screen } from '@/components/ui/screen';
import { SiteForm } from '@/components/register/site-form';
import { useCreateSiteMutation } from '@/hooks/api/use-sites';
import { usePermissions } from '@/hooks/auth/use-permissions';

export default function NewSiteScreen() {
  const router = useRouter();
  const perms = usePermissions();
  const create = useCreateSiteMutation();
  return (
    <Screen title="New site">
      {perms.canCreateSite ? (
        <SiteForm
          submitLabel="Create site"
          onSubmit={async (input) => {
            const site = await create.mutateAsync(input);
            router.replace(`/sites/${site.id}`);
          }}
          onCancel={() => router.back()}
        />
      ) : (
        <Notice tone="info" word="Not allowed">Only supervisors and administrators create sites.</Notice>
      )}
    </Screen>
  );
}
