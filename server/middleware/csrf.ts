import type { Request, RequestHandler, Response } from 'express';
import { createHmac, timingSafeEqual } from 'node:crypto';
import { csrfSync } from 'csrf-sync';
import type { AppConfig } from '../config';

export const CSRF_COOKIE = 'hearthswap.csrf';

/** Routes that compute and change nothing: callable without a CSRF token (anonymous API use), and anonymously without a session. */
const COMPUTE_ROUTES = new Set(['/api/analyze', '/api/rewrite', '/api/targets/estimate']);

export function isComputeRoute(req: Request): boolean {
  return COMPUTE_ROUTES.has(req.originalUrl.split('?')[0]);
}

export function readCookie(req: Request, name: string): string | undefined {
  for (const part of (req.headers.cookie ?? '').split(';')) {
    const eq = part.indexOf('=');
    if (eq > 0 && part.slice(0, eq).trim() === name) return decodeURIComponent(part.slice(eq + 1).trim());
  }
  return undefined;
}

/**
 * Synchroniser-token CSRF protection (csrf-sync) whose token lives in the session for a signed-in
 * user. An anonymous visitor has no stored session: their token travels in a signed, HttpOnly
 * cookie instead, so asking for a token never writes a session row; signing in moves it into the
 * session. Either way a request must carry the token in X-CSRF-Token, which a cross-site form or
 * image cannot set.
 */
export function createCsrf(config: AppConfig) {
  const sign = (token: string) => createHmac('sha256', config.sessionSecret).update(`csrf:${token}`).digest('base64url');
  const anonymousToken = (req: Request): string | undefined => {
    const raw = readCookie(req, CSRF_COOKIE);
    const dot = raw?.lastIndexOf('.') ?? -1;
    if (!raw || dot <= 0) return undefined;
    const token = raw.slice(0, dot);
    const given = Buffer.from(raw.slice(dot + 1));
    const expected = Buffer.from(sign(token));
    return given.length === expected.length && timingSafeEqual(given, expected) ? token : undefined;
  };
  const setAnonymousCookie = (req: Request, res: Response, token: string) => {
    res.cookie(CSRF_COOKIE, `${token}.${sign(token)}`, {
      httpOnly: true,
      sameSite: 'lax',
      secure: config.secureCookies === 'auto' ? req.secure : config.secureCookies,
      path: '/',
    });
  };

  const { generateToken, csrfSynchronisedProtection } = csrfSync({
    getTokenFromRequest: (req) => req.headers['x-csrf-token'] as string | undefined,
    getTokenFromState: (req) => (req.user ? req.session.csrfToken : anonymousToken(req)),
    storeTokenInState: (req, token) => {
      if (req.user) req.session.csrfToken = token;
      else if (token && req.res) setAnonymousCookie(req, req.res, token);
    },
  });

  const protect: RequestHandler = (req, res, next) => (isComputeRoute(req) ? next() : csrfSynchronisedProtection(req, res, next));

  return {
    protect,
    generateToken: (req: Request) => generateToken(req),
    /** After sign-in: the token the visitor already holds stays valid, now kept in their session. */
    adoptAnonymousToken(req: Request, res: Response) {
      const token = anonymousToken(req);
      if (token && !req.session.csrfToken) req.session.csrfToken = token;
      res.clearCookie(CSRF_COOKIE, { path: '/' });
    },
  };
}

export type Csrf = ReturnType<typeof createCsrf>;
