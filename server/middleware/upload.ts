import type { RequestHandler } from 'express';
import multer from 'multer';
import { HttpError, badRequest } from '../lib/http-error';

/** One file in memory from form field `field`, with multer's errors mapped to ours: too large → 413, anything else → 400. */
export function singleFile(maxBytes: number, what: string, field = 'file'): RequestHandler {
  const upload = multer({ storage: multer.memoryStorage(), limits: { fileSize: maxBytes, files: 1 } }).single(field);
  return (req, res, next) =>
    upload(req, res, (error: unknown) => {
      if (!error) return next();
      if (error instanceof multer.MulterError && error.code === 'LIMIT_FILE_SIZE') {
        return next(new HttpError(413, 'payload_too_large', `The ${what} is larger than ${(maxBytes / 1024 / 1024).toFixed(0)} MB.`));
      }
      if (error instanceof multer.MulterError)
        return next(badRequest(`${field}: ${error.message}. Send one file in the form field "${field}".`, { fieldErrors: { [field]: [error.message] } }));
      next(error);
    });
}
