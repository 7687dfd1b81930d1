import { useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import { request } from '@/hooks/api/request';
import { useAuth } from '@/hooks/auth/auth-provider';
import type { MySettingsInput, ResetRequestInput, SetPasswordInput } from '@/shared/schemas/team';
import type { MySettings, ResetRequestResponse, SetPasswordResponse } from '@/shared/types/team';

const accountKeys = { settings: ['me', 'settings'] as const };

export function useMySettingsQuery() {
  const { token } = useAuth();
  return useQuery({ queryKey: accountKeys.settings, queryFn: () => request<MySettings>('/me/settings'), enabled: !!token });
}

export function useUpdateMySettingsMutation() {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (input: MySettingsInput) => request<MySettings>('/me/settings', { method: 'PATCH', body: input }),
    onSuccess: (settings) => qc.setQueryData(accountKeys.settings, settings),
  });
}

/** Public: the answer is the same whether or not the address belongs to anyone. */
export function useResetRequestMutation() {
  return useMutation({
    mutationFn: (input: ResetRequestInput) => request<ResetRequestResponse>('/auth/password/reset-request', { method: 'POST', body: input }),
  });
}

/** Public: the token from an invitation or reset e-mail and the chosen password. */
export function useSetPasswordMutation() {
  return useMutation({
    mutationFn: (input: SetPasswordInput) => request<SetPasswordResponse>('/auth/password/set', { method: 'POST', body: input }),
  });
}
