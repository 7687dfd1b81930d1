import type { Href } from 'expo-router';

/** Only same-app paths may be used as the place to return to after sign-in. */
export function safeNext(next: string | string[] | undefined): Href {
  const value = Array.isArray(next) ? next[0] : next;
  if (!value || !value.startsWith('/') || value.startsWith('//') || value.startsWith('/sign-in')) return '/';
  // Checked above to be a path inside the app; which screen it names is only known at run time.
  return value as Href;
}
