import { Router, type Request, type Response } from 'express';
import type { Sequelize } from 'sequelize';
import type { Csrf } from '../middleware/csrf';
import passport from 'passport';
import { changePasswordSchema, deleteAccountSchema, loginSchema, registerSchema, updateMeSchema } from '../../shared/schemas/auth';
import { passwordResetConfirmSchema, passwordResetRequestSchema } from '../../shared/schemas/coaching';
import { confirmPasswordReset, requestPasswordResetInBackground } from '../services/password-reset';
import type { Mailer } from '../mail';
import { parse } from '../middleware/validate';
import { requireAuth } from '../middleware/auth';
import { createUser, updateProfile, type User } from '../services/users';
import { changePassword, deleteAccount } from '../services/account';
import type { S3Config } from '../config';
import { registerFromInvitation } from '../services/invitations';
import { HttpError } from '../lib/http-error';
import type { RateLimits } from '../middleware/rate-limits';

export function authRouter({
  sequelize,
  limits,
  csrf,
  mail,
  s3,
}: {
  sequelize: Sequelize;
  s3: S3Config | null;
  limits: RateLimits;
  csrf: Csrf;
  mail: { mailer: Mailer; appUrl: string };
}) {
  const router = Router();

  function logIn(req: Request, res: Response, user: User) {
    // passport regenerates the session id on login; keepSessionInfo carries session data across,
    // and the visitor's anonymous CSRF token moves into the session.
    return new Promise<void>((resolve, reject) => {
      req.login(user, { session: true, keepSessionInfo: true }, (error) => {
        if (error) return reject(error);
        csrf.adoptAnonymousToken(req, res);
        resolve();
      });
    });
  }

  router.get('/csrf', (req, res) => {
    res.json({ token: csrf.generateToken(req) });
  });

  router.post('/register', limits.signups, async (req, res) => {
    const input = parse(registerSchema, req.body);
    const user = input.invitationToken ? (await registerFromInvitation(sequelize, input, input.invitationToken)).user : await createUser(input);
    limits.knownBrowser(req, res, user.email);
    await logIn(req, res, user);
    res.status(201).json(user.toPublic());
  });

  router.post('/login', async (req, res) => {
    const input = parse(loginSchema, req.body);
    req.body = input;
    const attempt = await limits.signIn(req, res, input.email);
    const user = await new Promise<User | false>((resolve, reject) => {
      passport.authenticate('local', { session: false }, (error: unknown, found: User | false) => (error ? reject(error) : resolve(found)))(req, res, reject);
    });
    if (!user) {
      await attempt.failed();
      throw new HttpError(401, 'invalid_credentials', 'That e-mail and password do not match an account.');
    }
    await attempt.succeeded();
    await logIn(req, res, user);
    res.json(user.toPublic());
  });

  router.post('/logout', (req, res, next) => {
    req.logout((error) => {
      if (error) return next(error);
      req.session.destroy(() => {
        res.clearCookie('hearthswap.sid');
        res.status(204).end();
      });
    });
  });

  router.post('/password-reset', limits.signups, async (req, res) => {
    const { email } = parse(passwordResetRequestSchema, req.body);
    requestPasswordResetInBackground(email, mail);
    res.status(202).json({ ok: true, message: 'If that address has an account, a reset link is on its way.' });
  });

  router.post('/password-reset/confirm', async (req, res) => {
    const { token, password } = parse(passwordResetConfirmSchema, req.body);
    await confirmPasswordReset(sequelize, token, password, req.sessionID ?? null);
    res.json({ ok: true });
  });

  // The client's question "who is signed in?": answered 200 either way, so a signed-out visit
  // has no failed request in it. GET /me keeps the contract's 401.
  router.get('/session', (req, res) => {
    res.json({ user: req.user ? req.user.toPublic() : null });
  });

  router.get('/me', requireAuth, (req, res) => {
    res.json(req.user!.toPublic());
  });

  router.patch('/me', requireAuth, async (req, res) => {
    const input = parse(updateMeSchema, req.body);
    const user = await updateProfile(req.user!.id, input);
    res.json(user.toPublic());
  });

  router.post('/password', requireAuth, async (req, res) => {
    const input = parse(changePasswordSchema, req.body);
    await changePassword(sequelize, req.user!.id, input.currentPassword, input.newPassword, req.sessionID ?? null);
    res.json({ ok: true });
  });

  router.delete('/me', requireAuth, async (req, res) => {
    const { password } = parse(deleteAccountSchema, req.body ?? {});
    await deleteAccount(sequelize, s3, req.user!.id, password);
    // the session row is gone already; drop this request's copy so it is not saved again
    req.session.destroy(() => {
      res.clearCookie('hearthswap.sid');
      res.status(204).end();
    });
  });

  return router;
}
