import { createHash, randomBytes } from 'node:crypto';

/** E-mailed tokens are random; only their SHA-256 is stored, so a database leak reveals no live link. */
export function newToken(): { token: string; tokenHash: string } {
  const token = randomBytes(32).toString('base64url');
  return { token, tokenHash: hashToken(token) };
}

export function hashToken(token: string): string {
  return createHash('sha256').update(token).digest('hex');
}
