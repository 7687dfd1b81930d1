import { useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import type { ImagePickerAsset } from 'expo-image-picker';
import { photoFormData } from '@/hooks/api/use-photos';
import { RequestError, request } from '@/hooks/api/request';
import { assetKeys } from '@/hooks/api/use-assets';
import { sendOrQueue } from '@/hooks/offline/send-or-queue';
import type { OutboxKind } from '@/hooks/offline/outbox-types';
import type {
  ClearInAbsenceInput, ClearTagInput, ExtendTagInput, HandoverAcceptInput, HandoverOfferInput, ProofInput, RaiseTagInput, ReassignInAbsenceInput,
} from '@/shared/schemas/tags';
import type { TagListQuery } from '@/shared/schemas/queries';
import type { Tag, TagNotice } from '@/shared/types/tags';
import type { ListResponse } from '@/shared/types/user';

/** `GET /api/tags` filters: the shared query schema without its paging. */
export type TagFilters = Partial<Omit<TagListQuery, 'page' | 'pageSize'>>;

export const tagKeys = {
  all: ['tags'] as const,
  lists: () => [...tagKeys.all, 'list'] as const,
  list: (filters: TagFilters) => [...tagKeys.lists(), filters] as const,
  detail: (id: number) => [...tagKeys.all, 'detail', id] as const,
  notices: () => [...tagKeys.all, 'notices'] as const,
  colleagues: () => [...tagKeys.all, 'colleagues'] as const,
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

/**
 * A key for one submission of a tag action, sent as the `Idempotency-Key` header with every attempt of it, so a
 * retry never writes a second tag or event; the server refuses the same key with a different request (422).
 */
export function newIdempotencyKey(action = 'raise'): string {
  const uuid = globalThis.crypto?.randomUUID?.();
  if (uuid) return `${action}-${uuid}`;
  return `${action}-${Date.now().toString(36)}-${Math.random().toString(36).slice(2)}${Math.random().toString(36).slice(2)}`;
}

/** One key per submitted variables object: react-query passes the same object to every retry of a mutation. */
const submissionKeys = new WeakMap<object, string>();
function keyFor(variables: object, action: string): string {
  let key = submissionKeys.get(variables);
  if (!key) submissionKeys.set(variables, (key = newIdempotencyKey(action)));
  return key;
}

interface RaiseTagVariables {
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

/** A tag action; with no signal it waits in the outbox, with its Idempotency-Key, and the form is told it has not happened yet. */
function useTagAction<I extends object>(id: number, action: string, kind: OutboxKind, summary: string) {
  const changed = useTagChanged();
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (input: I) => sendOrQueue<Tag>(`/tags/${id}/${action}`, { method: 'POST', body: input, headers: { 'Idempotency-Key': keyFor(input, action.replace(/\//g, '-')) } }, { kind, summary: `${summary} (tag ${id})`, tagId: id }),
    onSuccess: async (tag) => {
      await changed(tag);
      await qc.invalidateQueries({ queryKey: tagKeys.notices() });
    },
  });
}

export const useClearTagMutation = (id: number) => useTagAction<ClearTagInput>(id, 'clear', 'tag-clear', 'clear the tag');
export const useClearInAbsenceMutation = (id: number) => useTagAction<ClearInAbsenceInput>(id, 'clear-in-absence', 'tag-clear', 'clear the tag in the holder’s absence');
export const useReassignInAbsenceMutation = (id: number) => useTagAction<ReassignInAbsenceInput>(id, 'reassign-in-absence', 'tag-handover', 'reassign the tag in the holder’s absence');
export const useExtendTagMutation = (id: number) => useTagAction<ExtendTagInput>(id, 'extend', 'tag-extend', 'extend the tag');
export const useProveTagMutation = (id: number) => useTagAction<ProofInput>(id, 'prove', 'tag-prove', 'record the proof of isolation');
/** The holder names the colleague who is to take the tag; nothing changes hands until they accept. */
export const useOfferHandoverMutation = (id: number) => useTagAction<HandoverOfferInput>(id, 'handover', 'tag-handover', 'offer the tag to a colleague');
/** The named colleague accepts with the number of the lock they have just put on. */
export const useAcceptHandoverMutation = (id: number) => useTagAction<HandoverAcceptInput>(id, 'handover/accept', 'tag-handover', 'accept the hand-over');
export const useWithdrawHandoverMutation = (id: number) => useTagAction<Record<string, never>>(id, 'handover/withdraw', 'tag-handover', 'withdraw the hand-over offer');
export const useAcknowledgeTagMutation = (id: number) => useTagAction<Record<string, never>>(id, 'acknowledge', 'tag-acknowledge', 'acknowledge what happened in your absence');
export const useAddTagNoteMutation = (id: number) => useTagAction<{ text: string }>(id, 'notes', 'tag-note', 'add a note');

/** Tags cleared or reassigned while the caller was away, not yet acknowledged. */
export function useTagNoticesQuery(enabled = true) {
  return useQuery({ queryKey: tagKeys.notices(), queryFn: () => request<TagNotice[]>('/tag-notices'), enabled });
}

/** Colleagues a tag can be offered or reassigned to. */
export function useTagColleaguesQuery(enabled = true) {
  return useQuery({ queryKey: tagKeys.colleagues(), queryFn: () => request<{ id: number; name: string; role: string }[]>('/tag-colleagues'), enabled });
}

/** A photo of the lock or tag in place, added to a live tag. */
export function useAddTagPhotoMutation(id: number) {
  const changed = useTagChanged();
  return useMutation({
    mutationFn: (asset: ImagePickerAsset) =>
      sendOrQueue<Tag>(`/tags/${id}/photos`, { method: 'POST', body: photoFormData(asset), headers: { 'Idempotency-Key': keyFor(asset, 'photo') } }, { kind: 'tag-photo', summary: `add a photo (tag ${id})`, tagId: id }),
    onSuccess: changed,
  });
}
