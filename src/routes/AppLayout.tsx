import { Navigate, Outlet, useLocation, useNavigate, useOutletContext } from 'react-router-dom';
import type { Me } from '../../shared/schemas';
import { AppFrame, type NavItem } from '../components/AppFrame';
import { ErrorState } from '../components/ErrorState';
import { CountersignIcon, MailIcon, NotebookIcon, PeopleIcon } from '../components/icons';
import { LoadingState } from '../components/LoadingState';
import { useMe } from '../features/auth/api/queries';
import { SignOutButton } from '../features/auth/components/SignOutButton';
import { roleLabels } from '../lib/roles';

function navFor(me: Me): NavItem[] {
  const items: NavItem[] = [{ to: '/notebooks', label: 'Notebooks', icon: <NotebookIcon /> }];
  if (me.role === 'supervisor') items.push({ to: '/countersign', label: 'To countersign', icon: <CountersignIcon /> });
  if (me.role === 'admin') {
    items.push({ to: '/people', label: 'People and roles', icon: <PeopleIcon /> }, { to: '/mail', label: 'Mail room', icon: <MailIcon /> });
  }
  return items;
}

/** Everything behind sign-in: without a session, go to sign-in and come back here afterwards. */
export function AppLayout() {
  const me = useMe();
  const location = useLocation();
  const navigate = useNavigate();

  if (me.isPending) {
    return (
      <div className="flex min-h-screen items-center justify-center">
        <LoadingState label="Opening Quillane…" />
      </div>
    );
  }
  if (me.isError) return <div className="p-10"><ErrorState error={me.error} /></div>;
  if (!me.data) {
    const next = `${location.pathname}${location.search}`;
    return <Navigate to={`/sign-in?next=${encodeURIComponent(next)}`} replace />;
  }

  return (
    <AppFrame
      nav={navFor(me.data)}
      person={{ name: me.data.name, email: me.data.email, roleLabel: roleLabels[me.data.role] }}
      signOut={<SignOutButton onSignedOut={() => navigate('/sign-in', { replace: true })} />}
    >
      <Outlet context={me.data} />
    </AppFrame>
  );
}

/** The signed-in person, for routes rendered inside AppLayout. */
export function useSignedInPerson(): Me {
  return useOutletContext<Me>();
}
