import rateLimit, { ipKeyGenerator } from 'express-rate-limit';
import type { Request, RequestHandler } from 'express';
import type { RateLimitConfig } from '../config';

const FIFTEEN_MINUTES = 15 * 60 * 1000;
const HOUR = 60 * 60 * 1000;

function tooMany(message: string) {
  return { error: { code: 'rate_limited', message } };
}

const ipKey = (req: Request) => ipKeyGenerator(req.ip ?? '0.0.0.0');

export function createRateLimits(limits: RateLimitConfig) {
  const loginFailuresByIp = rateLimit({
    windowMs: FIFTEEN_MINUTES,
    limit: limits.loginFailuresPer15Min,
    skipSuccessfulRequests: true,
    keyGenerator: ipKey,
    standardHeaders: 'draft-8',
    legacyHeaders: false,
    message: tooMany('Too many failed sign-ins from this address. Wait 15 minutes and try again.'),
  });
  const loginFailuresByAccount = rateLimit({
    windowMs: FIFTEEN_MINUTES,
    limit: limits.loginFailuresPer15Min,
    skipSuccessfulRequests: true,
    keyGenerator: (req) => `account:${String(req.body?.email ?? '').trim().toLowerCase()}`,
    standardHeaders: 'draft-8',
    legacyHeaders: false,
    message: tooMany('Too many failed sign-ins for this account. Wait 15 minutes and try again.'),
  });
  const signups = rateLimit({
    windowMs: HOUR,
    limit: limits.signupsPerHour,
    keyGenerator: ipKey,
    standardHeaders: 'draft-8',
    legacyHeaders: false,
    message: tooMany('Too many new accounts from this address. Try again in an hour.'),
  });
  /** Analysis and rewrites: generous for signed-in users, tighter for anonymous use. */
  const compute: RequestHandler = rateLimit({
    windowMs: 60 * 1000,
    limit: (req) => (req.user ? limits.userComputePerMin : limits.anonymousComputePerMin),
    keyGenerator: (req) => (req.user ? `user:${req.user.id}` : ipKey(req)),
    standardHeaders: 'draft-8',
    legacyHeaders: false,
    message: tooMany('Too many requests in a minute. Slow down a little, or sign in for a higher limit.'),
  });
  /** Each import parses a file and matches every line: kept to a cook's pace, not a script's. */
  const recipeImports: RequestHandler = rateLimit({
    windowMs: HOUR,
    limit: limits.recipeImportsPerHour,
    keyGenerator: (req) => (req.user ? `user:${req.user.id}` : ipKey(req)),
    standardHeaders: 'draft-8',
    legacyHeaders: false,
    message: tooMany('Too many recipe imports in an hour. Try again later, or paste the recipe instead.'),
  });
  return { login: [loginFailuresByIp, loginFailuresByAccount], signups, compute, recipeImports };
}

export type RateLimits = ReturnType<typeof createRateLimits>;
