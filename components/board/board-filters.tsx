import { View } from 'react-native';
import { space } from '@/components/theme';
import { useBreakpoints } from '@/components/theme/use-breakpoints';
import { SelectField, type SelectOption } from '@/components/ui/select-field';
import { SearchField } from '@/components/ui/text-field';
import { KIND_LOOK } from '@/components/tags/tag-vocabulary';
import { BOARD_STATES, BOARD_STATE_LABELS, type BoardState } from '@/shared/rules/board';
import { TAG_KINDS, type TagKind } from '@/shared/rules/tags';

export interface BoardFilterState {
  q: string;
  siteId: number | null;
  kind: TagKind | null;
  holderId: number | null;
  state: BoardState | null;
}

export const NO_BOARD_FILTERS: BoardFilterState = { q: '', siteId: null, kind: null, holderId: null, state: null };

const KIND_OPTIONS = TAG_KINDS.map((k) => ({ value: k, label: KIND_LOOK[k].word }));
const STATE_OPTIONS = BOARD_STATES.map((s) => ({ value: s, label: BOARD_STATE_LABELS[s] }));

interface Props {
  value: BoardFilterState;
  onChange: (next: BoardFilterState) => void;
  sites: SelectOption<number>[];
  holders: SelectOption<number>[];
}

export function BoardFilters({ value, onChange, sites, holders }: Props) {
  const { isWide } = useBreakpoints();
  const set = (patch: Partial<BoardFilterState>) => onChange({ ...value, ...patch });
  const basis = isWide ? 200 : 150;
  return (
    <View style={{ gap: space.xs }} nativeID="board-filters">
      <SearchField
        label="Search the board"
        hint="Plant ID, item name, reason or holder"
        value={value.q}
        onChangeText={(q) => set({ q })}
        placeholder="e.g. AHU-2 or seal"
        testID="board-search"
      />
      <View style={{ flexDirection: 'row', flexWrap: 'wrap', gap: space.sm }}>
        <View style={{ flexGrow: 1, flexBasis: basis }}>
          <SelectField label="Site" hideLabel value={value.siteId} options={sites} onChange={(siteId) => set({ siteId })} placeholder="All sites" clearable testID="board-filter-site" />
        </View>
        <View style={{ flexGrow: 1, flexBasis: basis }}>
          <SelectField label="Kind" hideLabel value={value.kind} options={KIND_OPTIONS} onChange={(kind) => set({ kind })} placeholder="Both kinds" clearable testID="board-filter-kind" />
        </View>
        <View style={{ flexGrow: 1, flexBasis: basis }}>
          <SelectField label="Holder" hideLabel value={value.holderId} options={holders} onChange={(holderId) => set({ holderId })} placeholder="Any holder" clearable testID="board-filter-holder" />
        </View>
        <View style={{ flexGrow: 1, flexBasis: basis }}>
          <SelectField label="State" hideLabel value={value.state} options={STATE_OPTIONS} onChange={(state) => set({ state })} placeholder="Every state" clearable testID="board-filter-state" />
        </View>
      </View>
    </View>
  );
}
