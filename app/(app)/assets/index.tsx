import { useLocalSearchParams, useRouter } from 'expo-router';
import { useState } from 'react';
import { View } from 'react-native';
import { space } from '@/components/theme';
import { useBreakpoints } from '@/components/theme/use-breakpoints';
import { Button } from '@/components/ui/button';
import type { SortState } from '@/components/ui/data-table';
import { LoadingView } from '@/components/ui/loading-view';
import { Notice } from '@/components/ui/notice';
import { Screen } from '@/components/ui/screen';
import { Text } from '@/components/ui/text';
import { AssetList } from '@/components/register/asset-list';
import { AssetTable } from '@/components/register/asset-table';
import { RegisterFilters, type RegisterFilterState } from '@/components/register/register-filters';
import { SiteList } from '@/components/register/site-list';
import { errorMessage } from '@/hooks/api/request';
import { useAssetsQuery } from '@/hooks/api/use-assets';
import { useSitesQuery } from '@/hooks/api/use-sites';
import { usePermissions } from '@/hooks/auth/use-permissions';
import { useDebouncedValue } from '@/hooks/use-debounced-value';

const PHONE_PAGE = 20;
const TABLE_PAGE = 25;

export default function RegisterScreen() {
  const params = useLocalSearchParams<{ siteId?: string }>();
  const router = useRouter();
  const { isWide } = useBreakpoints();
  const perms = usePermissions();
  const [filters, setFilters] = useState<RegisterFilterState>({ q: '', siteId: Number(params.siteId) || null, type: null, includeArchived: false });
  const [sort, setSort] = useState<SortState>({ key: 'plantId', dir: 'asc' });
  const [page, setPage] = useState(1);
  const [phoneCount, setPhoneCount] = useState(PHONE_PAGE);
  const [editing, setEditing] = useState(false);
  const q = useDebouncedValue(filters.q.trim(), 250);

  const searching = !!q || !!filters.siteId || !!filters.type;
  const sites = useSitesQuery();
  const assets = useAssetsQuery(
    {
      q,
      siteId: filters.siteId,
      type: filters.type,
      includeArchived: filters.includeArchived,
      sort: `${sort.dir === 'desc' ? '-' : ''}${sort.key}`,
      page: isWide ? page : 1,
      pageSize: isWide ? TABLE_PAGE : phoneCount,
    },
    isWide || searching,
  );

  const changeFilters = (next: RegisterFilterState) => {
    setFilters(next);
    setPage(1);
    setPhoneCount(PHONE_PAGE);
  };

  const actions = (
    <>
      {perms.canAdd ? <Button title="Add item" onPress={() => router.push({ pathname: '/assets/new', params: filters.siteId ? { siteId: filters.siteId } : {} })} testID="register-add-item" /> : null}
      {perms.canCreateSite ? <Button title="New site" variant="secondary" onPress={() => router.push('/sites/new')} testID="register-new-site" /> : null}
      {perms.canImport && isWide ? <Button title="Import / export" variant="secondary" onPress={() => router.push('/assets/import')} testID="register-import" /> : null}
    </>
  );

  return (
    <Screen title="Plant register" subtitle="Sites, plant rooms and plant items" actions={actions}>
      <RegisterFilters value={filters} onChange={changeFilters} showArchivedToggle={perms.canArchive} />
      {assets.isError ? <Notice tone="danger" word="Cannot load">{errorMessage(assets.error)}</Notice> : null}
      {isWide ? (
        <View style={{ gap: space.md }}>
          <View style={{ flexDirection: 'row', alignItems: 'center', gap: space.md, flexWrap: 'wrap' }}>
            <Text variant="title" style={{ flex: 1 }}>Plant items</Text>
            {perms.canAdd ? (
              <Button title={editing ? 'Done editing' : 'Edit in table'} variant={editing ? 'primary' : 'secondary'} onPress={() => setEditing((e) => !e)} testID="table-edit-toggle" />
            ) : null}
          </View>
          {editing ? <Text muted>Change the fields in a row, then press that row’s Save. Rows you cannot edit stay read only.</Text> : null}
          {assets.data ? (
            <AssetTable
              rows={assets.data.items}
              sort={sort}
              onSort={(s) => { setSort(s); setPage(1); }}
              paging={{ page: assets.data.page, pageSize: assets.data.pageSize, total: assets.data.total, onPage: setPage }}
              busy={assets.isFetching}
              editing={editing}
            />
          ) : assets.isPending ? <LoadingView /> : null}
          <Text variant="title">Sites</Text>
          {sites.data ? <SiteList sites={sites.data.items} /> : null}
        </View>
      ) : searching ? (
        assets.data ? (
          <AssetList items={assets.data.items} total={assets.data.total} busy={assets.isFetching} onMore={() => setPhoneCount((n) => n + PHONE_PAGE)} />
        ) : <LoadingView />
      ) : (
        <View style={{ gap: space.sm }}>
          <Text variant="title">Sites</Text>
          {sites.isError ? <Notice tone="danger" word="Cannot load">{errorMessage(sites.error)}</Notice> : null}
          {sites.data ? <SiteList sites={sites.data.items} /> : <LoadingView />}
        </View>
      )}
    </Screen>
  );
}
