import { answered, noAnswer } from '@/hooks/offline/connectivity';
import type { ApiErrorBody, ErrorCode, FieldErrors } from '@/shared/types/api';

/** An API failure in a form people can read; `fields` maps form fields to messages. */
export class RequestError extends Error {
  constructor(
    public readonly status: number,
    public readonly code: ErrorCode,
    message: string,
    public readonly fields?: FieldErrors,
  ) {
    super(message);
    this.name = 'RequestError';
  }
}

let token: string | null = null;
let onUnauthenticated: (() => void) | null = null;

export const setRequestToken = (value: string | null) => { token = value; };
/** The session token in use, if any (the outbox records whose actions it holds). */
export const currentToken = () => token;
export const setUnauthenticatedHandler = (fn: (() => void) | null) => { onUnauthenticated = fn; };

// Same origin on the web; a native build points at the server with EXPO_PUBLIC_API_URL.
const BASE = process.env.EXPO_PUBLIC_API_URL ?? '';

export interface RequestOptions {
  method?: 'GET' | 'POST' | 'PATCH' | 'PUT' | 'DELETE';
  body?: unknown;
  headers?: Record<string, string>;
  /** Return the raw Response (files, CSV) instead of parsed JSON. */
  raw?: boolean;
}

/** The only place the client calls fetch. */
export async function request<T>(path: string, opts: RequestOptions = {}): Promise<T> {
  const headers: Record<string, string> = { Accept: 'application/json', ...opts.headers };
  if (token) headers.Authorization = `Bearer ${token}`;
  let body: BodyInit | undefined;
  if (opts.body instanceof FormData) body = opts.body;
  else if (opts.body !== undefined) {
    headers['Content-Type'] = 'application/json';
    body = JSON.stringify(opts.body);
  }
  let res: Response;
  try {
    res = await fetch(`${BASE}/api${path}`, { method: opts.method ?? 'GET', headers, body });
  } catch {
    noAnswer();
    throw new RequestError(0, 'offline', 'Cannot reach the Isoledger server. Check your connection and try again.');
  }
  answered();
  if (res.status === 401 && token && !path.startsWith('/auth/login')) onUnauthenticated?.();
  if (!res.ok) {
    let parsed: ApiErrorBody | null = null;
    try { parsed = (await res.json()) as ApiErrorBody; } catch { /* not JSON */ }
    const e = parsed?.error;
    throw new RequestError(res.status, e?.code ?? 'http-error', e?.message ?? `The server answered ${res.status}.`, e?.fields);
  }
  if (opts.raw) return res as unknown as T;
  if (res.status === 204) return undefined as T;
  return (await res.json()) as T;
}

/**
 * An authenticated file (photo, CSV) as a Blob. `url` is the address the API hands out, e.g. `/api/photos/7`;
 * such files need the bearer token, so an <img src> or a plain link cannot load them.
 */
export async function fetchBlob(url: string): Promise<Blob> {
  if (!url.startsWith('/api/')) throw new RequestError(0, 'bad-url', 'That file is not served by Isoledger.');
  const res = await request<Response>(url.slice('/api'.length), { raw: true, headers: { Accept: '*/*' } });
  return res.blob();
}

export const errorMessage = (err: unknown) =>
  err instanceof RequestError ? err.message : err instanceof Error ? err.message : 'Something went wrong.';

/** A CSV file posted to an import route: a dry run only checks it, `dryRun: false` writes. */
export function postCsvImport<R>(path: string, { file, dryRun }: { file: Blob; dryRun: boolean }, fallbackName: string): Promise<R> {
  const form = new FormData();
  form.append('file', file, file instanceof File ? file.name : fallbackName);
  return request<R>(`${path}?dryRun=${dryRun}`, { method: 'POST', body: form });
}
