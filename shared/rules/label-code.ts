// Label codes: the short random identifier printed (as text and inside a QR code) on a plant item's label.
// Plain TypeScript for browser and Node alike: randomness comes from globalThis.crypto (Web Crypto),
// which both provide, so there is no `node:` import here.

/**
 * 23 symbols that survive worn print, small type, handwriting and being read aloud.
 * Left out, and why:
 * - 0 O Q D: round shapes that blur into one another; Q's tail is lost in small or worn print.
 * - 1 I L: single strokes.
 * - S Z B G: read as 5 2 8 6. The digit stays, the letter goes, so each pair keeps one member.
 * - U V: differ only in the bottom curve; both go, so a half-worn U/V is never a valid code.
 * So a misreading within any of these pairs gives either the right symbol or an invalid code,
 * never a different valid one.
 */
export const LABEL_CODE_ALPHABET = '23456789ACEFHJKMNPRTWXY';

/**
 * 12 symbols carry 12 × log2(23) ≈ 54.3 bits; the code space is 23^12 ≈ 2.19 × 10^16.
 * Birthday bound, P(any collision among n random codes) ≈ n² / (2 · 23^12):
 *   n = 10^6 → 2.3 × 10^-5,  n = 10^7 → 2.3 × 10^-3.
 * The database still holds a unique index and the issuer retries on a clash, so a collision costs
 * one retry, never a wrong label; 12 is the shortest length that keeps that retry rare for
 * millions of items while splitting evenly into three groups of four for reading aloud.
 */
export const LABEL_CODE_LENGTH = 12;

/** Characters per group when a code is shown to a person, e.g. `7KXM-4HAP-R2WC`. */
const LABEL_CODE_GROUP = 4;

/** Path segment in front of the code in a label URL: `<PUBLIC_URL>/l/<code>`. */
const LABEL_PATH_SEGMENT = 'l';

const ALPHABET_SIZE = LABEL_CODE_ALPHABET.length;
// Largest multiple of 23 below 256: bytes at or above it are discarded so every symbol is equally likely.
const BYTE_LIMIT = Math.floor(256 / ALPHABET_SIZE) * ALPHABET_SIZE;
const SEPARATORS = /[\s\-\u2010-\u2015\u2212]/g;
const CANONICAL = new RegExp(`^[${LABEL_CODE_ALPHABET}]{${LABEL_CODE_LENGTH}}$`);

/** A new random code, canonical form (upper case, no separators). */
export function generateLabelCode(): string {
  const bytes = new Uint8Array(LABEL_CODE_LENGTH + 4);
  let code = '';
  while (code.length < LABEL_CODE_LENGTH) {
    globalThis.crypto.getRandomValues(bytes);
    for (const b of bytes) {
      if (b >= BYTE_LIMIT) continue;
      code += LABEL_CODE_ALPHABET[b % ALPHABET_SIZE];
      if (code.length === LABEL_CODE_LENGTH) break;
    }
  }
  return code;
}

/** True only for a code in canonical form. */
export function isLabelCode(s: unknown): s is string {
  return typeof s === 'string' && CANONICAL.test(s);
}

/**
 * Canonical form of a code typed or pasted by a person: trims, upper-cases and drops spaces and
 * hyphens (including typographic dashes). Returns null when what is left is not a valid code.
 */
export function normaliseLabelCode(input: unknown): string | null {
  if (typeof input !== 'string') return null;
  const code = input.trim().toUpperCase().replace(SEPARATORS, '');
  return isLabelCode(code) ? code : null;
}

/** `7KXM4HAPR2WC` → `7KXM-4HAP-R2WC`, for printing and reading aloud. Canonical codes only. */
export function formatLabelCode(code: string): string {
  if (!isLabelCode(code)) throw new Error(`Not a label code: ${JSON.stringify(code)}`);
  const groups: string[] = [];
  for (let i = 0; i < code.length; i += LABEL_CODE_GROUP) groups.push(code.slice(i, i + LABEL_CODE_GROUP));
  return groups.join('-');
}

function stripTrailingSlashes(s: string): string {
  return s.replace(/\/+$/, '');
}

/** The URL a label's QR code carries: PUBLIC_URL (no trailing slash) + `/l/` + code. */
export function labelUrl(publicUrl: string, code: string): string {
  if (!isLabelCode(code)) throw new Error(`Not a label code: ${JSON.stringify(code)}`);
  return `${stripTrailingSlashes(publicUrl.trim())}/${LABEL_PATH_SEGMENT}/${code}`;
}

function basePath(publicUrl: string): string | null {
  try {
    return stripTrailingSlashes(new URL(publicUrl).pathname);
  } catch {
    return null;
  }
}

/**
 * The code inside a scanned QR text, or null when the text is not a label URL.
 * Any http(s) host is accepted, because labels printed under one PUBLIC_URL are scanned by
 * installations that may run under another; what must match is the path: `/l/<code>`, or
 * `<base path of publicUrl>/l/<code>` when the scanning installation lives under a sub-path.
 * Query string and fragment are ignored.
 */
export function parseLabelUrl(text: unknown, publicUrl?: string): string | null {
  if (typeof text !== 'string') return null;
  let url: URL;
  try {
    url = new URL(text.trim());
  } catch {
    return null;
  }
  if (url.protocol !== 'https:' && url.protocol !== 'http:') return null;
  const match = /^(.*)\/([^/]+)\/([^/]+)\/?$/.exec(url.pathname);
  if (!match || match[2] !== LABEL_PATH_SEGMENT) return null;
  const prefix = match[1];
  const allowedPrefixes = [''];
  const base = publicUrl ? basePath(publicUrl) : null;
  if (base) allowedPrefixes.push(base);
  if (!allowedPrefixes.includes(prefix)) return null;
  let segment: string;
  try {
    segment = decodeURIComponent(match[3]);
  } catch {
    return null;
  }
  return normaliseLabelCode(segment);
}
