import { Navigate, useParams } from 'react-router-dom';
import { PanelError } from '@/components/errors/panel-error';
import { PageLoader } from '@/components/layout/page-loader';
import { paths } from '@/config/paths';
import { useEditableDraft } from '@/features/editor/api/get-draft';
import { PageEditor } from '@/features/editor/components/page-editor';
import { canAccess } from '@/lib/authorization';
import { useSessionUser } from '@/lib/session';

export function EditStandardRoute() {
  const { documentNumber = '' } = useParams();
  const user = useSessionUser();
  const allowed = canAccess(user.role, 'standards.edit');
  const draft = useEditableDraft(documentNumber, allowed);

  if (!allowed) return <Navigate to={paths.standards.page.getHref(documentNumber)} replace />;
  if (draft.isPending) return <PageLoader />;
  if (draft.isError) return <PanelError title={`${documentNumber.toUpperCase()} cannot be opened for editing`} error={draft.error} onRetry={() => void draft.refetch()} />;

  const page = draft.data;
  return (
    <PageEditor
      key={page.revision.id}
      page={page}
      readerHref={page.published ? paths.standards.page.getHref(page.documentNumber) : undefined}
    />
  );
}
