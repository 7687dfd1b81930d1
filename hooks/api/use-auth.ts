import { useMutation, useQuery } from '@tanstack/react-query';
import { request } from '@/hooks/api/request';
import { useAuth } from '@/hooks/auth/auth-provider';
import type { SignInInput } from '@/shared/schemas/auth';
import type { SignInResponse, User } from '@/shared/types/user';

const authKeys = { me: ['me'] as const };

export function useMeQuery() {
  const { token } = useAuth();
  return useQuery({ queryKey: authKeys.me, queryFn: () => request<User>('/me'), enabled: !!token, staleTime: 60_000 });
}

export function useSignInMutation() {
  const { setSession } = useAuth();
  return useMutation({
    mutationFn: (input: SignInInput) => request<SignInResponse>('/auth/login', { method: 'POST', body: input }),
    onSuccess: async (data) => { await setSession(data.token); },
  });
}

export function useSignOutMutation() {
  const { clearSession } = useAuth();
  return useMutation({
    mutationFn: () => request<void>('/auth/logout', { method: 'POST' }),
    // Sign out locally whatever the server says: a failed call must not leave the device signed in.
    onSettled: () => clearSession(),
  });
}
