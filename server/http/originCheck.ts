import type { RequestHandler } from 'express';
import { HttpError } from './errors';

const SAFE_METHODS = new Set(['GET', 'HEAD', 'OPTIONS']);

/**
 * CSRF defence: a state-changing request must come from our own origin. The Origin header must
 * match the configured public URL or, behind no proxy, the Host the request was sent to.
 */
export function originCheck(publicUrl: string | undefined): RequestHandler {
  const configured = publicUrl ? new URL(publicUrl).origin : null;
  return (req, _res, next) => {
    if (SAFE_METHODS.has(req.method)) return next();
    const origin = req.headers.origin;
    const sameHost = origin && req.headers.host && origin === `${req.protocol}://${req.headers.host}`;
    if (origin && (origin === configured || sameHost)) return next();
    throw new HttpError(403, 'bad_origin', 'This request did not come from the Quillane app (Origin check failed)');
  };
}
