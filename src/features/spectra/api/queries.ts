import { useQuery } from '@tanstack/react-query';
import type { AttachmentSummary, SpectrumData } from '../../../../shared/schemas';
import { api } from '../../../lib/api';

export const spectrumKeys = {
  meta: (attachmentId: string) => ['attachments', attachmentId] as const,
  data: (attachmentId: string) => ['attachments', attachmentId, 'spectrum'] as const,
};

export function useAttachmentMeta(attachmentId: string) {
  return useQuery({
    queryKey: spectrumKeys.meta(attachmentId),
    queryFn: () => api.get<AttachmentSummary>(`/api/attachments/${encodeURIComponent(attachmentId)}`),
  });
}

export function useSpectrum(attachmentId: string, enabled = true) {
  return useQuery({
    queryKey: spectrumKeys.data(attachmentId),
    queryFn: () => api.get<SpectrumData>(`/api/attachments/${encodeURIComponent(attachmentId)}/spectrum`),
    enabled,
    // A stored file never changes, so neither does its spectrum.
    staleTime: Infinity,
  });
}
