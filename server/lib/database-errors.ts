import { ConnectionError } from 'sequelize';

/** SQLSTATE codes that mean "the server is going or gone", not "your query is wrong". */
const UNAVAILABLE_SQLSTATES = new Set(['57P01', '57P02', '57P03', '53300']);
const UNAVAILABLE_NODE_CODES = new Set(['ECONNREFUSED', 'ECONNRESET', 'EPIPE', 'ETIMEDOUT', 'ENOTFOUND', 'EHOSTUNREACH', 'EAI_AGAIN']);
const UNAVAILABLE_MESSAGES =
  /Connection terminated|connection error and is not queryable|timeout exceeded when trying to connect|Client was closed and is not queryable/i;

interface MaybeDriverError {
  code?: unknown;
  message?: unknown;
  parent?: unknown;
  original?: unknown;
  cause?: unknown;
}

/**
 * True when an error from Sequelize, pg or the session store means PostgreSQL cannot be reached
 * (stopped, restarting, refusing connections) rather than a bug or bad input.
 */
export function isDatabaseUnavailable(error: unknown, depth = 0): boolean {
  if (!error || typeof error !== 'object' || depth > 4) return false;
  if (error instanceof ConnectionError) return true;
  const e = error as MaybeDriverError;
  if (typeof e.code === 'string') {
    if (e.code.startsWith('08') || UNAVAILABLE_SQLSTATES.has(e.code) || UNAVAILABLE_NODE_CODES.has(e.code)) return true;
  }
  if (typeof e.message === 'string' && UNAVAILABLE_MESSAGES.test(e.message)) return true;
  return [e.parent, e.original, e.cause].some((inner) => inner !== error && isDatabaseUnavailable(inner, depth + 1));
}
