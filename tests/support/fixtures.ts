import { randomUUID } from 'node:crypto';
import { afterAll, beforeAll } from 'vitest';
import type { AppDeps } from '../../server/context';
import { hashPassword } from '../../server/auth/passwords';
import { newToken } from '../../server/auth/tokens';
import { users } from '../../server/db/schema';
import type { Role } from '../../shared/schemas/common';
import { ApiClient, signedIn } from './api';
import { startServer, type TestServer } from './server';

/**
 * Test data of one's own: the suite shares one database, so every test makes the people,
 * notebooks and pages it relies on instead of counting on global state.
 */
export function uniqueEmail(prefix: string): string {
  return `${prefix}-${randomUUID().slice(0, 8)}@saltmarsh.test`;
}

export interface TestPerson {
  id: string;
  email: string;
  password: string;
  role: Role;
}

/** A person with a known password, written straight into the database (no mail round trip). */
export async function createPerson(deps: AppDeps, role: Role, prefix: string = role): Promise<TestPerson> {
  const email = uniqueEmail(prefix);
  const password = `pw-${randomUUID()}`;
  const [row] = await deps.db
    .insert(users)
    .values({ email, name: `Test ${prefix}`, role, passwordHash: await hashPassword(password) })
    .returning();
  return { id: row.id, email, password, role };
}

export async function signedInAs(url: string, person: TestPerson): Promise<ApiClient> {
  return signedIn(url, person.email, person.password);
}

/** A new page of `title` in the demo esters notebook, made through the API by its owner chemist@ (see server/seed/demo.ts). */
export async function newDemoNotebookPage(url: string, title: string): Promise<string> {
  const chemist = await signedIn(url, 'chemist@saltmarsh.test');
  const notebooks = await chemist.get<{ id: string; title: string }[]>('/api/notebooks');
  const notebook = notebooks.body.find((n) => n.title === 'Fruity esters from short-chain acids');
  if (!notebook) throw new Error('demo notebook missing');
  const created = await chemist.post<{ id: string }>(`/api/notebooks/${notebook.id}/pages`, { title });
  if (created.status !== 201) throw new Error(`page: ${created.status} ${JSON.stringify(created.body)}`);
  return created.body.id;
}

/** A live invitation written straight into the database; returns the token its link would carry. */
export async function insertInvitation(deps: AppDeps, name = 'Test Invitee'): Promise<string> {
  const { token, tokenHash } = newToken();
  await deps.pool.query(
    "insert into invitations (email, name, role, token_hash, expires_at) values ($1, $2, 'chemist', $3, now() + interval '1 day')",
    [uniqueEmail('invitee'), name, tokenHash],
  );
  return token;
}

/** A live password-reset link for `userId`; returns its token. */
export async function insertPasswordReset(deps: AppDeps, userId: string): Promise<string> {
  const { token, tokenHash } = newToken();
  await deps.pool.query("insert into password_resets (user_id, token_hash, expires_at) values ($1, $2, now() + interval '1 hour')", [userId, tokenHash]);
  return token;
}

export interface AdminFrame {
  server: TestServer;
  /** admin@, who sends invitations and reads the caught mail. */
  admin: ApiClient;
}

/** A server of this file's own with admin@ signed in on it, registered as the file's hooks. */
export function adminFrame(): AdminFrame {
  const frame = {} as AdminFrame;
  beforeAll(async () => {
    frame.server = await startServer();
    frame.admin = await signedIn(frame.server.url, 'admin@saltmarsh.test');
  });
  afterAll(() => frame.server?.close());
  return frame;
}

/** The newest caught message to `address`, read through the admins' mail view. */
export async function latestMailTo(admin: ApiClient, address: string): Promise<{ subject: string; text: string } | undefined> {
  const response = await admin.get<{ to: string[]; subject: string; text: string }[]>('/api/mail');
  if (response.status !== 200) throw new Error(`GET /api/mail answered ${response.status}`);
  return response.body.find((m) => m.to.includes(address));
}

/** The token at the end of an e-mailed link such as `<origin>/invite/<token>`. */
export function tokenFromLink(text: string, kind: 'invite' | 'reset'): string {
  const match = new RegExp(`/${kind}/([A-Za-z0-9_-]+)`).exec(text);
  if (!match) throw new Error(`no /${kind}/ link in mail: ${text}`);
  return match[1];
}

export interface CookieAttributes {
  name: string;
  value: string;
  attributes: Map<string, string>;
}

/** Splits one Set-Cookie header into name, value and lower-cased attribute names. */
export function parseSetCookie(header: string): CookieAttributes {
  const [pair, ...rest] = header.split(';').map((p) => p.trim());
  const eq = pair.indexOf('=');
  const attributes = new Map<string, string>();
  for (const part of rest) {
    const i = part.indexOf('=');
    attributes.set((i < 0 ? part : part.slice(0, i)).toLowerCase(), i < 0 ? '' : part.slice(i + 1));
  }
  return { name: pair.slice(0, eq), value: pair.slice(eq + 1), attributes };
}

export function sessionCookieOf(headers: Headers): CookieAttributes | undefined {
  return headers
    .getSetCookie()
    .map(parseSetCookie)
    .find((c) => c.name === 'quillane_session');
}
