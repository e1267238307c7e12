import { Link, Navigate, useNavigate, useSearchParams } from 'react-router-dom';
import { AuthLayout } from '../components/AuthLayout';
import { LoadingState } from '../components/LoadingState';
import { useMe } from '../features/auth/api/queries';
import { SignInForm } from '../features/auth/components/SignInForm';

/** Only same-site paths are followed after sign-in, never another origin. */
function safeNext(value: string | null): string {
  return value && value.startsWith('/') && !value.startsWith('//') ? value : '/notebooks';
}

export function SignInRoute() {
  const me = useMe();
  const [params] = useSearchParams();
  const navigate = useNavigate();
  const next = safeNext(params.get('next'));

  if (me.isPending) return <LoadingState />;
  if (me.data) return <Navigate to={next} replace />;

  return (
    <AuthLayout
      title="Sign in"
      intro="Your group's shared notebooks, pages and countersignatures."
      footer={
        <Link to="/reset" className="font-medium text-tide-600 hover:underline">
          Forgot your password?
        </Link>
      }
    >
      <SignInForm onSignedIn={() => navigate(next, { replace: true })} />
    </AuthLayout>
  );
}
