import { Link, useNavigate, useParams } from 'react-router-dom';
import { AuthLayout } from '../components/AuthLayout';
import { useConfirmPasswordReset } from '../features/auth/api/queries';
import { NewPasswordForm } from '../features/auth/components/NewPasswordForm';

export function ResetConfirmRoute() {
  const { token = '' } = useParams();
  const confirm = useConfirmPasswordReset();
  const navigate = useNavigate();
  return (
    <AuthLayout
      title="Choose a new password"
      intro="The link in your e-mail works once; after this you are signed in."
      footer={<Link to="/reset" className="font-medium text-tide-600 hover:underline">Ask for a new link</Link>}
    >
      <NewPasswordForm
        askName={false}
        submitLabel="Save password and sign in"
        busy={confirm.isPending}
        onSubmit={async ({ password }) => {
          await confirm.mutateAsync({ token, password });
          navigate('/notebooks', { replace: true });
        }}
      />
    </AuthLayout>
  );
}
