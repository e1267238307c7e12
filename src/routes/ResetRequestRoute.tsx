import { Link } from 'react-router-dom';
import { AuthLayout } from '../components/AuthLayout';
import { ResetRequestForm } from '../features/auth/components/ResetRequestForm';

export function ResetRequestRoute() {
  return (
    <AuthLayout
      title="Reset your password"
      intro="We will e-mail you a link to choose a new password."
      footer={<Link to="/sign-in" className="font-medium text-tide-600 hover:underline">Back to sign-in</Link>}
    >
      <ResetRequestForm />
    </AuthLayout>
  );
}
