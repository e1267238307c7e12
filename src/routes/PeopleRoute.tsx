import { ErrorState } from '../components/ErrorState';
import { LoadingState } from '../components/LoadingState';
import { PageHeader } from '../components/PageHeader';
import { Panel } from '../components/Panel';
import { useInvitations, useUsers } from '../features/members/api/queries';
import { InvitationList } from '../features/members/components/InvitationList';
import { InviteForm } from '../features/members/components/InviteForm';
import { PeopleTable } from '../features/members/components/PeopleTable';
import { AdminOnly } from './AdminOnly';

function People() {
  const users = useUsers();
  const invitations = useInvitations();
  return (
    <>
      <PageHeader overline="Organisation" title="People and roles" description="Roles decide what each person may do in every notebook; invite new people by e-mail." />
      <div className="grid gap-6 lg:grid-cols-[1fr_22rem]">
        <div>{users.isPending ? <LoadingState /> : users.isError ? <ErrorState error={users.error} /> : <PeopleTable users={users.data} />}</div>
        <div className="space-y-6">
          <Panel title="Invite someone" description="They get a single-use link that expires.">
            <InviteForm />
          </Panel>
          <Panel title="Invitations">
            {invitations.isPending ? <LoadingState /> : invitations.isError ? <ErrorState error={invitations.error} /> : <InvitationList invitations={invitations.data} />}
          </Panel>
        </div>
      </div>
    </>
  );
}

export function PeopleRoute() {
  return (
    <AdminOnly>
      <People />
    </AdminOnly>
  );
}
