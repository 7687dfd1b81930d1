import { useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import type { ImagePickerAsset } from 'expo-image-picker';
import { photoFormData } from '@/hooks/api/use-photos';
import { RequestError, request } from '@/hooks/api/request';
import { assetKeys } from '@/hooks/api/use-assets';
import { sendOrQueue } from '@/hooks/offline/send-or-queue';
import type { OutboxKind } from '@/hooks/offline/outbox-types';
import type { TagStatus } from '@/shared/rules/tags';
import type { ClearInAbsenceInput, ClearTagInput, ExtendTagInput, HandoverInput, RaiseTagInput } from '@/shared/schemas/tags';
import type { Tag } from '@/shared/types/tags';
import type { ListResponse } from '@/shared/types/user';

export interface TagFilters {
  assetId?: number;
  siteId?: number;
  status?: TagStatus;
}

export const tagKeys = {
  all: ['tags'] as const,
  lists: () => [...tagKeys.all, 'list'] as const,
  list: (filters: TagFilters) => [...tagKeys.lists(), filters] as const,
  detail: (id: number) => [...tagKeys.all, 'detail', id] as const,
};

// An item carries tens of tags over its life, not hundreds: one page of the largest size holds its history.
const TAG_PAGE = 200;

function queryString(filters: TagFilters) {
  const params = new URLSearchParams({ pageSize: String(TAG_PAGE) });
  for (const [k, v] of Object.entries(filters)) if (v !== undefined && v !== null) params.set(k, String(v));
  return `?${params.toString()}`;
}

export function useTagsQuery(filters: TagFilters, enabled = true) {
  return useQuery({
    queryKey: tagKeys.list(filters),
    queryFn: () => request<ListResponse<Tag>>(`/tags${queryString(filters)}`),
    enabled,
  });
}

export function useTagQuery(id: number) {
  return useQuery({ queryKey: tagKeys.detail(id), queryFn: () => request<Tag>(`/tags/${id}`), enabled: id > 0 });
}

/** Every tag change alters the item's state, which registers and records show: refresh both. */
function useTagChanged() {
  const qc = useQueryClient();
  return async (tag: Tag) => {
    qc.setQueryData(tagKeys.detail(tag.id), tag);
    await Promise.all([qc.invalidateQueries({ queryKey: tagKeys.all }), qc.invalidateQueries({ queryKey: assetKeys.all })]);
  };
}

/** A key for one raise: sent with every attempt of the same submission so a retry never makes a second tag. */
export function newIdempotencyKey(): string {
  const uuid = globalThis.crypto?.randomUUID?.();
  if (uuid) return `raise-${uuid}`;
  return `raise-${Date.now().toString(36)}-${Math.random().toString(36).slice(2)}${Math.random().toString(36).slice(2)}`;
}

export interface RaiseTagVariables {
  input: RaiseTagInput;
  idempotencyKey: string;
}

export function useRaiseTagMutation(assetId: number) {
  const changed = useTagChanged();
  return useMutation({
    // With no signal the raise waits in the outbox with the same key; the server answers a repeat with the tag it already made.
    mutationFn: ({ input, idempotencyKey }: RaiseTagVariables) =>
      sendOrQueue<Tag>(`/assets/${assetId}/tags`, { method: 'POST', body: input, headers: { 'Idempotency-Key': idempotencyKey } }, {
        kind: 'raise-tag',
        summary: `raise ${input.kind} tag: ${input.reason}`,
        assetId,
      }),
    // A dropped connection is tried again with the same key before the raise goes to the outbox.
    retry: (count, err) => err instanceof RequestError && err.status === 0 && err.code !== 'queued' && count < 2,
    onSuccess: changed,
  });
}

/** A tag action; with no signal it waits in the outbox and the form is told it has not happened yet. */
function useTagAction<I>(id: number, action: string, kind: OutboxKind, summary: string) {
  const changed = useTagChanged();
  return useMutation({
    mutationFn: (input: I) => sendOrQueue<Tag>(`/tags/${id}/${action}`, { method: 'POST', body: input }, { kind, summary: `${summary} (tag ${id})`, tagId: id }),
    onSuccess: changed,
  });
}

export const useClearTagMutation = (id: number) => useTagAction<ClearTagInput>(id, 'clear', 'tag-clear', 'clear the tag');
export const useClearInAbsenceMutation = (id: number) => useTagAction<ClearInAbsenceInput>(id, 'clear-in-absence', 'tag-clear', 'clear the tag in the holder’s absence');
export const useExtendTagMutation = (id: number) => useTagAction<ExtendTagInput>(id, 'extend', 'tag-extend', 'extend the tag');
/** Called by the on-coming person: they become the holder. */
export const useHandoverTagMutation = (id: number) => useTagAction<HandoverInput>(id, 'handover', 'tag-handover', 'take over the tag');
export const useAddTagNoteMutation = (id: number) => useTagAction<{ text: string }>(id, 'notes', 'tag-note', 'add a note');

/** A photo of the lock or tag in place, added to a live tag. */
export function useAddTagPhotoMutation(id: number) {
  const changed = useTagChanged();
  return useMutation({
    mutationFn: (asset: ImagePickerAsset) =>
      sendOrQueue<Tag>(`/tags/${id}/photos`, { method: 'POST', body: photoFormData(asset) }, { kind: 'tag-photo', summary: `add a photo (tag ${id})`, tagId: id }),
    onSuccess: changed,
  });
}
