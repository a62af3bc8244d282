import { Router, type Request, type Response, type NextFunction } from 'express';
import type { Passport } from 'passport';
import { loginInput, preferencesInput, signupInput } from '../../../shared/schemas/api.schema.js';
import { AppError } from '../../errors.js';
import { requireUser, userOf } from '../../middleware/auth.js';
import type { SessionUser } from '../../session-user.js';
import { logIn } from './auth.passport.js';
import type { AuthService } from './auth.service.js';
import { loginLimiter, signupLimiter, type RateLimitOptions } from './rate-limit.js';

type PassportInstance = InstanceType<typeof Passport>;

export interface AuthRoutesDeps {
  auth: AuthService;
  passport: PassportInstance;
  sessionCookieName: string;
  loginLimit?: RateLimitOptions;
  signupLimit?: RateLimitOptions;
}

/** Runs the local strategy and resolves with the user, or null for a wrong e-mail or password. */
function authenticate(passport: PassportInstance, req: Request, res: Response, next: NextFunction): Promise<SessionUser | null> {
  return new Promise((resolve, reject) => {
    passport.authenticate('local', { session: false }, (err: unknown, user: SessionUser | false) => {
      if (err) reject(err);
      else resolve(user || null);
    })(req, res, next);
  });
}

export function authRoutes(deps: AuthRoutesDeps): Router {
  const { auth, passport } = deps;
  const router = Router();

  router.post('/signup', signupLimiter(deps.signupLimit), async (req, res) => {
    const input = signupInput.parse(req.body);
    const user = await auth.signup(input);
    await logIn(req, user);
    res.status(201).json(await auth.me(user.id));
  });

  router.post('/login', loginLimiter(deps.loginLimit), async (req, res, next) => {
    req.body = loginInput.parse(req.body);
    const user = await authenticate(passport, req, res, next);
    if (!user) throw new AppError(401, 'invalid_credentials', 'That e-mail and password do not match an account.');
    await logIn(req, user);
    res.json(await auth.me(user.id));
  });

  router.post('/logout', requireUser, async (req, res) => {
    await new Promise<void>((resolve, reject) => req.logOut((err) => (err ? reject(err) : resolve())));
    await new Promise<void>((resolve, reject) => req.session.destroy((err) => (err ? reject(err) : resolve())));
    res.clearCookie(deps.sessionCookieName, { path: '/' });
    res.status(204).end();
  });

  router.get('/me', requireUser, async (req, res) => {
    res.json(await auth.me(userOf(req).id));
  });

  router.patch('/me', requireUser, async (req, res) => {
    const input = preferencesInput.parse(req.body);
    res.json(await auth.updatePreferences(userOf(req).id, input));
  });

  return router;
}
