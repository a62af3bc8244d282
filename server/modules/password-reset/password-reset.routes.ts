import { Router, type RequestHandler } from 'express';
import { ipKeyGenerator, rateLimit } from 'express-rate-limit';
import { ERROR_CODES, type ErrorBody } from '../../../shared/errors.js';
import { logIn } from '../auth/auth.passport.js';
import { RESET_REQUEST_ANSWER, type PasswordResetService } from './password-reset.service.js';

export interface ResetLimit {
  windowMs: number;
  limit: number;
}
/** 5 requests per 15 minutes per address and e-mail, so the form cannot be used to flood a mailbox (common practice). */
export const DEFAULT_RESET_LIMIT: ResetLimit = { windowMs: 15 * 60_000, limit: 5 };

function resetLimiter(opts: ResetLimit): RequestHandler {
  return rateLimit({
    windowMs: opts.windowMs,
    limit: opts.limit,
    standardHeaders: 'draft-8',
    legacyHeaders: false,
    keyGenerator: (req) => {
      const email = typeof req.body?.email === 'string' ? req.body.email.trim().toLowerCase() : '';
      return `${ipKeyGenerator(req.ip ?? '')}|${email}`;
    },
    handler: (_req, res) => {
      const body: ErrorBody = { error: { code: ERROR_CODES.rateLimited, message: 'Too many requests for a password link. Try again in 15 minutes.' } };
      res.status(429).json(body);
    },
  });
}

/** `/api/password-reset` — ask for a link (same answer for every e-mail), check a link, set the new password. */
export function passwordResetRoutes(resets: PasswordResetService, limit: ResetLimit = DEFAULT_RESET_LIMIT): Router {
  const router = Router();
  router.post('/', resetLimiter(limit), async (req, res) => {
    void resets.request(req.body);
    res.status(202).json({ message: RESET_REQUEST_ANSWER });
  });
  router.get('/:token', async (req, res) => {
    res.setHeader('Cache-Control', 'no-store');
    res.json(await resets.check(String(req.params.token)));
  });
  router.post('/:token', async (req, res) => {
    res.setHeader('Cache-Control', 'no-store');
    const { userId, sessionVersion } = await resets.reset(String(req.params.token), req.body);
    // Every other session of the account has ended; one signed in as it here stays signed in (new session id).
    if (req.user?.id === userId) await logIn(req, { ...req.user, sessionVersion });
    res.status(204).end();
  });
  return router;
}
