import { useQuery } from '@tanstack/react-query';
import type { CaughtMailSummary } from '../../../../shared/schemas';
import { api } from '../../../lib/api';

/** Mail the local catcher received, newest first (admins only). */
export function useCaughtMail() {
  return useQuery({
    queryKey: ['mail'],
    queryFn: () => api.get<CaughtMailSummary[]>('/api/mail'),
    refetchInterval: 10_000,
  });
}
