import type { RequestHandler } from 'express';
import type { AnySchema } from 'yup';

/** Validates and casts the JSON body with a shared yup schema; unknown keys are dropped. */
export const validate =
  (schema: AnySchema): RequestHandler =>
  async (req, _res, next) => {
    try {
      req.body = await schema.validate(req.body ?? {}, { abortEarly: false, stripUnknown: true });
      next();
    } catch (err) {
      next(err);
    }
  };
