import * as yup from 'yup';
import { parseId } from '@/shared/rules/ids';
import { DEFAULT_PAGE_SIZE, MAX_PAGE, MAX_PAGE_SIZE } from '@/shared/rules/paging';

/**
 * Pieces of request contracts for paths and query strings. A route names its schemas once:
 *   validate({ params: idParams, query: pagingQuery, body: siteSchema })
 * A path or query that fails answers 400 naming the parameter; a body that fails answers 422 with its fields.
 */

const absent = (raw: unknown) => raw === undefined || raw === null || raw === '';

/** A record id (shared/rules/ids.ts); optional unless `.required()`. */
export const idField = (name = 'id') =>
  yup.number()
    .transform((_value, raw) => (absent(raw) ? undefined : parseId(raw) ?? Number.NaN))
    .typeError(`${name} must be a positive whole number.`);

/** A whole number written in plain digits (a page number, a count). */
const wholeField = (name: string) =>
  yup.number()
    .transform((_value, raw) => (absent(raw) ? undefined : typeof raw === 'string' && /^\s*[0-9]{1,9}\s*$/.test(raw) ? Number(raw) : typeof raw === 'number' && Number.isSafeInteger(raw) ? raw : Number.NaN))
    .typeError(`${name} must be a whole number.`);

/** `/:id` */
export const idParams = yup.object({ id: idField().required() });

/** `?page=&pageSize=`: the page must exist within reason; a page size over the cap is cut to the cap. */
export const pagingQuery = yup.object({
  page: wholeField('page').min(1, 'page starts at 1.').max(MAX_PAGE, `page must be at most ${MAX_PAGE}.`).default(1),
  pageSize: wholeField('pageSize').min(1, 'pageSize must be at least 1.').transform((v: number) => (Number.isFinite(v) ? Math.min(v, MAX_PAGE_SIZE) : v)).default(DEFAULT_PAGE_SIZE),
});

/** An optional choice from a fixed list in a query string (`?kind=isolation`). */
export const oneOfField = <T extends string>(name: string, values: readonly T[]) =>
  yup.mixed<T>()
    .transform((value) => (absent(value) ? undefined : value))
    .oneOf([...values, undefined] as T[], `${name} must be one of ${values.join(', ')}.`);

/** Free text in a query string (a search), trimmed and cut to `max` characters. */
export const searchField = (max = 100) =>
  yup.string().transform((value, raw) => (typeof raw === 'string' ? raw.trim().slice(0, max) : '')).default('');
