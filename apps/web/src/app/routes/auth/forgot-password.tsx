import { useDocumentTitle } from '@mantine/hooks';
import { useSearchParams } from 'react-router-dom';
import { AuthLayout } from '@/components/layout/auth-layout';
import { ForgotPasswordForm } from '@/features/auth/components/forgot-password-form';

export function ForgotPasswordRoute() {
  useDocumentTitle('Reset your password · Limitbook');
  const [params] = useSearchParams();
  return (
    <AuthLayout title="Reset your password" description="Enter your e-mail address and we will send you a link to choose a new password.">
      <ForgotPasswordForm defaultEmail={params.get('email') ?? ''} />
    </AuthLayout>
  );
}
