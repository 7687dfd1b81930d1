import { DEMO_PASSWORD } from '@/server/seed/demo';

/** True for localhost, 127.0.0.0/8 and ::1: addresses only this machine can reach. */
export function isLoopbackUrl(url: string): boolean {
  let host: string;
  try {
    host = new URL(url).hostname.toLowerCase().replace(/^\[|\]$/g, '');
  } catch {
    return false;
  }
  return host === 'localhost' || host.endsWith('.localhost') || host === '::1' || /^127(\.\d{1,3}){3}$/.test(host);
}

/**
 * Whether `npm start` seeds the demo organisation, whose password is published in the README: only when DEMO=1 is
 * set explicitly, or when PUBLIC_URL is on loopback (nobody else can reach it). DEMO=0 never seeds.
 */
export function demoSeedDecision(env: Record<string, string | undefined>, publicUrl: string): { seed: boolean; reason: string } {
  const demo = (env.DEMO ?? '').trim();
  if (demo === '1') return { seed: true, reason: 'DEMO=1' };
  if (demo !== '') return { seed: false, reason: `DEMO=${demo}` };
  if (isLoopbackUrl(publicUrl)) return { seed: true, reason: `PUBLIC_URL ${publicUrl} is on loopback` };
  return { seed: false, reason: `PUBLIC_URL ${publicUrl} is not on loopback; set DEMO=1 to seed the demo anyway` };
}

/** Printed whenever the demo is seeded or present: anyone who can reach the server can sign in with this password. */
export const demoWarning = () =>
  `WARNING: the demo organisation's accounts all use the published password "${DEMO_PASSWORD}". Anyone who can reach this server can sign in with it. Do not use demo data for real work.`;
