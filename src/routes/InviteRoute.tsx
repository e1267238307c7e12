import { Link, useNavigate, useParams } from 'react-router-dom';
import { AuthLayout } from '../components/AuthLayout';
import { LoadingState } from '../components/LoadingState';
import { useAcceptInvitation, useInvitation } from '../features/auth/api/queries';
import { NewPasswordForm } from '../features/auth/components/NewPasswordForm';
import { isApiError } from '../lib/api';
import { roleLabels } from '../lib/roles';

export function InviteRoute() {
  const { token = '' } = useParams();
  const invitation = useInvitation(token);
  const accept = useAcceptInvitation();
  const navigate = useNavigate();

  if (invitation.isPending) return <LoadingState label="Checking the invitation…" />;
  if (invitation.isError) {
    return (
      <AuthLayout
        title="This invitation cannot be used"
        intro={
          isApiError(invitation.error, 404)
            ? 'The link is unknown, already used or expired. Ask an admin of your group for a new invitation.'
            : invitation.error.message
        }
        footer={<Link to="/sign-in" className="font-medium text-tide-600 hover:underline">Go to sign-in</Link>}
      />
    );
  }

  const { email, name, role } = invitation.data;
  return (
    <AuthLayout title="Join your group on Quillane" intro={`You were invited as ${email}, with the role ${roleLabels[role]}. Choose a password to finish.`}>
      <NewPasswordForm
        askName
        defaultName={name}
        submitLabel="Set password and sign in"
        busy={accept.isPending}
        onSubmit={async (input) => {
          await accept.mutateAsync({ token, password: input.password, name: input.name });
          navigate('/notebooks', { replace: true });
        }}
      />
    </AuthLayout>
  );
}
