import type { ErrorRequestHandler } from 'express';
import type { ZodError, ZodTypeAny, z } from 'zod';

/** An error the client caused or may see; rendered as `{ error: { code, message } }`. */
export class HttpError extends Error {
  constructor(
    readonly status: number,
    readonly code: string,
    message: string,
    readonly extra: { fields?: Record<string, string>; details?: unknown } = {},
  ) {
    super(message);
  }
}

export const notFound = (what = 'The requested item') => new HttpError(404, 'not_found', `${what} was not found`);
export const forbidden = (message = 'You are not allowed to do this') => new HttpError(403, 'forbidden', message);
export const conflict = (code: string, message: string) => new HttpError(409, code, message);
export const notSignedIn = () => new HttpError(401, 'not_signed_in', 'Please sign in first');

/** The contract's error body: `{ error: { code, message } }` plus any field errors or details. */
export function errorBody(error: HttpError) {
  return { error: { code: error.code, message: error.message, ...error.extra } };
}

function fieldErrors(error: ZodError): Record<string, string> {
  const fields: Record<string, string> = {};
  for (const issue of error.issues) {
    const key = issue.path.join('.') || '(body)';
    fields[key] ??= issue.message;
  }
  return fields;
}

/** Validates `value` against a shared zod schema; a mismatch is a 400 naming each bad field. */
export function parseInput<S extends ZodTypeAny>(schema: S, value: unknown): z.infer<S> {
  const result = schema.safeParse(value);
  if (result.success) return result.data;
  const fields = fieldErrors(result.error);
  const summary = Object.entries(fields)
    .map(([field, message]) => `${field} ${message}`)
    .join('; ');
  throw new HttpError(400, 'invalid_input', `Invalid input: ${summary}`, { fields });
}

interface BodyParserError extends Error {
  type?: string;
  status?: number;
}

/** Turns every thrown error into the contract's shape; unexpected ones are logged and hidden. */
export const errorHandler: ErrorRequestHandler = (error, _req, res, _next) => {
  if (error instanceof HttpError) {
    res.status(error.status).json(errorBody(error));
    return;
  }
  const bodyError = error as BodyParserError;
  if (bodyError.type === 'entity.parse.failed') {
    res.status(400).json({ error: { code: 'malformed_json', message: 'The request body is not valid JSON' } });
    return;
  }
  if (bodyError.type === 'entity.too.large') {
    res.status(413).json({ error: { code: 'too_large', message: 'The request body is too large' } });
    return;
  }
  if (bodyError.status && bodyError.status >= 400 && bodyError.status < 500) {
    res.status(bodyError.status).json({ error: { code: 'bad_request', message: bodyError.message } });
    return;
  }
  console.error(error);
  res.status(500).json({ error: { code: 'internal', message: 'Something went wrong on our side; nothing was changed' } });
};
