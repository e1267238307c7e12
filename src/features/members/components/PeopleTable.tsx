import { createColumnHelper } from '@tanstack/react-table';
import { roles, type Role, type UserSummary } from '../../../../shared/schemas';
import { DataTable } from '../../../components/DataTable';
import { formatDate } from '../../../lib/format';
import { roleLabels } from '../../../lib/roles';
import { useUpdateUserRole } from '../api/queries';

function RoleSelect({ user }: { user: UserSummary }) {
  const update = useUpdateUserRole();
  return (
    <div>
    <select
      aria-label={`Role of ${user.name}`}
      value={user.role}
      disabled={update.isPending}
      onChange={(event) => update.mutate({ id: user.id, role: event.target.value as Role })}
      className="rounded-md border border-fold-strong bg-paper-card px-2 py-1 text-sm focus:border-tide-500 focus:outline-none"
    >
      {roles.map((role) => (
        <option key={role} value={role}>
          {roleLabels[role]}
        </option>
      ))}
    </select>
      {update.error && (
        <p role="alert" className="mt-1 text-xs text-ember-700">
          {update.error.message}
        </p>
      )}
    </div>
  );
}

const column = createColumnHelper<UserSummary>();
const columns = [
  column.accessor('name', { header: 'Name', cell: (info) => <span className="font-medium">{info.getValue()}</span> }),
  column.accessor('email', { header: 'E-mail', cell: (info) => <span className="text-ink-soft">{info.getValue()}</span> }),
  column.accessor('role', { header: 'Role', cell: (info) => <RoleSelect user={info.row.original} /> }),
  column.accessor('createdAt', { header: 'Joined', cell: (info) => <span className="text-ink-soft">{formatDate(info.getValue())}</span> }),
];

/** Everyone in the organisation, with their role; an admin changes a role by picking another. */
export function PeopleTable({ users }: { users: UserSummary[] }) {
  return <DataTable data={users} columns={columns} caption="People and roles" initialSorting={[{ id: 'name', desc: false }]} getRowId={(user) => user.id} />;
}
