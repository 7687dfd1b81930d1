import { useState } from 'react';
import * as yup from 'yup';
import { RequestError, errorMessage } from '@/hooks/api/request';
import { useUpdateAssetMutation } from '@/hooks/api/use-assets';
import { assetSchema } from '@/shared/schemas/register';
import type { Asset } from '@/shared/types/register';

/** The fields a supervisor can change straight in the register table. */
const INLINE_FIELDS = ['name', 'system', 'serialNumber', 'serviceIntervalMonths', 'lastServiceDate'] as const;
export type InlineField = (typeof INLINE_FIELDS)[number];
type InlineDraft = Record<InlineField, string>;

const inlineSchema = assetSchema.pick([...INLINE_FIELDS]);

const draftFrom = (a: Asset): InlineDraft => ({
  name: a.name,
  system: a.system,
  serialNumber: a.serialNumber,
  serviceIntervalMonths: a.serviceIntervalMonths == null ? '' : String(a.serviceIntervalMonths),
  lastServiceDate: a.lastServiceDate ?? '',
});

interface RowState {
  draft: InlineDraft;
  errors: Partial<Record<InlineField | 'row', string>>;
  saving: boolean;
  saved: boolean;
}

/** Per-row drafts, errors and saves for inline editing: each row saves on its own with one PATCH. */
export function useInlineEdits() {
  const update = useUpdateAssetMutation();
  const [rows, setRows] = useState<Record<number, RowState>>({});
  const patchRow = (id: number, next: Partial<RowState>) => setRows((r) => ({ ...r, [id]: { ...r[id], ...next } }));

  const valueOf = (a: Asset, f: InlineField) => rows[a.id]?.draft[f] ?? draftFrom(a)[f];
  const isDirty = (a: Asset) => {
    const d = rows[a.id]?.draft;
    if (!d) return false;
    const base = draftFrom(a);
    return INLINE_FIELDS.some((f) => d[f] !== base[f]);
  };

  const change = (a: Asset, f: InlineField, value: string) => {
    const draft = { ...(rows[a.id]?.draft ?? draftFrom(a)), [f]: value };
    patchRow(a.id, { draft, saved: false, errors: { ...rows[a.id]?.errors, [f]: undefined, row: undefined } });
  };

  const save = async (a: Asset) => {
    const draft = rows[a.id]?.draft;
    if (!draft) return;
    let patch: Record<string, unknown>;
    try {
      const input = { ...draft, serviceIntervalMonths: draft.serviceIntervalMonths.trim() === '' ? null : draft.serviceIntervalMonths, lastServiceDate: draft.lastServiceDate.trim() === '' ? null : draft.lastServiceDate };
      patch = await inlineSchema.validate(input, { abortEarly: false });
    } catch (err) {
      if (err instanceof yup.ValidationError) {
        patchRow(a.id, { errors: Object.fromEntries(err.inner.map((e) => [e.path, e.message])) });
        return;
      }
      throw err;
    }
    patchRow(a.id, { saving: true, errors: {} });
    try {
      const saved = await update.mutateAsync({ id: a.id, patch });
      patchRow(a.id, { saving: false, saved: true, draft: draftFrom(saved) });
    } catch (err) {
      const fields = err instanceof RequestError ? err.fields : undefined;
      patchRow(a.id, { saving: false, errors: { ...(fields ?? {}), row: errorMessage(err) } });
    }
  };

  return {
    valueOf,
    isDirty,
    change,
    save,
    errorOf: (a: Asset, f: InlineField | 'row') => rows[a.id]?.errors[f],
    isSaving: (a: Asset) => !!rows[a.id]?.saving,
    isSaved: (a: Asset) => !!rows[a.id]?.saved && !isDirty(a),
  };
}
