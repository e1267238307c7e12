import { hash, verify } from '@node-rs/argon2';

// OWASP's password storage guidance for Argon2id: m=19 MiB, t=2, p=1 (published recommendation).
const ARGON2ID = { algorithm: 2, memoryCost: 19456, timeCost: 2, parallelism: 1 } as const;

export function hashPassword(password: string): Promise<string> {
  return hash(password, ARGON2ID);
}

export async function verifyPassword(passwordHash: string | null, password: string): Promise<boolean> {
  // Verify against a throwaway hash when there is none, so response time does not reveal accounts.
  const target = passwordHash ?? (await dummyHash);
  const ok = await verify(target, password).catch(() => false);
  return ok && passwordHash !== null;
}

const dummyHash = hash('quillane-no-such-account', ARGON2ID);
