import { keepPreviousData, useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import { request } from '@/hooks/api/request';
import { boardKeys } from '@/hooks/api/use-board';
import { MAX_PAGE_SIZE } from '@/shared/rules/paging';
import type { ChangeUserInput, InviteUserInput } from '@/shared/schemas/team';
import type { AuditEntry, TeamMember, UndeliveredMail } from '@/shared/types/team';
import type { ListResponse } from '@/shared/types/api';

const teamKeys = {
  all: ['team'] as const,
  members: () => [...teamKeys.all, 'members'] as const,
  audit: (page: number, pageSize: number) => [...teamKeys.all, 'audit', page, pageSize] as const,
  undelivered: () => [...teamKeys.all, 'undelivered-mail'] as const,
};

/** Everyone in the organisation: teams are tens of people, so one page of the largest size holds them. */
export function useTeamQuery(enabled = true) {
  return useQuery({
    queryKey: teamKeys.members(),
    queryFn: () => request<ListResponse<TeamMember>>(`/users?pageSize=${MAX_PAGE_SIZE}`),
    staleTime: 60_000,
    enabled,
  });
}

/** E-mails the mail server refused for good (admins only). */
export function useUndeliveredMailQuery(enabled = true) {
  return useQuery({
    queryKey: teamKeys.undelivered(),
    queryFn: () => request<{ items: UndeliveredMail[]; total: number }>('/team/undelivered-mail'),
    staleTime: 60_000,
    enabled,
  });
}

export function useAuditQuery(page: number, pageSize: number) {
  return useQuery({
    queryKey: teamKeys.audit(page, pageSize),
    queryFn: () => request<ListResponse<AuditEntry>>(`/audit?page=${page}&pageSize=${pageSize}`),
    placeholderData: keepPreviousData,
  });
}

/** A change to a person changes the list, the audit log and (site access, deactivation) what the board shows. */
function useTeamChanged() {
  const qc = useQueryClient();
  return () => Promise.all([qc.invalidateQueries({ queryKey: teamKeys.all }), qc.invalidateQueries({ queryKey: boardKeys.all })]);
}

export function useInviteUserMutation() {
  const changed = useTeamChanged();
  return useMutation({
    mutationFn: (input: InviteUserInput) => request<TeamMember>('/users/invite', { method: 'POST', body: input }),
    onSuccess: () => changed(),
  });
}

export function useResendInviteMutation() {
  const changed = useTeamChanged();
  return useMutation({
    mutationFn: (id: number) => request<TeamMember>(`/users/${id}/invite`, { method: 'POST' }),
    onSuccess: () => changed(),
  });
}

export function useChangeUserMutation() {
  const changed = useTeamChanged();
  return useMutation({
    mutationFn: ({ id, input }: { id: number; input: ChangeUserInput }) => request<TeamMember>(`/users/${id}`, { method: 'PATCH', body: input }),
    onSuccess: () => changed(),
  });
}

export function useSiteAccessMutation() {
  const changed = useTeamChanged();
  return useMutation({
    mutationFn: ({ id, siteIds }: { id: number; siteIds: number[] }) => request<TeamMember>(`/users/${id}/sites`, { method: 'PUT', body: { siteIds } }),
    onSuccess: () => changed(),
  });
}
