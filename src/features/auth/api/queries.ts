import { useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import type { Me, SetPasswordInput, SignInInput } from '../../../../shared/schemas';
import { api, isApiError } from '../../../lib/api';

export const meKey = ['me'] as const;

export interface InvitationPreview {
  email: string;
  name: string;
  role: Me['role'];
}

/** The signed-in person; `null` when nobody is signed in (a 401 is an answer here, not an error). */
export function useMe() {
  return useQuery({
    queryKey: meKey,
    queryFn: async (): Promise<Me | null> => {
      try {
        return await api.get<Me>('/api/me');
      } catch (error) {
        if (isApiError(error, 401)) return null;
        throw error;
      }
    },
    staleTime: 60_000,
  });
}

/** After any way of signing in, start from a clean cache holding only the new person. */
function useSignedIn() {
  const client = useQueryClient();
  return (me: Me) => {
    client.clear();
    client.setQueryData(meKey, me);
  };
}

export function useSignIn() {
  const signedIn = useSignedIn();
  return useMutation({
    mutationFn: (input: SignInInput) => api.post<Me>('/api/auth/sign-in', input),
    onSuccess: signedIn,
  });
}

export function useSignOut() {
  const client = useQueryClient();
  return useMutation({
    mutationFn: () => api.post<void>('/api/auth/sign-out'),
    onSettled: () => {
      client.clear();
      client.setQueryData(meKey, null);
    },
  });
}

export function useInvitation(token: string) {
  return useQuery({
    queryKey: ['invitation', token],
    queryFn: () => api.get<InvitationPreview>(`/api/auth/invitations/${encodeURIComponent(token)}`),
  });
}

export function useAcceptInvitation() {
  const signedIn = useSignedIn();
  return useMutation({
    mutationFn: (input: SetPasswordInput) => api.post<Me>('/api/auth/accept-invitation', input),
    onSuccess: signedIn,
  });
}

export function useRequestPasswordReset() {
  return useMutation({
    mutationFn: (input: { email: string }) => api.post<void>('/api/auth/password-reset', input),
  });
}

export function useConfirmPasswordReset() {
  const signedIn = useSignedIn();
  return useMutation({
    mutationFn: (input: { token: string; password: string }) => api.post<Me>('/api/auth/password-reset/confirm', input),
    onSuccess: signedIn,
  });
}
