import { createHash, randomBytes } from 'node:crypto';
import type { Request, RequestHandler, Response } from 'express';
import type pg from 'pg';
import { RateLimiterMemory, RateLimiterPostgres, RateLimiterRes, type RateLimiterAbstract } from 'rate-limiter-flexible';
import type { RateLimitConfig } from '../config';
import { HttpError } from '../lib/http-error';
import { LeasedCounter, type RequestCounter } from './leased-counter';

const MINUTE = 60;
const FIFTEEN_MINUTES = 15 * MINUTE;
const HOUR = 60 * MINUTE;
const DAY = 24 * HOUR;

/** Signed cookie naming the accounts that signed in from this browser before. */
export const KNOWN_DEVICE_COOKIE = 'hearthswap.device';
const KNOWN_DEVICE_MAX_ACCOUNTS = 5;

/**
 * Counters live in PostgreSQL (table rate_limits, migration 0005) so every app process on the
 * database counts together. While the database is away each process counts alone in memory
 * (rate-limiter-flexible's insurance limiter) rather than refusing or waving everything through.
 */
function counter(pool: pg.Pool, keyPrefix: string, points: number, duration: number, blockInMemory = false): RateLimiterAbstract {
  return new RateLimiterPostgres({
    storeClient: pool,
    storeType: 'pool',
    tableName: 'rate_limits',
    tableCreated: true,
    keyPrefix,
    points,
    duration,
    // once a key is over its limit, this process answers 429 without asking the database again
    inMemoryBlockOnConsumed: blockInMemory ? points + 1 : 0,
    insuranceLimiter: new RateLimiterMemory({ keyPrefix, points, duration }),
  });
}

/** A twentieth of the limit, 1 to 10 points: a key on several processes loses little of its limit to unused leases. */
export function leaseBlock(points: number): number {
  return Math.max(1, Math.min(10, Math.floor(points / 20)));
}

function tooMany(res: Response, msBeforeNext: number, message: string): never {
  res.setHeader('Retry-After', String(Math.max(1, Math.ceil(msBeforeNext / 1000))));
  throw new HttpError(429, 'rate_limited', message);
}

/** A fixed window of `points` requests per key, with RateLimit-* headers. */
function perRequest(limiter: RequestCounter, key: (req: Request) => string, message: string): RequestHandler {
  return (req, res, next) => {
    limiter.consume(key(req)).then(
      (r) => {
        res.setHeader('RateLimit-Limit', String(limiter.points));
        res.setHeader('RateLimit-Remaining', String(r.remainingPoints));
        res.setHeader('RateLimit-Reset', String(Math.ceil(r.msBeforeNext / 1000)));
        next();
      },
      (rejection: unknown) => {
        if (!(rejection instanceof RateLimiterRes)) return next(rejection);
        try {
          tooMany(res, rejection.msBeforeNext, message);
        } catch (error) {
          next(error);
        }
      },
    );
  };
}

const address = (req: Request) => req.ip ?? '0.0.0.0';
const accountTag = (email: string) => createHash('sha256').update(email.trim().toLowerCase()).digest('hex').slice(0, 16);

interface KnownDevice {
  id: string;
  accounts: string[];
}

function readKnownDevice(req: Request): KnownDevice | null {
  const raw: unknown = req.signedCookies?.[KNOWN_DEVICE_COOKIE];
  if (typeof raw !== 'string') return null;
  const [id, ...accounts] = raw.split('~');
  return /^[a-f0-9]{32}$/.test(id) ? { id, accounts: accounts.filter((a) => /^[a-f0-9]{16}$/.test(a)) } : null;
}

/** Marks this browser as one the account signed in from (a sign-in or a sign-up): past the account-wide and address-wide limits it may still try. */
function rememberBrowser(secureCookies: boolean | 'auto') {
  return function remember(req: Request, res: Response, email: string) {
    const tag = accountTag(email);
    const device = readKnownDevice(req);
    const id = device?.id ?? randomBytes(16).toString('hex');
    const accounts = [tag, ...(device?.accounts ?? []).filter((t) => t !== tag)].slice(0, KNOWN_DEVICE_MAX_ACCOUNTS);
    res.cookie(KNOWN_DEVICE_COOKIE, [id, ...accounts].join('~'), {
      signed: true,
      httpOnly: true,
      sameSite: 'lax',
      secure: secureCookies === 'auto' ? req.secure : secureCookies,
      maxAge: 365 * DAY * 1000,
      path: '/api/auth',
    });
  };
}

function exhausted(limiter: RateLimiterAbstract, r: RateLimiterRes | null) {
  return r !== null && r.consumedPoints >= limiter.points;
}

/**
 * Sign-in limits that slow guessing without handing anyone a lockout:
 * - per account and address (or per account and known device): `loginFailuresPer15Min` failures,
 *   then that pair waits; someone guessing from elsewhere does not stop the owner;
 * - per account from anywhere (`loginFailuresPerAccountPerDay`) and per address across accounts
 *   (`loginFailuresPerAddressPerHour`, password spraying): past these only browsers the account
 *   signed in from before (a signed cookie set at each successful sign-in) may still try, so a
 *   distributed guess or one bad actor behind a shared address (a gym, an office) locks out no
 *   one who has signed in there before.
 * The decision is made before the password is checked, so a refusal says nothing about it.
 */
function signInGuard(pool: pg.Pool, limits: RateLimitConfig, scope: string, remember: ReturnType<typeof rememberBrowser>) {
  const pair = counter(pool, `${scope}:login-pair`, limits.loginFailuresPer15Min, FIFTEEN_MINUTES);
  const account = counter(pool, `${scope}:login-account`, limits.loginFailuresPerAccountPerDay, DAY);
  const from = counter(pool, `${scope}:login-address`, limits.loginFailuresPerAddressPerHour, HOUR);

  return async function begin(req: Request, res: Response, email: string) {
    const tag = accountTag(email);
    const device = readKnownDevice(req);
    const known = device?.accounts.includes(tag) ?? false;
    const pairKey = known ? `${tag}:device:${device!.id}` : `${tag}:${address(req)}`;
    const [p, a, f] = await Promise.all([pair.get(pairKey), account.get(tag), from.get(address(req))]);
    if (exhausted(pair, p))
      tooMany(res, p!.msBeforeNext, 'Too many failed sign-ins for this account from here. Wait 15 minutes and try again, or reset your password.');
    if (!known && exhausted(account, a)) {
      tooMany(res, a!.msBeforeNext, 'This account had too many failed sign-ins today. Sign in from a browser you used before, or reset your password.');
    }
    if (!known && exhausted(from, f)) {
      tooMany(res, f!.msBeforeNext, 'Too many failed sign-ins from this network. Sign in from a browser you used before, or wait an hour.');
    }
    return {
      async failed() {
        await Promise.all([pair.penalty(pairKey), account.penalty(tag), from.penalty(address(req))]);
      },
      async succeeded() {
        await pair.delete(pairKey);
        remember(req, res, email);
      },
    };
  };
}

export function createRateLimits(pool: pg.Pool, limits: RateLimitConfig, secureCookies: boolean | 'auto' = 'auto') {
  const scope = limits.scope;
  const signups = perRequest(
    counter(pool, `${scope}:signups`, limits.signupsPerHour, HOUR, true),
    address,
    'Too many new accounts from this address. Try again in an hour.',
  );
  // Analysis runs as the cook types: its counters hand out points leased in blocks, so a request
  // does not wait for PostgreSQL (leased-counter.ts); the limit still counts every process.
  const anonymous = new LeasedCounter(
    counter(pool, `${scope}:compute-anonymous`, limits.anonymousComputePerMin, MINUTE, true),
    leaseBlock(limits.anonymousComputePerMin),
  );
  const signedIn = new LeasedCounter(counter(pool, `${scope}:compute-user`, limits.userComputePerMin, MINUTE, true), leaseBlock(limits.userComputePerMin));
  const message = 'Too many requests in a minute. Slow down a little, or sign in for a higher limit.';
  const anonymousCompute = perRequest(anonymous, address, message);
  const userCompute = perRequest(signedIn, (req) => String(req.user!.id), message);
  /** Analysis and rewrites: generous for signed-in users, tighter for anonymous use. */
  const compute: RequestHandler = (req, res, next) => (req.user ? userCompute : anonymousCompute)(req, res, next);
  /** Each import parses a file and matches every line: kept to a cook's pace, not a script's. */
  const recipeImports = perRequest(
    counter(pool, `${scope}:recipe-imports`, limits.recipeImportsPerHour, HOUR, true),
    (req) => (req.user ? `user:${req.user.id}` : address(req)),
    'Too many recipe imports in an hour. Try again later, or paste the recipe instead.',
  );
  const knownBrowser = rememberBrowser(secureCookies);
  return { signIn: signInGuard(pool, limits, scope, knownBrowser), knownBrowser, signups, compute, recipeImports };
}

export type RateLimits = ReturnType<typeof createRateLimits>;
