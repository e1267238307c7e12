import { createColumnHelper } from '@tanstack/react-table';
import { useMemo } from 'react';
import { membershipRoles, type MembershipRole, type NotebookMember } from '../../../../shared/schemas';
import { Button } from '../../../components/Button';
import { DataTable } from '../../../components/DataTable';
import { FormAlert } from '../../../components/FormAlert';
import { membershipLabels } from '../../../lib/roles';
import { useRemoveNotebookMember, useSetNotebookMember } from '../api/queries';

const column = createColumnHelper<NotebookMember>();

/** The people of one notebook. Owners and admins change their part or take them off it. */
export function NotebookMembersTable({ notebookId, members, canManage }: { notebookId: string; members: NotebookMember[]; canManage: boolean }) {
  const setMember = useSetNotebookMember(notebookId);
  const remove = useRemoveNotebookMember(notebookId);
  const busy = setMember.isPending || remove.isPending;

  const columns = useMemo(
    () => [
      column.accessor('name', { header: 'Name', cell: (info) => <span className="font-medium">{info.getValue()}</span> }),
      column.accessor('email', { header: 'E-mail', cell: (info) => <span className="text-ink-soft">{info.getValue()}</span> }),
      column.accessor('role', {
        header: 'Part in this notebook',
        cell: (info) =>
          canManage ? (
            <select
              aria-label={`Part of ${info.row.original.name}`}
              value={info.getValue()}
              disabled={busy}
              onChange={(event) => setMember.mutate({ userId: info.row.original.userId, role: event.target.value as MembershipRole })}
              className="rounded-md border border-fold-strong bg-paper-card px-2 py-1 text-sm focus:border-tide-500 focus:outline-none"
            >
              {membershipRoles.map((role) => (
                <option key={role} value={role}>
                  {membershipLabels[role]}
                </option>
              ))}
            </select>
          ) : (
            membershipLabels[info.getValue()]
          ),
      }),
      ...(canManage
        ? [
            column.display({
              id: 'remove',
              header: '',
              cell: (info) => (
                <Button tone="quiet" disabled={busy} onClick={() => remove.mutate(info.row.original.userId)} aria-label={`Remove ${info.row.original.name}`}>
                  Remove
                </Button>
              ),
            }),
          ]
        : []),
    ],
    [canManage, busy, setMember, remove],
  );

  const failure = setMember.error ?? remove.error;
  return (
    <div className="space-y-3">
      <FormAlert message={failure?.message} />
      <DataTable data={members} columns={columns} caption="Notebook members" initialSorting={[{ id: 'name', desc: false }]} getRowId={(member) => member.userId} />
    </div>
  );
}
