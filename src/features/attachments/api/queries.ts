import { useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import type { AttachmentSummary } from '../../../../shared/schemas';
import { api } from '../../../lib/api';

export const attachmentKeys = {
  // The same key the page editor's file picker reads, so both see new files at once.
  ofPage: (pageId: string) => ['pages', pageId, 'attachments'] as const,
};

export function contentUrl(attachmentId: string): string {
  return `/api/attachments/${encodeURIComponent(attachmentId)}/content`;
}

export function usePageAttachments(pageId: string) {
  return useQuery({
    queryKey: attachmentKeys.ofPage(pageId),
    queryFn: () => api.get<AttachmentSummary[]>(`/api/pages/${encodeURIComponent(pageId)}/attachments`),
  });
}

export function useRemoveAttachment(pageId: string) {
  const client = useQueryClient();
  return useMutation({
    mutationFn: (attachmentId: string) => api.delete(`/api/attachments/${encodeURIComponent(attachmentId)}`),
    onSettled: () => client.invalidateQueries({ queryKey: attachmentKeys.ofPage(pageId) }),
  });
}
