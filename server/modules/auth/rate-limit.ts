import type { RequestHandler } from 'express';
import { ipKeyGenerator, rateLimit } from 'express-rate-limit';
import { ERROR_CODES, type ErrorBody } from '../../../shared/errors.js';

export interface RateLimitOptions {
  windowMs: number;
  /** Attempts allowed per window and key. */
  limit: number;
}

/** 10 failed sign-ins per 15 minutes per address and e-mail (common practice; OWASP advises throttling sign-in). */
export const DEFAULT_LOGIN_LIMIT: RateLimitOptions = { windowMs: 15 * 60_000, limit: 10 };
/** 20 sign-ups per hour per address: each one hashes a password and creates a workshop (common practice). */
export const DEFAULT_SIGNUP_LIMIT: RateLimitOptions = { windowMs: 60 * 60_000, limit: 20 };

function emailOf(body: unknown): string {
  const email = typeof body === 'object' && body !== null ? (body as { email?: unknown }).email : undefined;
  return typeof email === 'string' ? email.trim().toLowerCase() : '';
}

function limiter(opts: RateLimitOptions, what: string, key: 'ip' | 'ip+email', onlyFailures: boolean): RequestHandler {
  return rateLimit({
    windowMs: opts.windowMs,
    limit: opts.limit,
    standardHeaders: 'draft-8',
    legacyHeaders: false,
    skipSuccessfulRequests: onlyFailures,
    keyGenerator: (req) => {
      const ip = ipKeyGenerator(req.ip ?? '');
      return key === 'ip' ? ip : `${ip}|${emailOf(req.body)}`;
    },
    handler: (req, res) => {
      const resetTime = (req as { rateLimit?: { resetTime?: Date } }).rateLimit?.resetTime;
      const waitS = resetTime ? Math.max(1, Math.ceil((resetTime.getTime() - Date.now()) / 1000)) : Math.ceil(opts.windowMs / 1000);
      const minutes = Math.ceil(waitS / 60);
      res.setHeader('Retry-After', String(waitS));
      const body: ErrorBody = {
        error: {
          code: ERROR_CODES.rateLimited,
          message: `Too many ${what}. Try again in ${minutes} minute${minutes === 1 ? '' : 's'}.`,
        },
      };
      res.status(429).json(body);
    },
  });
}

/** Counts failed sign-ins only, keyed by client address and e-mail. */
export function loginLimiter(opts: RateLimitOptions = DEFAULT_LOGIN_LIMIT): RequestHandler {
  return limiter(opts, 'sign-in attempts', 'ip+email', true);
}

/** Counts every sign-up from one address. */
export function signupLimiter(opts: RateLimitOptions = DEFAULT_SIGNUP_LIMIT): RequestHandler {
  return limiter(opts, 'sign-ups from this address', 'ip', false);
}
