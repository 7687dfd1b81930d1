/** Only same-app paths may be used as the place to return to after sign-in. */
export function safeNext(next: string | string[] | undefined): string {
  const value = Array.isArray(next) ? next[0] : next;
  if (!value || !value.startsWith('/') || value.startsWith('//') || value.startsWith('/sign-in')) return '/';
  return value;
}
