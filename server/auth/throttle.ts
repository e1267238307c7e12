import type { RequestHandler } from 'express';
import { rateLimit } from 'express-rate-limit';
import type { Config } from '../env';

function refuse(retryAfterSeconds: number) {
  return {
    error: {
      code: 'too_many_attempts',
      message: `Too many failed sign-in attempts. Try again in about ${Math.ceil(retryAfterSeconds / 60)} minutes.`,
    },
  };
}

/**
 * Failed sign-ins are limited per account (guessing one password) and, more loosely, per address
 * (spraying many accounts); successful sign-ins do not count.
 */
export function signInThrottle(config: Config): RequestHandler[] {
  const windowMs = config.SIGN_IN_WINDOW_SECONDS * 1000;
  const common = {
    windowMs,
    skipSuccessfulRequests: true,
    standardHeaders: 'draft-8' as const,
    legacyHeaders: false,
    handler: (_req: unknown, res: { status(n: number): { json(b: unknown): void } }) =>
      res.status(429).json(refuse(config.SIGN_IN_WINDOW_SECONDS)),
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
