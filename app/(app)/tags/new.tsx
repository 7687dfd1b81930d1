import { useLocalSearchParams, useRouter } from 'expo-router';
import { Button } from '@/components/ui/button';
import { LoadingView } from '@/components/ui/loading-view';
import { Notice } from '@/components/ui/notice';
import { QueryScreen } from '@/components/ui/query-screen';
import { Screen } from '@/components/ui/screen';
import { RaiseTagForm } from '@/components/tags/raise-tag-form';
import { TagNoticesBanner } from '@/components/tags/tag-notices-banner';
import { errorMessage } from '@/hooks/api/request';
import { useAssetQuery } from '@/hooks/api/use-assets';
import { useMeQuery } from '@/hooks/api/use-auth';
import { useIsolationPlanQuery } from '@/hooks/api/use-connections';
import { useSiteQuery } from '@/hooks/api/use-sites';
import { ENERGY_SOURCES, type EnergySource } from '@/shared/rules/register';
import type { TagKind } from '@/shared/rules/tags';
import { usePermissions } from '@/hooks/auth/use-permissions';

export default function RaiseTagScreen() {
  const params = useLocalSearchParams<{ assetId?: string; kind?: string; planSources?: string }>();
  const router = useRouter();
  const assetId = Number(params.assetId) || 0;
  const kind: TagKind = params.kind === 'override' ? 'override' : 'isolation';
  const asset = useAssetQuery(assetId);
  const site = useSiteQuery(asset.data?.siteId ?? 0);
  const me = useMeQuery().data;
  const { may } = usePermissions();
  // Opened from an isolation plan: the same plan again, to fill the form's sources and points.
  const planSources = (params.planSources ?? '').split(',').filter((s): s is EnergySource => (ENERGY_SOURCES as readonly string[]).includes(s));
  const plan = useIsolationPlanQuery(assetId, planSources, kind === 'isolation' && planSources.length > 0);

  if (!assetId) {
    return (
      <Screen title="Raise a tag">
        <Notice tone="info" word="Choose an item">Tags are raised from a plant item’s record. Find the item by its label or in the register.</Notice>
        <Button title="Open the register" onPress={() => router.replace('/assets')} />
      </Screen>
    );
  }
  return (
    <QueryScreen query={asset} title="Raise a tag">
      {(item) => {
        const title = 'Raise a tag';
        const subtitle = `${item.plantId} · ${item.name} · ${item.siteName}`;
        if (!me || !may('raiseTag')) {
          return <Screen title={title} subtitle={subtitle}><Notice tone="info" word="Read only">Viewers cannot raise tags.</Notice></Screen>;
        }
        if (item.archived) {
          return <Screen title={title} subtitle={subtitle}><Notice tone="info" word="Archived">This item is archived, so no tags can be raised on it.</Notice></Screen>;
        }
        // A site kept from an earlier visit serves with no signal, as the item does; only with none is it an error.
        if (site.isError && !site.data) {
          return <Screen title={title} subtitle={subtitle}><Notice tone="danger" word="Cannot load the site">{errorMessage(site.error)}</Notice></Screen>;
        }
        if (!site.data || (plan.isFetching && !plan.data)) return <LoadingView />;
        return (
          <Screen title={title} subtitle={subtitle}>
            <TagNoticesBanner />
            {plan.isError ? <Notice tone="info" word="No plan">{`The isolation plan could not be loaded (${errorMessage(plan.error)}). Enter the points yourself.`}</Notice> : null}
            {plan.data ? <Notice tone="caution" word="From the isolation plan">The sources and points below come from the register. Check each point on site; change or remove any that is wrong, and add what the plan could not see.</Notice> : null}
            <RaiseTagForm asset={item} site={site.data} me={me} initialKind={kind} plan={plan.data} onRaised={(tag) => router.replace(`/tags/${tag.id}`)} onCancel={() => (router.canGoBack() ? router.back() : router.replace(`/assets/${item.id}`))} />
          </Screen>
        );
      }}
    </QueryScreen>
  );
}
