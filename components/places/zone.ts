/** The time zone this device is set to, as the platform names it. */
export const deviceZone = () => Intl.DateTimeFormat().resolvedOptions().timeZone;

/**
 * A site's zone in words ("America/New York") when it differs from the viewer's own, else null: a zone is only
 * worth showing when the clock on site is not the clock in the viewer's hand.
 */
export function zoneIfDifferent(timeZone: string): string | null {
  return timeZone === deviceZone() ? null : timeZone.replace(/_/g, ' ');
}
