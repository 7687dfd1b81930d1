import type { RequestHandler } from 'express';
import multer from 'multer';
import { HttpError } from '@/server/lib/http-error';

/**
 * One file in one multipart field, kept in memory up to maxBytes. Multer's own errors become
 * answers that say what to do (413 for size, 400 for the wrong field or more than one file).
 */
export function singleFileUpload(field: string, maxBytes: number, what: string): RequestHandler {
  const upload = multer({ storage: multer.memoryStorage(), limits: { fileSize: maxBytes, files: 1, fields: 10, parts: 12 } }).single(field);
  return (req, res, next) => {
    upload(req, res, (err: unknown) => {
      if (!err) return next();
      if (err instanceof multer.MulterError) {
        if (err.code === 'LIMIT_FILE_SIZE') {
          return next(new HttpError(413, 'file-too-large', `The ${what} is larger than ${Math.round(maxBytes / 1024 / 1024)} MB.`));
        }
        if (err.code === 'LIMIT_UNEXPECTED_FILE' || err.code === 'LIMIT_FILE_COUNT') {
          return next(new HttpError(400, 'unexpected-file', `Send one file, in the form field "${field}".`));
        }
        return next(new HttpError(400, 'bad-upload', `The upload could not be read (${err.message}).`));
      }
      // Anything else here comes from reading the multipart body (busboy), so it is the request's fault.
      next(new HttpError(400, 'bad-upload', 'The upload could not be read; send it as multipart/form-data.'));
    });
  };
}

/** The uploaded file, or a 400 naming the field when none came. */
export function requireFile(req: { file?: Express.Multer.File }, field: string, what: string): Express.Multer.File {
  if (!req.file) throw new HttpError(400, 'file-missing', `Attach the ${what} in the form field "${field}".`, { [field]: `Attach the ${what}.` });
  return req.file;
}
