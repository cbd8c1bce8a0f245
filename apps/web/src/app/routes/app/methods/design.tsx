import { Anchor, Skeleton, Stack, Text, Title } from '@mantine/core';
import { useDocumentTitle } from '@mantine/hooks';
import { Link, Navigate, useParams } from 'react-router-dom';
import { PanelError } from '@/components/errors/panel-error';
import { paths } from '@/config/paths';
import { useMethodDesign } from '@/features/method-designer/api/get-method-design';
import { useMethodDraft } from '@/features/method-designer/api/get-method-draft';
import { MethodDesigner } from '@/features/method-designer/components/method-designer';
import { StartNextVersion } from '@/features/method-designer/components/start-next-version';
import { isApiError } from '@/lib/api-client';
import { canAccess } from '@/lib/authorization';
import { useSessionUser } from '@/lib/session';
import { slugOf } from './method-slug';

export function MethodDesignRoute() {
  const methodId = useParams().methodId ?? '';
  const slug = slugOf(methodId);
  const user = useSessionUser();
  const allowed = canAccess(user.role, 'standards.edit');
  const draft = useMethodDraft(slug ?? '', allowed && !!slug);
  const noDraft = draft.isError && isApiError(draft.error) && draft.error.status === 404;
  const design = useMethodDesign(slug ?? '', noDraft);
  useDocumentTitle(`Designer · ${draft.data?.definition.name ?? methodId} · Limitbook`);

  if (!allowed || !slug) return <Navigate to={paths.methods.method.getHref(methodId)} replace />;
  if (draft.isPending) return <Skeleton h={480} />;
  if (draft.isError) {
    if (noDraft && design.isPending) return <Skeleton h={240} />;
    if (noDraft && design.data?.latestVersion) return <StartNextVersion slug={slug} name={design.data.name} latestVersion={design.data.latestVersion} />;
    if (noDraft) {
      return (
        <Stack>
          <Title order={1}>No method {methodId}</Title>
          <Text>
            Nobody has designed a method with this id. <Anchor component={Link} to={paths.methods.create.getHref()}>Start a new method</Anchor>
          </Text>
        </Stack>
      );
    }
    return <PanelError title={`${methodId} cannot be opened in the designer`} error={draft.error} onRetry={() => void draft.refetch()} />;
  }
  return <MethodDesigner key={draft.data.id} slug={slug} revision={draft.data} />;
}
