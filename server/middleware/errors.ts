import type { ErrorRequestHandler, RequestHandler } from 'express';
import { HttpError } from '../lib/http-error';
import { isDatabaseUnavailable } from '../lib/database-errors';

export const apiNotFound: RequestHandler = (req, res) => {
  res.status(404).json({ error: { code: 'not_found', message: `No API route ${req.method} ${req.path}.` } });
};

interface BodyParserError extends Error {
  type?: string;
  status?: number;
  code?: string;
}

export function errorHandler(log: (error: unknown) => void = console.error): ErrorRequestHandler {
  return (error: unknown, _req, res, _next) => {
    if (res.headersSent) return;
    if (error instanceof HttpError) {
      res.status(error.status).json({ error: { code: error.code, message: error.message, details: error.details } });
      return;
    }
    const e = error as BodyParserError;
    if (e?.type === 'entity.parse.failed') {
      res.status(400).json({ error: { code: 'malformed_json', message: 'The request body is not valid JSON.' } });
      return;
    }
    if (e?.type === 'entity.too.large') {
      res.status(413).json({ error: { code: 'payload_too_large', message: 'The request body is larger than 1 MB.' } });
      return;
    }
    if (e?.code === 'EBADCSRFTOKEN') {
      res.status(403).json({
        error: { code: 'csrf_invalid', message: 'The form expired or was not sent from Hearthswap; reload and try again.' },
      });
      return;
    }
    if (typeof e?.status === 'number' && e.status >= 400 && e.status < 500) {
      res.status(e.status).json({ error: { code: 'bad_request', message: e.message || 'Bad request.' } });
      return;
    }
    if (isDatabaseUnavailable(error)) {
      res.setHeader('Retry-After', '5');
      res.status(503).json({
        error: { code: 'database_unavailable', message: 'The database is not reachable just now. Nothing was changed; try again in a few seconds.' },
      });
      return;
    }
    log(error);
    res.status(500).json({ error: { code: 'internal', message: 'Something went wrong on our side. Nothing you saved was lost.' } });
  };
}
