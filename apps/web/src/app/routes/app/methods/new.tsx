import { useDocumentTitle } from '@mantine/hooks';
import { Navigate } from 'react-router-dom';
import { paths } from '@/config/paths';
import { CreateMethodForm } from '@/features/method-designer/components/create-method-form';
import { canAccess } from '@/lib/authorization';
import { useSessionUser } from '@/lib/session';

export function NewMethodRoute() {
  useDocumentTitle('New method · Limitbook');
  const user = useSessionUser();
  if (!canAccess(user.role, 'standards.edit')) return <Navigate to={paths.methods.catalog.getHref()} replace />;
  return <CreateMethodForm />;
}
