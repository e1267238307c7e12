import { useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import type {
  AddendumInput,
  AuditTrail,
  Countersigner,
  CountersignInput,
  PageRecord,
  PrintRecord,
  QueueItem,
  ReturnInput,
  SignPageInput,
  VerifyReport,
} from '../../../../shared/schemas/signing';
import { api, isApiError } from '../../../lib/api';

export const signingKeys = {
  page: (pageId: string) => ['signing', 'page', pageId] as const,
  record: (pageId: string) => ['signing', 'page', pageId, 'record'] as const,
  verify: (pageId: string) => ['signing', 'page', pageId, 'verify'] as const,
  audit: (pageId: string) => ['signing', 'page', pageId, 'audit'] as const,
  print: (pageId: string) => ['signing', 'page', pageId, 'print'] as const,
  countersigners: (pageId: string) => ['signing', 'page', pageId, 'countersigners'] as const,
  queue: ['signing', 'queue'] as const,
};

const pagePath = (pageId: string) => `/api/pages/${encodeURIComponent(pageId)}`;

/**
 * A refused signature password is a 401 like a lost session, but the session is fine: the app
 * signs people out on any 401, so this one travels as an ordinary error carrying the message.
 */
export class SignatureRefused extends Error {}

async function signing<T>(call: () => Promise<T>): Promise<T> {
  try {
    return await call();
  } catch (error) {
    if (isApiError(error, 401) && error.code === 'signature_rejected') throw new SignatureRefused(error.message);
    throw error;
  }
}

export function usePageRecord(pageId: string) {
  return useQuery({ queryKey: signingKeys.record(pageId), queryFn: () => api.get<PageRecord>(`${pagePath(pageId)}/record`) });
}

export function useVerification(pageId: string) {
  return useQuery({ queryKey: signingKeys.verify(pageId), queryFn: () => api.get<VerifyReport>(`${pagePath(pageId)}/verify`) });
}

export function useAuditTrail(pageId: string) {
  return useQuery({ queryKey: signingKeys.audit(pageId), queryFn: () => api.get<AuditTrail>(`${pagePath(pageId)}/audit`) });
}

export function usePrintRecord(pageId: string) {
  return useQuery({ queryKey: signingKeys.print(pageId), queryFn: () => api.get<PrintRecord>(`${pagePath(pageId)}/print`) });
}

export function useCountersigners(pageId: string) {
  return useQuery({ queryKey: signingKeys.countersigners(pageId), queryFn: () => api.get<Countersigner[]>(`${pagePath(pageId)}/countersigners`) });
}

export function useCountersignQueue() {
  return useQuery({ queryKey: signingKeys.queue, queryFn: () => api.get<QueueItem[]>('/api/signing/queue'), refetchInterval: 60_000 });
}

/** Every signing action changes the record, its verification and the queue; `onChanged` lets the route refresh the page itself. */
function useSigningAction<I>(pageId: string, send: (input: I) => Promise<PageRecord>, onChanged?: () => void) {
  const client = useQueryClient();
  return useMutation({
    mutationFn: (input: I) => signing(() => send(input)),
    onSuccess: async (record) => {
      client.setQueryData(signingKeys.record(pageId), record);
      onChanged?.();
      await Promise.all([
        client.invalidateQueries({ queryKey: signingKeys.page(pageId) }),
        client.invalidateQueries({ queryKey: signingKeys.queue }),
      ]);
    },
  });
}

export function useSignPage(pageId: string, onChanged?: () => void) {
  return useSigningAction(pageId, (input: SignPageInput) => api.post<PageRecord>(`${pagePath(pageId)}/sign`, input), onChanged);
}

export function useAddAddendum(pageId: string, onChanged?: () => void) {
  return useSigningAction(pageId, (input: AddendumInput) => api.post<PageRecord>(`${pagePath(pageId)}/addenda`, input), onChanged);
}

/** Countersign or return the page itself (addendumId null) or one of its addenda. */
export function useCountersign(pageId: string, addendumId: string | null, onChanged?: () => void) {
  const path = addendumId ? `/api/addenda/${encodeURIComponent(addendumId)}` : pagePath(pageId);
  return useSigningAction(pageId, (input: CountersignInput) => api.post<PageRecord>(`${path}/countersign`, input), onChanged);
}

export function useReturn(pageId: string, addendumId: string | null, onChanged?: () => void) {
  const path = addendumId ? `/api/addenda/${encodeURIComponent(addendumId)}` : pagePath(pageId);
  return useSigningAction(pageId, (input: ReturnInput) => api.post<PageRecord>(`${path}/return`, input), onChanged);
}
