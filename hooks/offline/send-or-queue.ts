import { RequestError, currentToken, request, type RequestOptions } from '@/hooks/api/request';
import { Outbox } from '@/hooks/offline/outbox';
import { createOutboxStore } from '@/hooks/offline/outbox-store';
import type { OutboxAction, OutboxEntry, OutboxKind, StoredFormField } from '@/hooks/offline/outbox-types';

const TIMED_KINDS: ReadonlySet<OutboxKind> = new Set(['reading']);

/** The device's one outbox. */
export const outbox = new Outbox(createOutboxStore());

/** Thrown to a form when its action went to the outbox: it has not happened yet, and the form must not say it has. */
export class QueuedError extends RequestError {
  constructor() {
    super(0, 'queued', 'No signal: saved on this device and waiting to send. It is sent when the connection returns; until the server confirms, it has not happened.');
    this.name = 'QueuedError';
  }
}

/** `organisation:user` from the session token, so one person's actions are never sent under another's session. */
export function tokenOwner(token: string | null): string | null {
  if (!token) return null;
  try {
    const payload = JSON.parse(atob(token.split('.')[1].replace(/-/g, '+').replace(/_/g, '/'))) as { org?: number; sub?: string };
    return payload.org && payload.sub ? `${payload.org}:${payload.sub}` : null;
  } catch {
    return null;
  }
}

export function newActionKey(kind: string): string {
  const uuid = globalThis.crypto?.randomUUID?.() ?? `${Date.now().toString(36)}-${Math.random().toString(36).slice(2)}`;
  return `${kind}-${uuid}`;
}

function storeForm(form: FormData): StoredFormField[] {
  const fields: StoredFormField[] = [];
  form.forEach((value, name) => {
    fields.push([name, typeof value === 'string' ? value : { blob: value, fileName: (value as File).name || 'photo.jpg' }]);
  });
  return fields;
}

function toFormData(fields: StoredFormField[]): FormData {
  const form = new FormData();
  for (const [name, value] of fields) {
    if (typeof value === 'string') form.append(name, value);
    else form.append(name, value.blob, value.fileName);
  }
  return form;
}

/**
 * A reading set is stored with the time it was taken. Sent at once, the server's clock gives it; queued, it would be
 * the time the signal returned, so the set carries the moment it was queued (the schema allows for clock skew).
 */
function stampTaken(kind: OutboxKind, body: unknown): unknown {
  if (!TIMED_KINDS.has(kind) || !body || typeof body !== 'object' || (body as { takenAt?: unknown }).takenAt) return body;
  return { ...body, takenAt: new Date().toISOString() };
}

/**
 * Sends an action with an idempotency key; with no signal, keeps it in the outbox (same key) and throws QueuedError.
 * While earlier actions are still waiting, a new one waits behind them so the server sees them in the order taken.
 */
export async function sendOrQueue<T>(path: string, opts: RequestOptions & { method: OutboxEntry['method'] }, action: OutboxAction): Promise<T> {
  const key = opts.headers?.['Idempotency-Key'] ?? newActionKey(action.kind);
  const owner = tokenOwner(currentToken());
  await outbox.load();
  const queueAhead = !!owner && outbox.snapshot().some((e) => e.owner === owner && e.state === 'waiting');
  if (!queueAhead) {
    try {
      return await request<T>(path, { ...opts, headers: { ...opts.headers, 'Idempotency-Key': key } });
    } catch (err) {
      if (!(err instanceof RequestError) || err.status !== 0 || !owner) throw err;
    }
  }
  const isForm = opts.body instanceof FormData;
  // The same action submitted again while it waits (a second tap on a form still open) stays one entry.
  const fingerprint = isForm ? undefined : JSON.stringify([opts.method, path, opts.body ?? null]);
  const waiting = fingerprint && outbox.snapshot().some((e) => e.owner === owner && e.state === 'waiting' && e.fingerprint === fingerprint);
  if (!waiting) {
    await outbox.add({
      ...action,
      key,
      owner: owner!,
      method: opts.method,
      path,
      body: isForm ? undefined : stampTaken(action.kind, opts.body),
      form: isForm ? storeForm(opts.body as FormData) : undefined,
      fingerprint,
    });
  }
  if (queueAhead) void flushOutbox();
  throw new QueuedError();
}

/** Sends one stored entry exactly as it was first tried: same path, body and key. */
export async function sendEntry(entry: OutboxEntry): Promise<void> {
  await request(entry.path, {
    method: entry.method,
    body: entry.form ? toFormData(entry.form) : entry.body,
    headers: { 'Idempotency-Key': entry.key },
  });
}

/** Sends the signed-in person's waiting entries; nothing when signed out (they wait for the next sign-in). */
export async function flushOutbox() {
  const owner = tokenOwner(currentToken());
  if (!owner) return { sent: 0, refused: 0, waiting: 0 };
  return outbox.flush(owner, sendEntry);
}
