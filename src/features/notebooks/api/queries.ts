import { useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import type { NotebookCreateInput, NotebookSummary } from '../../../../shared/schemas';
import { api } from '../../../lib/api';

export const notebookKeys = {
  all: ['notebooks'] as const,
  one: (id: string) => ['notebooks', id] as const,
};

export function useNotebooks() {
  return useQuery({ queryKey: notebookKeys.all, queryFn: () => api.get<NotebookSummary[]>('/api/notebooks') });
}

export function useNotebook(id: string) {
  return useQuery({ queryKey: notebookKeys.one(id), queryFn: () => api.get<NotebookSummary>(`/api/notebooks/${encodeURIComponent(id)}`) });
}

export function useCreateNotebook() {
  const client = useQueryClient();
  return useMutation({
    mutationFn: (input: NotebookCreateInput) => api.post<NotebookSummary>('/api/notebooks', input),
    onSuccess: (created) => {
      client.setQueryData(notebookKeys.one(created.id), created);
      return client.invalidateQueries({ queryKey: notebookKeys.all, exact: true });
    },
  });
}
