import type { Request } from 'express';
import { notFound } from './errors';

const UUID = /^[0-9a-f]{8}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{12}$/i;

/** A path id that is not even shaped like one of ours names nothing: 404, not a database error. */
export function idParam(req: Request, name: string, what: string): string {
  const value = req.params[name];
  if (typeof value !== 'string' || !UUID.test(value)) throw notFound(what);
  return value.toLowerCase();
}
