import { View } from 'react-native';
import { space } from '@/components/theme';
import { useBreakpoints } from '@/components/theme/use-breakpoints';
import { Chip } from '@/components/ui/chip';
import { SelectField } from '@/components/ui/select-field';
import { SearchField } from '@/components/ui/text-field';
import { useSitesQuery } from '@/hooks/api/use-sites';
import { ASSET_TYPES, ASSET_TYPE_LABELS, type AssetType } from '@/shared/rules/register';

export interface RegisterFilterState {
  q: string;
  siteId: number | null;
  type: AssetType | null;
  includeArchived: boolean;
}

const TYPE_OPTIONS = ASSET_TYPES.map((t) => ({ value: t, label: ASSET_TYPE_LABELS[t] }));

export function RegisterFilters({ value, onChange, showArchivedToggle }: { value: RegisterFilterState; onChange: (next: RegisterFilterState) => void; showArchivedToggle: boolean }) {
  const { isWide } = useBreakpoints();
  const sites = useSitesQuery();
  const siteOptions = (sites.data?.items ?? []).map((s) => ({ value: s.id, label: s.name }));
  const set = (patch: Partial<RegisterFilterState>) => onChange({ ...value, ...patch });
  return (
    <View style={{ gap: space.sm }}>
      <SearchField
        label="Search the register"
        hint="Plant ID, name, system, serial number, site or room"
        value={value.q}
        onChangeText={(q) => set({ q })}
        placeholder="e.g. boiler 2 or P-HW-01"
        testID="register-search"
      />
      <View style={{ flexDirection: 'row', flexWrap: 'wrap', gap: space.sm, alignItems: 'center' }}>
        <View style={{ flexGrow: 1, flexBasis: isWide ? 260 : 150 }}>
          <SelectField label="Site" hideLabel value={value.siteId} options={siteOptions} onChange={(siteId) => set({ siteId })} placeholder="All sites" clearable testID="filter-site" />
        </View>
        <View style={{ flexGrow: 1, flexBasis: isWide ? 260 : 150 }}>
          <SelectField label="Type" hideLabel value={value.type} options={TYPE_OPTIONS} onChange={(type) => set({ type })} placeholder="All types" clearable testID="filter-type" />
        </View>
        {showArchivedToggle ? (
          <Chip label="Include archived" icon="archive-outline" selected={value.includeArchived} onPress={() => set({ includeArchived: !value.includeArchived })} testID="filter-archived" />
        ) : null}
      </View>
    </View>
  );
}
