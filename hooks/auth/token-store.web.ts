// Web: the browser's local storage for this origin; the token expires within one shift and sign-out revokes it server-side.
const KEY = 'isoledger.token';

export const tokenStore = {
  get: async () => (typeof window === 'undefined' ? null : window.localStorage.getItem(KEY)),
  set: async (token: string) => window.localStorage.setItem(KEY, token),
  clear: async () => window.localStorage.removeItem(KEY),
};
