import { useQueryClient } from '@tanstack/react-query';
import { createContext, useCallback, useContext, useEffect, useMemo, useState, type ReactNode } from 'react';
import { setRequestToken, setUnauthenticatedHandler } from '@/hooks/api/request';
import { tokenStore } from '@/hooks/auth/token-store';

interface AuthState {
  ready: boolean;
  token: string | null;
  setSession: (token: string) => Promise<void>;
  clearSession: () => Promise<void>;
}

const AuthContext = createContext<AuthState | null>(null);

export function AuthProvider({ children }: { children: ReactNode }) {
  const queryClient = useQueryClient();
  const [ready, setReady] = useState(false);
  const [token, setToken] = useState<string | null>(null);

  useEffect(() => {
    void tokenStore.get().then((stored) => {
      setRequestToken(stored);
      setToken(stored);
      setReady(true);
    });
  }, []);

  const clearSession = useCallback(async () => {
    setRequestToken(null);
    setToken(null);
    await tokenStore.clear();
    queryClient.clear();
  }, [queryClient]);

  const setSession = useCallback(async (value: string) => {
    queryClient.clear();
    setRequestToken(value);
    await tokenStore.set(value);
    setToken(value);
  }, [queryClient]);

  useEffect(() => {
    setUnauthenticatedHandler(() => void clearSession());
    return () => setUnauthenticatedHandler(null);
  }, [clearSession]);

  const value = useMemo(() => ({ ready, token, setSession, clearSession }), [ready, token, setSession, clearSession]);
  return <AuthContext.Provider value={value}>{children}</AuthContext.Provider>;
}

export function useAuth() {
  const ctx = useContext(AuthContext);
  if (!ctx) throw new Error('useAuth must be used inside AuthProvider');
  return ctx;
}
