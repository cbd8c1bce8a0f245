import { useDocumentTitle } from '@mantine/hooks';
import { useNavigate, useSearchParams } from 'react-router-dom';
import { AuthLayout } from '@/components/layout/auth-layout';
import { paths } from '@/config/paths';
import { useSignOut } from '@/features/auth/api/sign-out';
import { AcceptInviteForm } from '@/features/auth/components/accept-invite-form';
import { FormAlert } from '@/features/auth/components/form-alert';
import { useSession } from '@/lib/session';
import { MissingToken } from './missing-token';

export function AcceptInviteRoute() {
  useDocumentTitle('Join Limitbook');
  const [params] = useSearchParams();
  const navigate = useNavigate();
  const state = useSession();
  const signOut = useSignOut();
  const token = params.get('token');

  const done = async () => {
    // The new account signs in on its own; a session already open in this browser must not linger.
    if (state.status === 'signed-in') await signOut.mutateAsync().catch(() => undefined);
    navigate(paths.auth.signIn.getHref(), { replace: true, state: { notice: 'Your account is ready. Sign in with your e-mail address and new password.' } });
  };

  return (
    <AuthLayout title="Join your team on Limitbook" description={token ? 'Tell us your name and choose a password to finish setting up your account.' : undefined}>
      {token ? (
        <>
          {state.status === 'signed-in' && (
            <FormAlert tone="info">
              You are signed in as {state.user.name}. Finishing this invitation signs you out of that account.
            </FormAlert>
          )}
          <AcceptInviteForm token={token} onSuccess={() => void done()} />
        </>
      ) : (
        <MissingToken what="invitation" retryHref={paths.auth.signIn.getHref()} retryLabel="Go to sign in" />
      )}
    </AuthLayout>
  );
}
