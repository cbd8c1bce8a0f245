import { useDocumentTitle } from '@mantine/hooks';
import { Navigate, useLocation, useNavigate, useSearchParams } from 'react-router-dom';
import { AuthLayout } from '@/components/layout/auth-layout';
import { safeNextPath } from '@/config/paths';
import { SignInForm } from '@/features/auth/components/sign-in-form';
import { useSession } from '@/lib/session';

export function SignInRoute() {
  useDocumentTitle('Sign in · Limitbook');
  const state = useSession();
  const [params] = useSearchParams();
  const location = useLocation();
  const navigate = useNavigate();
  const next = safeNextPath(params.get('next'));

  if (state.status === 'signed-in') return <Navigate to={next} replace />;

  const passed = (location.state as { notice?: string } | null)?.notice;
  const notice = passed ?? (state.status === 'signed-out' && state.reason === 'expired' ? 'Your session ended. Sign in again to continue.' : undefined);

  return (
    <AuthLayout title="Sign in" description="Use the e-mail address your Limitbook administrator invited.">
      <SignInForm defaultEmail={params.get('email') ?? ''} notice={notice} onSuccess={() => navigate(next, { replace: true })} />
    </AuthLayout>
  );
}
