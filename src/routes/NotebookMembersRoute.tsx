import { Link, useParams } from 'react-router-dom';
import { ErrorState } from '../components/ErrorState';
import { LoadingState } from '../components/LoadingState';
import { PageHeader } from '../components/PageHeader';
import { Panel } from '../components/Panel';
import { useDirectory, useNotebookMembers } from '../features/members/api/queries';
import { AddMemberForm } from '../features/members/components/AddMemberForm';
import { NotebookMembersTable } from '../features/members/components/NotebookMembersTable';
import { useNotebook } from '../features/notebooks/api/queries';
import { useSignedInPerson } from './AppLayout';

export function NotebookMembersRoute() {
  const { notebookId = '' } = useParams();
  const me = useSignedInPerson();
  const notebook = useNotebook(notebookId);
  const members = useNotebookMembers(notebookId);
  const canManage = me.role === 'admin' || notebook.data?.myRole === 'owner';
  const directory = useDirectory(canManage);

  if (notebook.isPending || members.isPending) return <LoadingState label="Loading members…" />;
  if (notebook.isError) return <ErrorState error={notebook.error} />;
  if (members.isError) return <ErrorState error={members.error} />;

  const memberIds = new Set(members.data.map((member) => member.userId));
  const candidates = (directory.data ?? []).filter((person) => !memberIds.has(person.id));

  return (
    <>
      <PageHeader
        overline={
          <Link to={`/notebooks/${notebookId}`} className="hover:underline">
            {notebook.data.title}
          </Link>
        }
        title="Members"
        description="Owners manage members; editors write pages; readers only read."
      />
      <div className="grid gap-6 lg:grid-cols-[1fr_20rem]">
        <NotebookMembersTable notebookId={notebookId} members={members.data} canManage={canManage} />
        {canManage && (
          <Panel title="Add a member">
            {directory.isError ? (
              <ErrorState error={directory.error} />
            ) : directory.isPending ? (
              <LoadingState />
            ) : (
              <AddMemberForm notebookId={notebookId} candidates={candidates} />
            )}
          </Panel>
        )}
      </div>
    </>
  );
}
