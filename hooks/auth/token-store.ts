import * as SecureStore from 'expo-secure-store';

// Native: the token lives in the platform's secure store (Keychain / Keystore).
const KEY = 'isoledger.token';

export const tokenStore = {
  get: () => SecureStore.getItemAsync(KEY),
  set: (token: string) => SecureStore.setItemAsync(KEY, token),
  clear: () => SecureStore.deleteItemAsync(KEY),
};
