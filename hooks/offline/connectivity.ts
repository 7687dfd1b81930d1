import { onlineManager } from '@tanstack/react-query';

/**
 * Whether the server can be reached, as the last request found it. A browser's own online flag says only that some
 * network is attached (a phone in a basement often has one with no route out), so every request reports here:
 * no answer pauses react-query's fetches, which keeps what the cache holds instead of turning it into an error;
 * any answer resumes them.
 */
export function noAnswer() {
  if (onlineManager.isOnline()) onlineManager.setOnline(false);
}

export function answered() {
  if (!onlineManager.isOnline()) onlineManager.setOnline(true);
}

/** True while the last request got no answer, or the browser says there is no network at all. */
export function knownOffline(): boolean {
  return !onlineManager.isOnline() || (typeof navigator !== 'undefined' && navigator.onLine === false);
}
