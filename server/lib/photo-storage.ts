/** Where photo files live. Keys are made by the server (`<organisationId>/<uuid>.jpg`), never by a client. */
export interface PhotoStorage {
  put(key: string, body: Buffer, contentType: string): Promise<void>;
  /** The stored bytes; throws PhotoNotStoredError when the key holds nothing. */
  get(key: string): Promise<Buffer>;
}

export class PhotoNotStoredError extends Error {
  constructor(key: string) {
    super(`No stored photo under ${key}`);
    this.name = 'PhotoNotStoredError';
  }
}

/** Only keys the server makes: segments of letters, digits, dot, dash and underscore, no `..`. */
export const SAFE_KEY = /^(?!.*\.\.)[A-Za-z0-9._-]+(\/[A-Za-z0-9._-]+)*$/;

export function assertSafeKey(key: string) {
  if (!SAFE_KEY.test(key)) throw new Error(`Unsafe storage key: ${JSON.stringify(key)}`);
}
