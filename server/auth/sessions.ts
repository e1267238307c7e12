import type { Response } from 'express';
import type { Me } from '../../shared/schemas/auth';
import type { AppDeps } from '../context';

export async function startSession(deps: AppDeps, res: Response, userId: string): Promise<void> {
  const session = await deps.auth.createSession(userId, {});
  res.append('Set-Cookie', deps.auth.createSessionCookie(session.id).serialize());
}

export function toMe(user: { id: string; email: string; name: string; role: Me['role'] }): Me {
  return { id: user.id, email: user.email, name: user.name, role: user.role };
}
