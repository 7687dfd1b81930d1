/** What can wait on the device for a signal: the actions an engineer takes at the plant. */
export type OutboxKind = 'raise-tag' | 'tag-note' | 'tag-clear' | 'tag-extend' | 'tag-handover' | 'tag-prove' | 'tag-acknowledge' | 'tag-photo' | 'reading' | 'photo';

/** A form field as stored: text, or a file kept as a Blob (FormData itself cannot be stored). */
export type StoredFormField = [name: string, value: string | { blob: Blob; fileName: string }];

export interface OutboxAction {
  kind: OutboxKind;
  /** Said to the person in the pending list, e.g. "Raise isolation tag on B-01". */
  summary: string;
  assetId?: number;
  tagId?: number;
}

export interface OutboxEntry extends OutboxAction {
  /** Also the Idempotency-Key: every attempt sends the same one, so the server acts once. */
  key: string;
  /** Order of creation: entries are sent oldest first. */
  seq: number;
  /** `organisation:user` of the person who took the action; only their session sends it. */
  owner: string;
  method: 'POST' | 'PATCH' | 'PUT';
  path: string;
  body?: unknown;
  form?: StoredFormField[];
  /** Method, path and body as first submitted: the same action submitted again while this waits is not added twice. */
  fingerprint?: string;
  createdAt: string;
  state: 'waiting' | 'refused';
  attempts: number;
  /** The server's answer when it refused the action; kept until the person removes the entry. */
  refusal?: { status: number; code: string; message: string };
}

/** Where entries live between visits (IndexedDB on the web). */
export interface OutboxStore {
  all(): Promise<OutboxEntry[]>;
  put(entry: OutboxEntry): Promise<void>;
  remove(key: string): Promise<void>;
}
