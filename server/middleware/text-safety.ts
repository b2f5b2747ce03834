import type { RequestHandler } from 'express';
import { findUnsafeText } from '../../shared/text-safety';
import { HttpError } from '../lib/http-error';

/** Throws the same 400 as a zod failure when any string in `value` holds a NUL or a lone surrogate. */
export function assertSafeText(value: unknown, root = '') {
  const found = findUnsafeText(value, root);
  if (!found) return;
  throw new HttpError(400, 'validation_failed', `${found.field}: ${found.message}`, { fieldErrors: { [found.field]: [found.message] }, formErrors: [] });
}

/** Every JSON body and query string, once for all routes (file contents are checked where they are read). */
export const rejectUnsafeText: RequestHandler = (req, _res, next) => {
  assertSafeText(req.query);
  assertSafeText(req.body);
  next();
};
