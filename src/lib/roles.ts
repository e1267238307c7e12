import type { MembershipRole, Role } from '../../shared/schemas';

export const roleLabels: Record<Role, string> = {
  admin: 'Admin',
  supervisor: 'Supervisor',
  chemist: 'Bench chemist',
  viewer: 'Viewer',
};

export const membershipLabels: Record<MembershipRole, string> = {
  owner: 'Owner',
  editor: 'Editor',
  reader: 'Reader',
};
