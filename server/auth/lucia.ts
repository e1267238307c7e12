import { DrizzlePostgreSQLAdapter } from '@lucia-auth/adapter-drizzle';
import { Lucia } from 'lucia';
import type { Role } from '../../shared/schemas/common';
import type { Database } from '../db/client';
import { sessions, users } from '../db/schema';

export const SESSION_COOKIE = 'quillane_session';

/** The session library stays behind this module so it can be swapped without touching routes. */
export function createLucia(db: Database, options: { secureCookies: boolean }) {
  return new Lucia(new DrizzlePostgreSQLAdapter(db, sessions, users), {
    sessionCookie: {
      name: SESSION_COOKIE,
      expires: false,
      attributes: { secure: options.secureCookies, sameSite: 'lax' },
    },
    getUserAttributes: (row) => ({ email: row.email, name: row.name, role: row.role }),
  });
}

export type Auth = ReturnType<typeof createLucia>;

declare module 'lucia' {
  interface Register {
    Lucia: Auth;
    DatabaseUserAttributes: { email: string; name: string; role: Role };
  }
}
