/**
 * The API's contract with its clients: the error body and its codes, and the list envelope.
 * Resource shapes (DTOs) live beside their resource in shared/types/<resource>.ts and are re-exported here,
 * so one import gives a client or a test everything a response can hold.
 */
export type * from '@/shared/types/board';
export type * from '@/shared/types/readings';
export type * from '@/shared/types/register';
export type * from '@/shared/types/tags';
export type * from '@/shared/types/team';
export type { User, SignInResponse } from '@/shared/types/user';

/** Every `error.code` the API answers with, and the two the client makes up itself (`offline`, `http-error`). */
export type ErrorCode =
  // 400: the request itself is wrong (path, query, upload)
  | 'bad-request' | 'bad-id' | 'bad-query' | 'bad-filter' | 'bad-layout' | 'bad-system' | 'bad-upload'
  | 'file-missing' | 'unexpected-file' | 'no-selection' | 'link-invalid' | 'entity.parse.failed'
  // 401, 403, 404
  | 'unauthenticated' | 'invalid-credentials' | 'forbidden' | 'not-found' | 'no-such-label' | 'photo-file-missing'
  // 409: the record is not in a state that allows it
  | 'conflict' | 'already-cleared' | 'already-holder' | 'already-joined' | 'archived' | 'email-taken' | 'inactive'
  | 'last-admin' | 'own-tag' | 'self' | 'visit-in-progress' | 'visit-ended'
  | 'not-an-isolation' | 'offer-open' | 'no-open-offer' | 'offer-lapsed' | 'acknowledge-first' | 'nothing-to-acknowledge'
  // 413, 415, 422: what was sent cannot be used
  | 'file-too-large' | 'entity.too.large' | 'too-many-labels' | 'unsupported-image' | 'invalid' | 'image-too-large' | 'unreadable-image'
  | 'undecided-tags' | 'idempotency-key-reused'
  // 429, 5xx
  | 'rate-limited' | 'server-error' | 'unavailable' | 'busy'
  // made up by the client when there is no answer to read
  | 'offline' | 'queued' | 'http-error' | 'bad-url';

/** Field messages keyed by the field's path, as yup names it (`reason`, `points[0].method`, `attributes.capacityL`). */
export type FieldErrors = Record<string, string>;

export interface ApiErrorBody {
  error: { code: ErrorCode; message: string; fields?: FieldErrors };
}

export interface ListResponse<T> {
  items: T[];
  total: number;
  page: number;
  pageSize: number;
}
