import type { ReactNode } from 'react';
import { ErrorState } from '../components/ErrorState';
import { ApiError } from '../lib/api';
import { useSignedInPerson } from './AppLayout';

/** Admin screens show the same refusal the server would give, without asking it first. */
export function AdminOnly({ children }: { children: ReactNode }) {
  const me = useSignedInPerson();
  if (me.role !== 'admin') return <ErrorState error={new ApiError(403, 'forbidden', 'Only admins can open this.')} />;
  return <>{children}</>;
}
