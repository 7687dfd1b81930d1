import { MaterialCommunityIcons } from '@/components/ui/icons';
import { TagStateBadge } from '@/components/tags/tag-state-badge';
import { Link, useRouter } from 'expo-router';
import { View } from 'react-native';
import { colors, space } from '@/components/theme';
import { Badge } from '@/components/ui/badge';
import { Button } from '@/components/ui/button';
import { DataTable, type Column, type Paging, type SortState } from '@/components/ui/data-table';
import { EmptyState } from '@/components/ui/empty-state';
import { PhotoThumb } from '@/components/ui/photo-thumb';
import { Text } from '@/components/ui/text';
import { InlineInput } from '@/components/register/inline-input';
import { formatDate } from '@/components/register/register-vocabulary';
import { ServiceBadge } from '@/components/register/service-badge';
import { useInlineEdits, type InlineField } from '@/components/register/use-inline-edits';
import { usePermissions } from '@/hooks/auth/use-permissions';
import { ASSET_TYPE_LABELS } from '@/shared/rules/register';
import type { Asset } from '@/shared/types/register';

interface Props {
  rows: Asset[];
  sort: SortState;
  onSort: (s: SortState) => void;
  paging: Paging;
  busy: boolean;
  editing: boolean;
}

// Sortable columns are the orders the API offers (ASSET_SORTS in shared/schemas/queries.ts).
/** The register as a dense table on wide screens; in editing mode a few fields become inputs with a save per row. */
export function AssetTable({ rows, sort, onSort, paging, busy, editing }: Props) {
  const router = useRouter();
  const perms = usePermissions();
  const edits = useInlineEdits();

  const editable = (a: Asset) => editing && perms.canEditRecord(a.createdBy) && !a.archived;
  const cell = (f: InlineField, label: string, show: (a: Asset) => string, extra?: { numeric?: boolean; placeholder?: string }) => (a: Asset) =>
    editable(a) ? (
      <InlineInput
        label={`${label} of ${a.plantId}`}
        value={edits.valueOf(a, f)}
        onChangeText={(v) => edits.change(a, f, v)}
        onSubmitEditing={() => void edits.save(a)}
        error={edits.errorOf(a, f)}
        inputMode={extra?.numeric ? 'numeric' : undefined}
        placeholder={extra?.placeholder}
        testID={`inline-${f}-${a.id}`}
      />
    ) : (
      show(a)
    );

  const columns: Column<Asset>[] = [];
  if (!editing) columns.push({ key: 'photo', title: '', width: 56, render: (a) => <PhotoThumb url={a.thumbnailUrl} size={40} label={`Photo of ${a.plantId}`} /> });
  columns.push(
    {
      key: 'plantId', title: 'Plant ID', width: editing ? 100 : 130, sortable: true,
      render: (a) => (
        <View style={{ gap: 2 }}>
          {/* The whole row opens the item, except while editing, when the ID is the way in. */}
          {editing ? (
            <Link href={`/assets/${a.id}`}><Text variant="small" bold style={{ color: colors.brand, textDecorationLine: 'underline' }}>{a.plantId}</Text></Link>
          ) : (
            <Text variant="small" bold>{a.plantId}</Text>
          )}
          {a.archived ? <Badge tone="neutral" icon="archive-outline" label="Archived" /> : null}
        </View>
      ),
    },
    { key: 'name', title: 'Name', flex: 2, sortable: true, render: cell('name', 'Name', (a) => a.name) },
    { key: 'type', title: 'Type', width: editing ? 110 : 130, sortable: true, render: (a) => ASSET_TYPE_LABELS[a.type] },
    { key: 'system', title: 'System', flex: 1.3, render: cell('system', 'System', (a) => a.system || '—') },
    {
      key: 'siteName', title: 'Room / site', flex: editing ? 1.1 : 1.5,
      render: (a) => (
        <View>
          <Text variant="small" numberOfLines={1}>{a.plantRoomName ?? 'No plant room'}</Text>
          <Text variant="small" muted numberOfLines={1}>{a.siteName}</Text>
        </View>
      ),
    },
  );
  if (editing) {
    columns.push(
      { key: 'serialNumber', title: 'Serial', flex: 1.2, render: cell('serialNumber', 'Serial number', (a) => a.serialNumber || '—') },
      { key: 'serviceIntervalMonths', title: 'Interval (months)', width: 96, render: cell('serviceIntervalMonths', 'Service interval in months', (a) => (a.serviceIntervalMonths == null ? '—' : String(a.serviceIntervalMonths)), { numeric: true }) },
      { key: 'lastServiceDate', title: 'Last service', width: 130, render: cell('lastServiceDate', 'Last service date', (a) => formatDate(a.lastServiceDate), { placeholder: 'YYYY-MM-DD' }) },
      { key: 'save', title: 'Save', width: 120, render: (a) => (editable(a) ? <RowSave asset={a} edits={edits} /> : <Text variant="small" muted>Read only</Text>) },
    );
  } else {
    columns.push(
      { key: 'state', title: 'Tags', width: 150, render: (a) => <TagStateBadge summary={a} /> },
      { key: 'lastServiceDate', title: 'Last service', width: 120, render: (a) => formatDate(a.lastServiceDate) },
      { key: 'nextServiceDue', title: 'Service', width: 150, sortable: true, render: (a) => <ServiceBadge asset={a} compact /> },
    );
  }

  return (
    <DataTable
      label="Plant items"
      columns={columns}
      rows={rows}
      rowKey={(a) => a.id}
      sort={sort}
      onSort={onSort}
      paging={paging}
      busy={busy}
      minWidth={editing ? 1000 : 860}
      onRowPress={editing ? undefined : (a) => router.push(`/assets/${a.id}`)}
      empty={<EmptyState icon="magnify" title="No plant items match">Try fewer words or clear the filters.</EmptyState>}
      testID="asset-table"
    />
  );
}

function RowSave({ asset, edits }: { asset: Asset; edits: ReturnType<typeof useInlineEdits> }) {
  const rowError = edits.errorOf(asset, 'row');
  return (
    <View style={{ gap: space.xs }}>
      <Button title="Save" variant={edits.isDirty(asset) ? 'primary' : 'secondary'} disabled={!edits.isDirty(asset)} busy={edits.isSaving(asset)} onPress={() => void edits.save(asset)} testID={`inline-save-${asset.id}`} />
      {edits.isSaved(asset) ? (
        <View style={{ flexDirection: 'row', alignItems: 'center', gap: 2 }} testID={`inline-saved-${asset.id}`}>
          <MaterialCommunityIcons name="check-circle" size={16} color={colors.safe} />
          <Text variant="small">Saved</Text>
        </View>
      ) : null}
      {rowError ? <Text variant="small" style={{ color: colors.danger }}>⚠ {rowError}</Text> : null}
    </View>
  );
}
