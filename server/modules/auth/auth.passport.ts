import type { Request } from 'express';
import { Passport } from 'passport';
import { Strategy as LocalStrategy } from 'passport-local';
import type { SessionUser } from '../../session-user.js';
import type { AuthService } from './auth.service.js';

/** What a session stores: the user id and the account's session version at sign-in. */
export interface SessionRef {
  id: number;
  v: number;
}

/**
 * Reads the stored session reference. A bare number is a session made before session versions existed: it is
 * read as version 0, the value every account had then, so it keeps working until the password is next set.
 */
export function parseSessionRef(raw: unknown): SessionRef | null {
  if (typeof raw === 'number' && Number.isInteger(raw)) return { id: raw, v: 0 };
  if (typeof raw !== 'object' || raw === null) return null;
  const { id, v } = raw as { id?: unknown; v?: unknown };
  return Number.isInteger(id) && Number.isInteger(v) ? { id: id as number, v: v as number } : null;
}

/**
 * One Passport instance per app (passport's default export is a process-wide singleton, STACK.md trap 8).
 * The session stores only the user id and session version; the user is re-read on every request so role and
 * account changes apply at once, and a session whose version is older than the account's (the password was
 * set since) is signed out: the request goes on without a user, so protected routes answer 401.
 */
export function createPassport(auth: AuthService): InstanceType<typeof Passport> {
  const passport = new Passport();
  passport.use(
    new LocalStrategy({ usernameField: 'email', passwordField: 'password' }, (email, password, done) => {
      auth.verifyCredentials(email, password).then((user) => done(null, user ?? false), done);
    }),
  );
  passport.serializeUser((user, done) => done(null, { id: user.id, v: user.sessionVersion } satisfies SessionRef));
  passport.deserializeUser((raw: unknown, done) => {
    const ref = parseSessionRef(raw);
    if (!ref) return done(null, false);
    auth.sessionUser(ref.id, ref.v).then((user) => done(null, user ?? false), done);
  });
  return passport;
}

/** Starts a session for `user` (passport regenerates the session id first, against session fixation). */
export function logIn(req: Request, user: SessionUser): Promise<void> {
  return new Promise((resolve, reject) => req.logIn(user, (err) => (err ? reject(err) : resolve())));
}
