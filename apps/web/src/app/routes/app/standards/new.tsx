import { Stack } from '@mantine/core';
import { useDocumentTitle } from '@mantine/hooks';
import { Navigate, useNavigate } from 'react-router-dom';
import { PageHeader } from '@/components/layout/page-header';
import { paths } from '@/config/paths';
import { CreatePageForm } from '@/features/editor/components/create-page-form';
import { canAccess } from '@/lib/authorization';
import { useSessionUser } from '@/lib/session';

export function NewStandardRoute() {
  useDocumentTitle('New standard · Limitbook');
  const user = useSessionUser();
  const navigate = useNavigate();
  if (!canAccess(user.role, 'standards.edit')) return <Navigate to={paths.library.home.getHref()} replace />;
  return (
    <Stack gap={0}>
      <PageHeader eyebrow="Library" title="New standard" description="Give the standard its number and file it in a collection; you write it next." />
      <CreatePageForm
        onCreated={(page) => navigate(paths.standards.edit.getHref(page.documentNumber), { replace: true })}
        onCancel={() => navigate(-1)}
      />
    </Stack>
  );
}
