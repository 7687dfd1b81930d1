/**
 * Registers the worker the build writes (scripts/lib/web-offline.ts), so the app shell, scripts, fonts and the
 * scanner's wasm open with no signal. Not in development: the dev server's bundles change on every edit.
 */
export function registerServiceWorker() {
  if (process.env.NODE_ENV !== 'production' || typeof navigator === 'undefined' || !('serviceWorker' in navigator)) return;
  void navigator.serviceWorker.register('/sw.js').catch(() => {
    // No worker (private window, blocked by policy): the app still works while there is a signal.
  });
}
