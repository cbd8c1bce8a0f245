import { useDocumentTitle } from '@mantine/hooks';
import { useNavigate, useSearchParams } from 'react-router-dom';
import { AuthLayout } from '@/components/layout/auth-layout';
import { paths } from '@/config/paths';
import { ResetPasswordForm } from '@/features/auth/components/reset-password-form';
import { MissingToken } from './missing-token';

export function ResetPasswordRoute() {
  useDocumentTitle('Choose a new password · Limitbook');
  const [params] = useSearchParams();
  const navigate = useNavigate();
  const token = params.get('token');

  return (
    <AuthLayout title="Choose a new password" description={token ? 'Your new password replaces the old one and signs out your other sessions.' : undefined}>
      {token ? (
        <ResetPasswordForm
          token={token}
          onSuccess={() => navigate(paths.auth.signIn.getHref(), { replace: true, state: { notice: 'Password changed. Sign in with your new password.' } })}
        />
      ) : (
        <MissingToken what="password reset" retryHref={paths.auth.forgotPassword.getHref()} retryLabel="Request a new link" />
      )}
    </AuthLayout>
  );
}
