import { Anchor, Button, Skeleton, Stack, Text, Title } from '@mantine/core';
import { useDocumentTitle } from '@mantine/hooks';
import { IconEye, IconPencil } from '@tabler/icons-react';
import { Link, useParams } from 'react-router-dom';
import { useMethods } from '@/components/calculator';
import { PanelError } from '@/components/errors/panel-error';
import { paths } from '@/config/paths';
import { useQuery } from '@tanstack/react-query';
import { useMethodDesign } from '@/features/method-designer/api/get-method-design';
import { getMethodVersionQueryOptions } from '@/features/method-designer/api/get-method-versions';
import { DefinitionView } from '@/features/method-designer/components/definition-view';
import { VersionHistory } from '@/features/method-designer/components/version-history';
import { MethodOverview } from '@/features/methods/components/method-overview';
import { MethodRunPanel } from '@/features/methods/components/method-run-panel';
import { canAccess } from '@/lib/authorization';
import { useSessionUser } from '@/lib/session';
import { slugOf } from './method-slug';

export function MethodRoute() {
  const methodId = useParams().methodId ?? '';
  const user = useSessionUser();
  const methods = useMethods();
  const method = methods.byId(methodId);
  const slug = slugOf(methodId);
  const design = useMethodDesign(slug ?? '', !!slug);
  // The released version itself carries the TeX of every formula.
  const released = useQuery({ ...getMethodVersionQueryOptions(slug ?? '', method?.version ?? 0), enabled: !!slug && !!method });
  useDocumentTitle(`${method?.title ?? methodId} · Methods · Limitbook`);

  if (methods.isPending) return <Skeleton h={400} />;
  if (methods.isError) return <PanelError title="The method catalog could not be loaded" error={methods.error} onRetry={() => void methods.refetch()} />;
  if (!method) {
    return (
      <Stack>
        <Title order={1}>No released method {methodId}</Title>
        <Text>
          The catalog has no released method with this id.{' '}
          {slug && canAccess(user.role, 'standards.edit') && (
            <>
              If it is still a draft, <Anchor component={Link} to={paths.methods.design.getHref(methodId)}>open the designer</Anchor>.{' '}
            </>
          )}
          <Anchor component={Link} to={paths.methods.catalog.getHref()}>Back to the catalog</Anchor>
        </Text>
      </Stack>
    );
  }

  const canEdit = !!slug && canAccess(user.role, 'standards.edit');
  const inReview = design.data?.draft?.state === 'in_review';
  const canReview = inReview && canAccess(user.role, 'standards.review');

  return (
    <MethodOverview
      method={method}
      actions={
        <>
          {canReview && (
            <Button component={Link} to={paths.methods.review.getHref(methodId)} leftSection={<IconEye size={16} />}>
              Review the new revision
            </Button>
          )}
          {canEdit && (
            <Button component={Link} to={paths.methods.design.getHref(methodId)} variant="default" leftSection={<IconPencil size={16} />}>
              {design.data?.draft ? 'Open the draft' : 'Start a new version'}
            </Button>
          )}
        </>
      }
      definition={slug ? released.data ? <DefinitionView definition={released.data.definition} tex={released.data.tex} /> : released.isError ? <PanelError error={released.error} title="The definition could not be loaded" /> : <Skeleton h={160} /> : undefined}
      history={slug ? <VersionHistory slug={slug} canRestore={user.role === 'admin'} /> : undefined}
      run={<MethodRunPanel method={method} />}
      canMoveForward={canAccess(user.role, 'standards.edit')}
    />
  );
}
