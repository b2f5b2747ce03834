import type { RequestHandler } from 'express';
import passport from 'passport';
import { Strategy as LocalStrategy } from 'passport-local';
import { User } from '../models';
import { verifyCredentials } from '../services/users';
import { forbidden, unauthorized } from '../lib/http-error';
import type { UserRole } from '../../shared/schemas/auth';

declare global {
  // eslint-disable-next-line @typescript-eslint/no-namespace
  namespace Express {
    // eslint-disable-next-line @typescript-eslint/no-empty-object-type
    interface User extends InstanceType<typeof import('../models/user').User> {}
  }
}

let configured = false;

export function configurePassport() {
  if (configured) return passport;
  configured = true;
  passport.use(
    new LocalStrategy({ usernameField: 'email', passwordField: 'password' }, (email, password, done) => {
      verifyCredentials(email, password).then((user) => done(null, user ?? false), done);
    }),
  );
  passport.serializeUser((user, done) => done(null, (user as User).id));
  passport.deserializeUser((id: number, done) => {
    User.findByPk(id).then((user) => done(null, user ?? false), done);
  });
  return passport;
}

export const requireAuth: RequestHandler = (req, _res, next) => {
  next(req.user ? undefined : unauthorized());
};

export function requireRole(...roles: UserRole[]): RequestHandler {
  return (req, _res, next) => {
    if (!req.user) return next(unauthorized());
    next(roles.includes(req.user.role) ? undefined : forbidden('Your role does not allow this.'));
  };
}
