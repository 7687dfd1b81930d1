import { SelectField } from '@/components/ui/select-field';
import { GLYCOL_KINDS, GLYCOL_LABELS, type GlycolKind } from '@/shared/calc';

const OPTIONS = GLYCOL_KINDS.map((k) => ({ value: k, label: GLYCOL_LABELS[k] }));

/** Plain water, or the glycol the system is filled with. */
export function GlycolChoice({ value, onChange, error, testID }: { value: GlycolKind | null; onChange: (v: GlycolKind | null) => void; error?: string | false; testID: string }) {
  return (
    <SelectField label="Glycol in the system water" value={value} options={OPTIONS} onChange={onChange} placeholder="None (plain water)" clearable error={error} testID={testID} />
  );
}
