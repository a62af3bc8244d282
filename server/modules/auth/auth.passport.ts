import { Passport } from 'passport';
import { Strategy as LocalStrategy } from 'passport-local';
import type { AuthService } from './auth.service.js';

/**
 * One Passport instance per app (passport's default export is a process-wide singleton, STACK.md trap 8).
 * The session stores only the user id; the user is re-read on every request so role and account changes
 * apply at once.
 */
export function createPassport(auth: AuthService): InstanceType<typeof Passport> {
  const passport = new Passport();
  passport.use(
    new LocalStrategy({ usernameField: 'email', passwordField: 'password' }, (email, password, done) => {
      auth.verifyCredentials(email, password).then((user) => done(null, user ?? false), done);
    }),
  );
  passport.serializeUser((user, done) => done(null, user.id));
  passport.deserializeUser((id: unknown, done) => {
    if (typeof id !== 'number') return done(null, false);
    auth.sessionUser(id).then((user) => done(null, user ?? false), done);
  });
  return passport;
}
