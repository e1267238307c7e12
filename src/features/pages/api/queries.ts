import { useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import type { PageCreateInput, PageDetail, PageSummary } from '../../../../shared/schemas';
import { api } from '../../../lib/api';

export const pageKeys = {
  ofNotebook: (notebookId: string) => ['notebooks', notebookId, 'pages'] as const,
  one: (id: string) => ['pages', id] as const,
};

export function useNotebookPages(notebookId: string) {
  return useQuery({
    queryKey: pageKeys.ofNotebook(notebookId),
    queryFn: () => api.get<PageSummary[]>(`/api/notebooks/${encodeURIComponent(notebookId)}/pages`),
  });
}

export function usePage(id: string) {
  return useQuery({ queryKey: pageKeys.one(id), queryFn: () => api.get<PageDetail>(`/api/pages/${encodeURIComponent(id)}`) });
}

export function useCreatePage(notebookId: string) {
  const client = useQueryClient();
  return useMutation({
    mutationFn: (input: PageCreateInput) => api.post<PageDetail>(`/api/notebooks/${encodeURIComponent(notebookId)}/pages`, input),
    onSuccess: (page) => {
      client.setQueryData(pageKeys.one(page.id), page);
      // The notebook's page count changes too, so refresh everything under this notebook.
      return client.invalidateQueries({ queryKey: ['notebooks'] });
    },
  });
}

export function useRenamePage(id: string) {
  const client = useQueryClient();
  return useMutation({
    mutationFn: (input: { title: string }) => api.patch<PageDetail>(`/api/pages/${encodeURIComponent(id)}`, input),
    onSuccess: (page) => {
      client.setQueryData(pageKeys.one(page.id), page);
      return client.invalidateQueries({ queryKey: pageKeys.ofNotebook(page.notebookId) });
    },
  });
}
