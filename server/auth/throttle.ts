import type { RequestHandler } from 'express';
import { rateLimit, type Options } from 'express-rate-limit';
import type { Config } from '../env';
import { HttpError } from '../http/errors';

/**
 * Failed sign-ins are limited per account (guessing one password) and, more loosely, per address
 * (spraying many accounts); successful sign-ins do not count.
 */
export function signInThrottle(config: Config): RequestHandler[] {
  const message = `Too many failed sign-in attempts. Try again in about ${Math.ceil(config.SIGN_IN_WINDOW_SECONDS / 60)} minutes.`;
  const common: Partial<Options> = {
    windowMs: config.SIGN_IN_WINDOW_SECONDS * 1000,
    skipSuccessfulRequests: true,
    standardHeaders: 'draft-8',
    legacyHeaders: false,
    handler: (_req, _res, next) => next(new HttpError(429, 'too_many_attempts', message)),
  };
  const perAddress = rateLimit({ ...common, limit: config.SIGN_IN_MAX_ATTEMPTS * 4 });
  const perAccount = rateLimit({
    ...common,
    limit: config.SIGN_IN_MAX_ATTEMPTS,
    keyGenerator: (req) => {
      const email = (req.body as { email?: unknown } | undefined)?.email;
      return `account:${typeof email === 'string' ? email.trim().toLowerCase() : ''}`;
    },
  });
  return [perAddress, perAccount];
}
