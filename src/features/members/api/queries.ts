import { useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import type { DirectoryPerson, InvitationCreateInput, InvitationSummary, MembershipRole, NotebookMember, Role, UserSummary } from '../../../../shared/schemas';
import { api } from '../../../lib/api';

export const memberKeys = {
  users: ['users'] as const,
  directory: ['people'] as const,
  invitations: ['invitations'] as const,
  ofNotebook: (notebookId: string) => ['notebooks', notebookId, 'members'] as const,
};

export function useUsers() {
  return useQuery({ queryKey: memberKeys.users, queryFn: () => api.get<UserSummary[]>('/api/users') });
}

/** The group directory; only fetched where someone may add members (viewers are refused it). */
export function useDirectory(enabled: boolean) {
  return useQuery({ queryKey: memberKeys.directory, queryFn: () => api.get<DirectoryPerson[]>('/api/people'), enabled });
}

export function useUpdateUserRole() {
  const client = useQueryClient();
  return useMutation({
    mutationFn: ({ id, role }: { id: string; role: Role }) => api.patch<UserSummary>(`/api/users/${encodeURIComponent(id)}`, { role }),
    // The directory shows org roles too, and decides which notebook parts are offered.
    onSettled: () => Promise.all([client.invalidateQueries({ queryKey: memberKeys.users }), client.invalidateQueries({ queryKey: memberKeys.directory })]),
  });
}

export function useInvitations() {
  return useQuery({ queryKey: memberKeys.invitations, queryFn: () => api.get<InvitationSummary[]>('/api/invitations') });
}

export function useCreateInvitation() {
  const client = useQueryClient();
  return useMutation({
    mutationFn: (input: InvitationCreateInput) => api.post<InvitationSummary>('/api/invitations', input),
    // A new invitation also lands in the caught mail.
    onSuccess: () => Promise.all([client.invalidateQueries({ queryKey: memberKeys.invitations }), client.invalidateQueries({ queryKey: ['mail'] })]),
  });
}

export function useNotebookMembers(notebookId: string) {
  return useQuery({
    queryKey: memberKeys.ofNotebook(notebookId),
    queryFn: () => api.get<NotebookMember[]>(`/api/notebooks/${encodeURIComponent(notebookId)}/members`),
  });
}

export function useSetNotebookMember(notebookId: string) {
  const client = useQueryClient();
  return useMutation({
    mutationFn: (input: { userId: string; role: MembershipRole }) =>
      api.put<NotebookMember>(`/api/notebooks/${encodeURIComponent(notebookId)}/members`, input),
    onSettled: () => client.invalidateQueries({ queryKey: ['notebooks'] }),
  });
}

export function useRemoveNotebookMember(notebookId: string) {
  const client = useQueryClient();
  return useMutation({
    mutationFn: (userId: string) => api.delete(`/api/notebooks/${encodeURIComponent(notebookId)}/members/${encodeURIComponent(userId)}`),
    onSettled: () => client.invalidateQueries({ queryKey: ['notebooks'] }),
  });
}
