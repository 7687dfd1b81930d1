import { RequestError } from '@/hooks/api/request';
import type { OutboxAction, OutboxEntry, OutboxStore, StoredFormField } from '@/hooks/offline/outbox-types';

export interface NewOutboxEntry extends OutboxAction {
  key: string;
  owner: string;
  method: OutboxEntry['method'];
  path: string;
  body?: unknown;
  form?: StoredFormField[];
  fingerprint?: string;
}

export interface FlushResult {
  sent: number;
  refused: number;
  /** Entries still waiting because the server could not be reached or asked us to come back later. */
  waiting: number;
}

/**
 * An answer that will not change by sending again: the rules refused the action (422), the record is gone (404),
 * someone else changed it (409). Not: no signal (0), an expired session (401), a timeout (408), too many
 * requests (429) or a server fault (5xx) — those stay waiting and are sent again later, in the same order.
 */
export function isRefusal(err: unknown): err is RequestError {
  return err instanceof RequestError && err.status >= 400 && err.status < 500 && ![401, 408, 429].includes(err.status);
}

/** Actions taken with no signal, kept durably and sent oldest first with their idempotency keys. */
export class Outbox {
  private entries: OutboxEntry[] = [];
  private loaded: Promise<void> | null = null;
  private flushing: Promise<FlushResult> | null = null;
  private listeners = new Set<() => void>();

  constructor(private readonly store: OutboxStore) {}

  /** Reads what an earlier visit left (after a reload or a new sign-in). */
  load(): Promise<void> {
    this.loaded ??= this.store.all().then((all) => {
      this.entries = all.sort((a, b) => a.seq - b.seq);
      this.changed();
    });
    return this.loaded;
  }

  /** The current entries, oldest first; the same array until something changes. */
  snapshot = (): readonly OutboxEntry[] => this.entries;

  subscribe = (listener: () => void) => {
    this.listeners.add(listener);
    return () => { this.listeners.delete(listener); };
  };

  /** Adds an action; the same key twice (a second tap, a retry) keeps the one entry. */
  async add(input: NewOutboxEntry): Promise<OutboxEntry> {
    await this.load();
    const existing = this.entries.find((e) => e.key === input.key);
    if (existing) return existing;
    const seq = Math.max(Date.now(), (this.entries.at(-1)?.seq ?? 0) + 1);
    const entry: OutboxEntry = { ...input, seq, createdAt: new Date().toISOString(), state: 'waiting', attempts: 0 };
    await this.store.put(entry);
    this.entries = [...this.entries, entry];
    this.changed();
    return entry;
  }

  /** Removes an entry the person chose to give up (a refused one, usually). */
  async remove(key: string): Promise<void> {
    await this.load();
    await this.store.remove(key);
    this.entries = this.entries.filter((e) => e.key !== key);
    this.changed();
  }

  /** Puts a refused entry back in line, e.g. after the person fixed the cause on another device. */
  async retry(key: string): Promise<void> {
    const entry = this.entries.find((e) => e.key === key);
    if (entry) await this.replace({ ...entry, state: 'waiting', refusal: undefined });
  }

  /**
   * Sends `owner`'s waiting entries oldest first. A refusal stays on its entry with the server's message and the
   * next entry is tried; no signal, an expired session or a server fault stops the run and keeps the rest in order.
   */
  flush(owner: string, send: (entry: OutboxEntry) => Promise<void>): Promise<FlushResult> {
    this.flushing ??= this.run(owner, send).finally(() => { this.flushing = null; });
    return this.flushing;
  }

  private async run(owner: string, send: (entry: OutboxEntry) => Promise<void>): Promise<FlushResult> {
    await this.load();
    const result: FlushResult = { sent: 0, refused: 0, waiting: 0 };
    const queue = this.entries.filter((e) => e.owner === owner && e.state === 'waiting');
    for (let i = 0; i < queue.length; i += 1) {
      const entry = queue[i];
      try {
        await send(entry);
        await this.store.remove(entry.key);
        this.entries = this.entries.filter((e) => e.key !== entry.key);
        this.changed();
        result.sent += 1;
      } catch (err) {
        if (isRefusal(err)) {
          await this.replace({ ...entry, attempts: entry.attempts + 1, state: 'refused', refusal: { status: err.status, code: err.code, message: err.message } });
          result.refused += 1;
          continue;
        }
        await this.replace({ ...entry, attempts: entry.attempts + 1 });
        result.waiting = queue.length - i;
        break;
      }
    }
    return result;
  }

  private async replace(entry: OutboxEntry) {
    await this.store.put(entry);
    this.entries = this.entries.map((e) => (e.key === entry.key ? entry : e));
    this.changed();
  }

  private changed() {
    for (const l of this.listeners) l();
  }
}
