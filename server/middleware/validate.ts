import type { Request, RequestHandler } from 'express';
import { ValidationError, isSchema, type AnySchema } from 'yup';
import { HttpError } from '@/server/lib/http-error';
import { parseId as parseIdOrNull } from '@/shared/rules/ids';
import { fieldErrors } from '@/shared/schemas/field-errors';

interface RequestSchemas {
  params?: AnySchema;
  query?: AnySchema;
  body?: AnySchema;
}

const options = { abortEarly: false, stripUnknown: true } as const;

/** A path or query that fails is the request's fault (400, naming the parameter); a body that fails is the form's (422). */
async function check(schema: AnySchema, value: unknown, where: 'params' | 'query') {
  try {
    return await schema.validate(value ?? {}, options);
  } catch (err) {
    if (!(err instanceof ValidationError)) throw err;
    const fields = fieldErrors(err);
    throw new HttpError(400, where === 'params' ? 'bad-id' : 'bad-query', Object.values(fields)[0] ?? 'The request could not be understood.', fields);
  }
}

/**
 * The one request check: path, query and body against schemas from shared/, cast and with unknown keys dropped.
 *   router.get('/sites/:id/plant-rooms', signedIn, validate({ params: idParams, query: pagingQuery }), handler)
 * A bare schema is the body's (`validate(siteSchema)` means `validate({ body: siteSchema })`).
 */
export const validate = (schemas: RequestSchemas | AnySchema): RequestHandler => {
  const { params, query, body } = isSchema(schemas) ? { body: schemas as AnySchema } : (schemas as RequestSchemas);
  return async (req, _res, next) => {
    try {
      if (params) req.params = await check(params, req.params, 'params');
      // Express 5 makes req.query a getter; the checked values replace it on this request.
      if (query) Object.defineProperty(req, 'query', { value: await check(query, req.query, 'query'), writable: true, configurable: true, enumerable: true });
      if (body) req.body = await body.validate(req.body ?? {}, options);
      next();
    } catch (err) {
      next(err);
    }
  };
};

/** An id from a path or query, or 400 naming it (the rule is shared/rules/ids.ts). */
export function parseId(raw: unknown, name = 'id'): number {
  const id = parseIdOrNull(raw);
  if (id === null) throw new HttpError(400, 'bad-id', `${name} must be a positive whole number.`, { [name]: `${name} must be a positive whole number.` });
  return id;
}

/** An id in the path (`:id` by default), as `validate({ params: idParams })` left it; 400 when it is not an id. */
export const pathId = (req: Request, name = 'id'): number => parseId(req.params[name], name);

/** The query string as `validate({ query })` cast it. */
export const checkedQuery = <T>(req: Request) => req.query as unknown as T;
