import { Navigate, Outlet, useLocation, useNavigate } from 'react-router-dom';
import { AppLayout } from '@/components/layout/app-layout';
import { paths } from '@/config/paths';
import { useSignOut } from '@/features/auth/api/sign-out';
import { useSession } from '@/lib/session';

/** Everything behind sign-in: the shell with its navigation around the page. */
export function AppRoot() {
  const state = useSession();
  const location = useLocation();
  const navigate = useNavigate();
  const signOut = useSignOut({ onSettled: () => navigate(paths.auth.signIn.getHref(), { replace: true }) });

  if (state.status !== 'signed-in') {
    // After a deliberate sign-out there is nothing to come back to.
    const next = state.status === 'signed-out' && state.reason === 'signed-out' ? undefined : `${location.pathname}${location.search}`;
    return <Navigate to={paths.auth.signIn.getHref(next)} replace />;
  }

  return (
    <AppLayout user={state.user} onSignOut={() => signOut.mutate()}>
      <Outlet />
    </AppLayout>
  );
}
