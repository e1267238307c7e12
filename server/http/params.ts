import type { Request } from 'express';
import { notFound } from './errors';

const UUID = /^[0-9a-f]{8}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{12}$/i;

/** An id that is not even shaped like one of ours names nothing: 404, not a database error. */
export function idFrom(value: unknown, what: string): string {
  if (typeof value !== 'string' || !UUID.test(value)) throw notFound(what);
  return value.toLowerCase();
}

/** The id in a path parameter (see idFrom). */
export function idParam(req: Request, name: string, what: string): string {
  return idFrom(req.params[name], what);
}
