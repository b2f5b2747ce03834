import type { Request, RequestHandler } from 'express';
import passport from 'passport';
import { Strategy as LocalStrategy } from 'passport-local';
import { User } from '../models';
import { verifyCredentials } from '../services/users';
import { forbidden, unauthorized } from '../lib/http-error';
import type { UserRole } from '../../shared/schemas/auth';
import { userRowReadWithSession } from './session-store';

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
  passport.deserializeUser((req: Request, id: number, done: (err: unknown, user?: Express.User | false) => void) => {
    // the session store read the user with the session (session-store.ts); a session from another store asks here
    const row = userRowReadWithSession(req.session, id);
    if (row) return done(null, userFromRow(row));
    User.findByPk(id).then((user) => done(null, user ?? false), done);
  });
  return passport;
}

/** A User instance from a users row as PostgreSQL gives it (column names), as findByPk would build it. */
export function userFromRow(row: Record<string, unknown>): User {
  const values: Record<string, unknown> = {};
  for (const [name, attribute] of Object.entries(User.getAttributes())) values[name] = row[attribute.field ?? name];
  return User.build(values as InstanceType<typeof User>['_creationAttributes'], { isNewRecord: false, raw: true });
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
